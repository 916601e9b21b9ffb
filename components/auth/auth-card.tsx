/** The frame of the signed-out pages (sign-in, setup, invitation, password reset). */
export function AuthCard({ title, intro, children, wide = false }: { title: string; intro?: React.ReactNode; children: React.ReactNode; wide?: boolean }) {
  return (
    <main className="grid min-h-screen place-items-center bg-ink px-4">
      <div className={`w-full ${wide ? "max-w-md" : "max-w-sm"} rounded-xl border-t-4 border-copper bg-paper p-8 shadow-xl`}>
        <h1 className="mb-1">{title}</h1>
        {intro ? <div className="mb-6 text-sm text-ink-soft">{intro}</div> : null}
        {children}
      </div>
    </main>
  );
}
