export function EmptyState({ title, children }: { title: string; children?: React.ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-ink-faint/60 bg-white/60 p-6 text-center">
      <p className="font-medium text-ink-soft">{title}</p>
      {children ? <div className="mt-1 text-sm text-ink-faint">{children}</div> : null}
    </div>
  );
}
