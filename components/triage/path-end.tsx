/** Shown when the walk has no question left on its path. */
export function PathEnd({ reached, skipped, onUnskip }: { reached: string[]; skipped: number; onUnskip: () => void }) {
  return (
    <section data-testid="path-end" className="rounded-xl border-2 border-dashed border-ink-faint bg-white p-6">
      <h2 className="text-2xl font-semibold">No question left on this path</h2>
      {reached.length ? <p className="mt-2 text-lg">The path ends at: <strong>{reached.join(", ")}</strong>.</p> : null}
      <p className="mt-2 text-ink-soft">Ask one of the suggested questions, or finish the call below.</p>
      {skipped > 0 ? (
        <button type="button" onClick={onUnskip} className="mt-3 rounded-md border border-ink-faint/60 px-3 py-1.5 text-sm hover:bg-paper-deep">
          Bring back {skipped} skipped question{skipped > 1 ? "s" : ""}
        </button>
      ) : null}
    </section>
  );
}
