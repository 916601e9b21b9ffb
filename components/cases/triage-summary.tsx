import Link from "next/link";
import type { Case } from "@/db/schema";
import type { TeardownSummary } from "@/lib/bench/plan";
import { money, percent } from "@/lib/format";

/** What the triage ended with: the final ranking, the quote, the bench plan and what was asked for. */
export function TriageSummary({ kase, nameOf, teardown }: {
  kase: Case;
  nameOf: (slug: string) => string;
  /** For a unit in the shop: the teardown plan through its assemblies, which replaces the phone's bench plan. */
  teardown?: TeardownSummary | null;
}) {
  const plan = teardown ?? kase.benchPlan;
  const ranking = Object.entries(kase.finalRanking ?? {}).filter(([k]) => k !== "unlisted").sort((a, b) => b[1] - a[1]).slice(0, 4);
  return (
    <div className="grid gap-4 text-sm md:grid-cols-3" data-testid="triage-summary">
      <div>
        <p className="font-medium">Ranking at the end of the call</p>
        <ul>
          {ranking.map(([slug, p]) => <li key={slug} className="flex justify-between gap-2"><span>{nameOf(slug)}</span><span className="whitespace-nowrap font-mono">{percent(p)}</span></li>)}
          <li className="flex justify-between gap-2 text-ink-soft"><span>None of the listed</span><span className="whitespace-nowrap font-mono">{percent(kase.finalRanking?.unlisted ?? 0)}</span></li>
        </ul>
      </div>
      <div>
        <p className="font-medium">Rough quote</p>
        <p>{kase.quoteLowCents !== null && kase.quoteHighCents !== null ? `${money(kase.quoteLowCents)} – ${money(kase.quoteHighCents)}` : kase.status === "advised" ? "none (advised by phone)" : "none given"}</p>
        {kase.whatToSend ? <><p className="mt-2 font-medium">What to send</p><p className="text-ink-soft">{kase.whatToSend}</p></> : null}
      </div>
      <div>
        <p className="font-medium">Bench plan</p>
        {plan ? (
          <>
            <ol className="list-decimal pl-5" data-testid="bench-plan">{plan.order.slice(0, 5).map((slug) => <li key={slug} data-cause={slug}>{nameOf(slug)}</li>)}</ol>
            <p className="text-ink-soft">Expected teardown about {Math.round(plan.expectedMinutes)} min{teardown ? " (opening each stage once)" : ""}.</p>
            {teardown ? <Link href={teardown.href} className="mt-1 inline-block font-medium print:hidden">Open the bench checklist</Link> : null}
          </>
        ) : <p className="text-ink-soft">None.</p>}
      </div>
    </div>
  );
}
