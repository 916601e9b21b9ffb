import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { JobCard } from "@/components/cases/job-card";
import { PrintButton } from "@/components/cases/print-button";
import { EmptyState } from "@/components/ui/empty-state";
import { requireRole } from "@/lib/auth/require-role";
import { causesBySlug } from "@/lib/triage/catalogue";
import { caseHeader } from "@/lib/cases/queries";
import { publishedTree } from "@/lib/triage/tree-cache";
import { appUrl } from "@/lib/http/app-url";
import { teardownSummary } from "@/lib/bench/plan";

export const metadata: Metadata = { title: "Job card" };

/** A unit that has been booked in carries a printed card; before that there is nothing to box. */
const PRINTABLE = new Set(["booked_in", "on_bench", "closed"]);

export default async function JobCardPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: raw } = await params;
  await requireRole("case:read", `/cases/${raw}/job-card`);
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const kase = await caseHeader(id);
  if (!kase) notFound();
  const caseUrl = `${appUrl()}/cases/${kase.id}`;

  if (!PRINTABLE.has(kase.status) || !kase.triagedAt) {
    return (
      <EmptyState title="No job card yet.">
        A job card is printed when the unit is booked in. <Link href={`/cases/${kase.id}`}>Back to the case</Link>
      </EmptyState>
    );
  }
  const [tree, teardown] = await Promise.all([publishedTree(kase.treeVersionId), teardownSummary(kase)]);
  const catalogue = await causesBySlug(tree.graph.causes.map((c) => c.slug));
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
        <p className="text-sm"><Link href={`/cases/${kase.id}`}>← Back to case {kase.reference}</Link></p>
        <PrintButton>Print job card</PrintButton>
      </div>
      <JobCard kase={kase} caseUrl={caseUrl} teardown={teardown} nameOf={(slug) => catalogue.get(slug)?.name ?? slug} />
    </div>
  );
}
