import { AppHeader } from "@/components/shell/app-header";
import { requireRole } from "@/lib/auth/require-role";
import { currentSession } from "@/lib/auth/session";

export default async function ShopLayout({ children }: { children: React.ReactNode }) {
  const user = await requireRole("home:read");
  const theme = (await currentSession())?.theme ?? "light";
  return (
    <>
      <AppHeader user={user} theme={theme} />
      <main className="mx-auto max-w-7xl px-4 py-6 print:max-w-none print:p-0">{children}</main>
      <footer className="mx-auto max-w-7xl px-4 pb-8 text-xs text-ink-faint print:hidden">
        Rootbench supports, never replaces, the motor maker&apos;s service documents, local regulations and licensed practice.
      </footer>
    </>
  );
}
