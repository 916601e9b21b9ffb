import type { BenchResult } from "@/lib/practice/types";

export function BenchResultPanel({ result }: { result: BenchResult }) {
  return (
    <section
      aria-label="Bench result"
      data-testid="practice-result"
      className={`rounded-lg border-2 p-4 ${result.hit ? "border-moss bg-moss-light/60" : "border-copper bg-copper-light/50"}`}
    >
      <p className="text-lg font-semibold">{result.hit ? "Hit: the bench confirmed your cause." : "Not this time."}</p>
      <p className="mt-1 text-sm">You committed to <strong>{result.committed.name}</strong>.</p>
      <h3 className="mt-3 text-sm font-semibold uppercase tracking-wide text-ink-soft">Confirmed at the bench</h3>
      <ul className="mt-1 list-disc pl-5 text-sm">
        {result.confirmed.map((c) => <li key={c.slug}>{c.name}{result.confirmed.length > 1 && c.primary ? " (main cause)" : ""}</li>)}
        {result.otherCause ? <li>Also: {result.otherCause}</li> : null}
      </ul>
      {result.parts.length ? (
        <>
          <h3 className="mt-3 text-sm font-semibold uppercase tracking-wide text-ink-soft">Parts replaced</h3>
          <ul className="mt-1 list-disc pl-5 text-sm">{result.parts.map((p) => <li key={p.name}>{p.quantity > 1 ? `${p.quantity} × ` : ""}{p.name}</li>)}</ul>
        </>
      ) : null}
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        {result.labourMinutes ? <><dt className="text-ink-soft">Labour</dt><dd>{result.labourMinutes} minutes</dd></> : null}
        {result.upgrades ? <><dt className="text-ink-soft">Upgrades fitted</dt><dd>{result.upgrades}</dd></> : null}
        {result.notes ? <><dt className="text-ink-soft">Bench notes</dt><dd>{result.notes}</dd></> : null}
        <dt className="text-ink-soft">The tree&apos;s ranking</dt>
        <dd>{result.engineRank ? `put the confirmed cause at number ${result.engineRank} at the end of the call` : "did not list the confirmed cause"}</dd>
      </dl>
    </section>
  );
}
