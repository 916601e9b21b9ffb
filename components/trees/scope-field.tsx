export function ScopeField({ families, selected, error }: { families: { slug: string; label: string }[]; selected: string[]; error?: string }) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-medium text-ink-soft">Motor families</legend>
      <p className="text-xs text-ink-faint">Tick none for a tree that applies to every family.</p>
      <div className="mt-1 grid max-h-40 gap-1 overflow-y-auto rounded-md border border-ink-faint/40 bg-white p-2 sm:grid-cols-2">
        {families.map((f) => (
          <label key={f.slug} className="flex items-center gap-2 text-sm">
            <input type="checkbox" name="scope" value={f.slug} defaultChecked={selected.includes(f.slug)} />
            {f.label}
          </label>
        ))}
      </div>
      {error ? <p className="text-sm text-danger">{error}</p> : null}
    </fieldset>
  );
}
