import type { Metadata } from "next";
import Link from "next/link";
import { CauseList } from "@/components/catalogue/cause-list";
import { FamilyList } from "@/components/catalogue/family-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { listCauses, listFamilies, listMakers } from "@/lib/catalogue/queries";

export const metadata: Metadata = { title: "Catalogue" };

export default async function CataloguePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("catalogue:read", "/catalogue");
  const canEdit = may(user.role, "catalogue:edit");
  const [causes, families, makers] = await Promise.all([listCauses(), listFamilies(), listMakers()]);
  const saved = (await searchParams).saved;
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1>Causes, parts and motor families</h1>
          <p className="text-ink-soft">What fails in the units we see, what fixing it takes, and the drive units themselves.</p>
        </div>
        {canEdit ? <Link href="/catalogue/causes/new" className="rounded-md bg-copper px-4 py-2 font-medium text-white no-underline hover:bg-copper-dark hover:no-underline">Add a cause</Link> : null}
      </div>
      {typeof saved === "string" ? <p role="status" className="rounded-md border border-moss/40 bg-moss-light px-3 py-2 text-sm text-moss">Saved <a href={`#cause-${saved}`}>{saved}</a>.</p> : null}
      <Panel title={`Causes (${causes.length})`}>
        {causes.length ? <CauseList causes={causes} canEdit={canEdit} highlight={typeof saved === "string" ? saved : undefined} /> : <EmptyState title="No causes in the catalogue yet." />}
      </Panel>
      <Panel title={`Motor families (${families.length})`}>
        {families.length ? <FamilyList families={families} makers={makers} /> : <EmptyState title="No motor families yet." />}
      </Panel>
    </div>
  );
}
