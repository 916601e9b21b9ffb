import Link from "next/link";
import type { AdviceSummary } from "@/lib/survival/advice";

/** Supported upgrades first, then those the record does not show to help, then those it cannot judge yet. */
export function UpgradeAdviceList({ advice }: { advice: AdviceSummary }) {
  const supported = advice.items.filter((a) => a.kind === "supported");
  const notShown = advice.items.filter((a) => a.kind === "not_shown");
  const tooFew = advice.items.filter((a) => a.kind === "too_few");
  return (
    <div className="flex flex-col gap-2 text-sm" data-testid="upgrade-advice">
      <p className="text-ink-soft">From {advice.basis}, followed from each repair until the unit came back. <Link href="/reports/lasting">How this is counted</Link></p>
      {supported.length === 0 ? <p data-testid="advice-none">The record does not yet show that any upgrade makes these units last longer.</p> : null}
      <ul className="flex flex-col gap-1">
        {supported.map((a) => <li key={a.upgrade.slug} data-testid="advice-supported" className="rounded-md bg-moss-light p-2 text-moss">{a.text}</li>)}
        {notShown.map((a) => <li key={a.upgrade.slug} data-testid="advice-not-shown" className="text-ink-soft">{a.upgrade.name}: {a.text}</li>)}
      </ul>
      {tooFew.length ? <p className="text-xs text-ink-faint">Too few repairs yet to judge: {tooFew.map((a) => a.upgrade.name.toLowerCase()).join(", ")}.</p> : null}
    </div>
  );
}
