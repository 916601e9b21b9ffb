import Link from "next/link";
import { may, ROLE_LABELS } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { signOut } from "@/app/(auth)/sign-in/actions";
import { NAV_ITEMS } from "./nav-items";
import { NavLink } from "./nav-link";
import { HeaderSearch } from "@/components/search/header-search";

export function AppHeader({ user }: { user: SessionUser }) {
  const items = NAV_ITEMS.filter((item) => may(user.role, item.capability));
  return (
    <header className="border-b-4 border-copper bg-ink text-paper">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href="/" className="flex items-center gap-2 text-lg font-semibold text-paper no-underline hover:no-underline">
          <RootbenchMark />
          Rootbench
        </Link>
        <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
          {items.map((item) => <NavLink key={item.href} href={item.href}>{item.label}</NavLink>)}
        </nav>
        {may(user.role, "writeup:read") ? <HeaderSearch /> : null}
        <div className="flex items-center gap-3 text-sm">
          <Link href="/account" data-testid="signed-in-as" className="text-paper no-underline hover:underline" title="Your account">
            {user.name} · <span className="text-copper-light">{ROLE_LABELS[user.role]}</span>
          </Link>
          <form action={signOut}>
            <button type="submit" className="rounded border border-paper/40 px-2 py-1 text-paper hover:bg-paper/10">Sign out</button>
          </form>
        </div>
      </div>
    </header>
  );
}

function RootbenchMark() {
  return (
    <svg width="22" height="22" viewBox="0 0 24 24" aria-hidden="true">
      <circle cx="12" cy="12" r="9" fill="none" stroke="currentColor" strokeWidth="2" />
      <circle cx="12" cy="12" r="3" fill="#b4532a" />
      <path d="M12 3v4M12 17v4M3 12h4M17 12h4" stroke="currentColor" strokeWidth="2" />
    </svg>
  );
}
