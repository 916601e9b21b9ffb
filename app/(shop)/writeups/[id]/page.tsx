import { WriteupArticle } from "@/components/writeups/writeup-article";
import { requireRole } from "@/lib/auth/require-role";
import { idParam, orPageError } from "@/lib/writeups/page-errors";
import { getWriteup } from "@/lib/writeups/queries";

export default async function WriteupPage({ params, searchParams }: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ saved?: string }>;
}) {
  const { id } = await params;
  const user = await requireRole("writeup:read", `/writeups/${id}`);
  const writeup = await orPageError(() => getWriteup(idParam(id), user));
  const { saved } = await searchParams;
  return (
    <div className="flex flex-col gap-4">
      {saved === "draft" || saved === "published" ? (
        <p role="status" className="rounded-md bg-moss-light px-4 py-2 text-sm text-moss">
          {saved === "published" ? "Published: it is in everyone's search now." : "Draft saved. A senior mechanic can review and publish it."}
        </p>
      ) : null}
      <WriteupArticle writeup={writeup} user={user} />
    </div>
  );
}
