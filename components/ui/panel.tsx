export function Panel({ title, children, className = "", actions }: {
  title?: string;
  children: React.ReactNode;
  className?: string;
  actions?: React.ReactNode;
}) {
  return (
    <section className={`rounded-lg border border-ink-faint/30 bg-white p-4 shadow-sm ${className}`}>
      {title ? (
        <div className="mb-3 flex items-center justify-between gap-2">
          <h2>{title}</h2>
          {actions}
        </div>
      ) : null}
      {children}
    </section>
  );
}

export function Stat({ label, value, hint }: { label: string; value: React.ReactNode; hint?: string }) {
  return (
    <div className="rounded-lg border border-ink-faint/30 bg-white p-4">
      <p className="text-xs uppercase tracking-wide text-ink-faint">{label}</p>
      <p className="mt-1 text-2xl font-semibold">{value}</p>
      {hint ? <p className="text-xs text-ink-soft">{hint}</p> : null}
    </div>
  );
}
