import Link from "next/link";
import { WriteupSearch } from "@/components/search/writeup-search";
import { DraftList } from "@/components/writeups/draft-list";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { mayReadDrafts } from "@/lib/writeups/access";
import { listDrafts } from "@/lib/writeups/queries";

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v)?.slice(0, 200);

export default async function WriteupsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("writeup:read", "/writeups");
  const params = await searchParams;
  const drafts = mayReadDrafts(user.role) ? await listDrafts() : [];
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1>Write-ups</h1>
          <p className="text-ink-soft">What failed, why it failed and how it was put right, from this shop&apos;s bench.</p>
        </div>
        {may(user.role, "writeup:draft") ? (
          <Link href="/writeups/new" className="rounded-md bg-copper px-4 py-2 font-medium text-white no-underline hover:bg-copper-dark hover:no-underline">
            New write-up
          </Link>
        ) : null}
      </div>
      {/* A new address from outside (the header's search box) starts the search afresh. */}
      <WriteupSearch key={`${one(params.q) ?? ""}|${one(params.family)}|${one(params.cause)}|${one(params.tag)}`} />
      {mayReadDrafts(user.role) ? <DraftList drafts={drafts} userId={user.id} /> : null}
    </div>
  );
}
