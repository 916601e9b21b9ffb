import { Panel } from "@/components/ui/panel";
import { ScrollRegion } from "@/components/ui/scroll-region";
import { formatP, type UpgradeComparison } from "@/lib/survival/compare";
import { groupLabel } from "@/lib/survival/groups";
import { curvePoints } from "./curve-points";
import { SurvivalChart } from "./survival-chart";
import { percent } from "@/lib/format";

const share = (v: number | null) => (v === null ? "—" : percent(v));
const VERDICT_STYLE = {
  better: "bg-moss-light text-moss",
  worse: "bg-danger-light text-danger",
  no_difference: "bg-paper-deep text-ink",
  too_few: "bg-amber-light text-amber",
} as const;

/** One upgrade: fitted vs not, among repairs of the cause group it guards. */
export function ComparisonCard({ comparison, months }: { comparison: UpgradeComparison; months: number }) {
  const { upgrade, fitted, notFitted, pValue, verdict } = comparison;
  const arms = [
    { key: "fitted", name: "Fitted", arm: fitted },
    { key: "not-fitted", name: "Not fitted", arm: notFitted },
  ];
  return (
    <Panel title={upgrade.name} className="flex flex-col gap-3">
      <div data-testid="comparison" data-upgrade={upgrade.slug} data-verdict={verdict.kind} className="flex flex-col gap-3">
        <p className="text-sm text-ink-soft">
          Repairs of {groupLabel(comparison.group)} faults; the curve is the share not back for a fault of that kind.
          {pValue !== null ? <> Log-rank test: <strong data-testid="p-value">{formatP(pValue)}</strong>.</> : null}
        </p>
        <p role="note" data-testid="verdict" className={`rounded-md p-2 text-sm ${VERDICT_STYLE[verdict.kind]}`}>{verdict.text}</p>
        {fitted.n + notFitted.n === 0 ? null : <>
        <SurvivalChart months={months} label={`Return-free share over months since the repair, fitted and not fitted with ${upgrade.phrase}; the tables below hold the numbers`}
          curves={arms.filter((a) => a.arm.n > 0).map((a) => ({ key: a.key, name: `${a.name} (n = ${a.arm.n})`, points: curvePoints(a.arm, months) }))} />
        <ScrollRegion label={`Units still followed, ${upgrade.phrase}`} className="overflow-x-auto">
          <table className="w-full text-right text-xs" data-testid="at-risk">
            <caption className="pb-1 text-left text-xs text-ink-soft">Units still followed (number at risk), by months since the repair</caption>
            <thead className="text-ink-faint">
              <tr><th scope="col" className="text-left font-medium">Months</th>{fitted.atRisk.filter((r) => r.months <= months).map((r) => <th key={r.months} scope="col" className="font-medium">{r.months}</th>)}</tr>
            </thead>
            <tbody className="font-mono tabular-nums">
              {arms.map((a) => (
                <tr key={a.key}><th scope="row" className="text-left font-sans font-medium">{a.name}</th>{a.arm.atRisk.filter((r) => r.months <= months).map((r) => <td key={r.months}>{r.n}</td>)}</tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
        <ScrollRegion label={`Share not back, ${upgrade.phrase}`} className="overflow-x-auto">
          <table className="w-full text-sm" data-testid="checkpoints">
            <caption className="pb-1 text-left text-xs text-ink-soft">Share not back, with its 95 % interval (— where fewer than 10 units are still followed)</caption>
            <thead className="border-b border-ink-faint/40 text-xs uppercase tracking-wide text-ink-faint">
              <tr><th scope="col" className="text-left">&nbsp;</th><th scope="col" className="text-right">Repairs</th><th scope="col" className="text-right">Back</th>
                {fitted.checkpoints.map((c) => <th key={c.months} scope="col" className="text-right">{c.months} months</th>)}</tr>
            </thead>
            <tbody>
              {arms.map((a) => (
                <tr key={a.key} className="border-b border-ink-faint/15">
                  <th scope="row" className="py-1 text-left font-medium">{a.name}</th>
                  <td className="text-right font-mono tabular-nums">{a.arm.n}</td>
                  <td className="text-right font-mono tabular-nums">{a.arm.returns}</td>
                  {a.arm.checkpoints.map((c) => (
                    <td key={c.months} className="whitespace-nowrap text-right font-mono tabular-nums">
                      {share(c.survival)}{c.survival !== null ? <span className="text-xs text-ink-faint"> ({share(c.lower)}–{share(c.upper)})</span> : null}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
        </>}
      </div>
    </Panel>
  );
}
