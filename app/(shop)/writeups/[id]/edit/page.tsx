import Link from "next/link";
import { WriteupEditor } from "@/components/writeups/writeup-editor";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { idParam, orPageError } from "@/lib/writeups/page-errors";
import { getWriteupForEdit, writeupFormOptions } from "@/lib/writeups/queries";

export default async function EditWriteupPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireRole("writeup:draft", `/writeups/${id}/edit`);
  const [writeup, options] = await Promise.all([orPageError(() => getWriteupForEdit(idParam(id), user)), writeupFormOptions()]);
  return (
    <div className="flex flex-col gap-4">
      <div>
        <Link href={`/writeups/${writeup.id}`} className="text-sm">← Back to the write-up</Link>
        <h1>Edit write-up</h1>
      </div>
      <WriteupEditor
        options={options}
        canPublish={may(user.role, "writeup:publish")}
        initial={{
          id: writeup.id, updatedAt: writeup.updatedAt.toISOString(), status: writeup.status,
          title: writeup.title, summary: writeup.summary, body: writeup.body,
          familyIds: writeup.families.map((f) => f.id), causeIds: writeup.causes.map((c) => c.id), partIds: writeup.parts.map((p) => p.id),
          tags: writeup.tags.join(", "), caseReference: writeup.caseReference ?? "",
        }}
      />
    </div>
  );
}
