import { WriteupEditor } from "@/components/writeups/writeup-editor";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { writeupFormOptions } from "@/lib/writeups/queries";

export default async function NewWriteupPage() {
  const user = await requireRole("writeup:draft", "/writeups/new");
  const options = await writeupFormOptions();
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1>New write-up</h1>
        <p className="text-ink-soft">What was reported, what you found at the bench, how you put it right, and what would prevent it.</p>
      </div>
      <WriteupEditor
        options={options}
        canPublish={may(user.role, "writeup:publish")}
        initial={{ status: "draft", title: "", summary: "", body: "", familyIds: [], causeIds: [], partIds: [], tags: "", caseReference: "" }}
      />
    </div>
  );
}
