/** The standing caution under every write-up. */
export function SafetyNote() {
  return (
    <aside className="rounded-md border-l-4 border-amber bg-amber-light/60 p-3 text-sm text-ink-soft" aria-label="Safety">
      Before opening a drive unit, remove the battery and disconnect power. Treat a damaged or wet lithium-ion battery as a
      fire risk and store it apart. Wear eye protection at the press. This write-up records one shop&apos;s experience: the
      motor maker&apos;s service documents, local regulations and licensed practice come first.
    </aside>
  );
}
