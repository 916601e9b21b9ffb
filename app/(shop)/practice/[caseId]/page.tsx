import Link from "next/link";
import { PracticeWalk } from "@/components/practice/practice-walk";
import { requireRole } from "@/lib/auth/require-role";
import { loadPracticeReplay } from "@/lib/practice/queries";
import { idParam, orPageError } from "@/lib/writeups/page-errors";

export default async function PracticeCasePage({ params }: { params: Promise<{ caseId: string }> }) {
  const { caseId } = await params;
  await requireRole("practice:run", `/practice/${caseId}`);
  const replay = await orPageError(() => loadPracticeReplay(idParam(caseId)));
  return (
    <div className="flex flex-col gap-5">
      <div>
        <Link href="/practice" className="text-sm">← All practice cases</Link>
        <h1 className="mt-1">Practice: {replay.treeTitle}</h1>
        <p className="text-ink-soft">
          A {replay.callerKind} called about a {replay.family} used for {replay.ridingUse}: “{replay.symptom}”.
        </p>
      </div>
      <PracticeWalk replay={replay} />
    </div>
  );
}
