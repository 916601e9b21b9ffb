import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { WalkScreen } from "@/components/triage/walk-screen";
import { requireRole } from "@/lib/auth/require-role";
import { loadWalk } from "@/lib/triage/walk-data";

export const metadata: Metadata = { title: "Triage" };

export default async function TriageWalkPage({ params }: { params: Promise<{ caseId: string }> }) {
  const { caseId } = await params;
  await requireRole("case:work", `/triage/${caseId}`);
  const id = Number(caseId);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const walk = await loadWalk(id);
  if (!walk) notFound();
  if (walk.status !== "open") redirect(`/cases/${id}`);
  return <WalkScreen {...walk.props} />;
}
