import Link from "next/link";
import { may, ROLE_LABELS } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { signOut } from "@/app/(auth)/sign-in/actions";
import { HeaderSearch } from "@/components/search/header-search";
import type { Theme } from "@/db/schema";
import { NAV_ITEMS } from "./nav-items";
import { ThemeSwitch } from "./theme-switch";
import { HeaderBar } from "./header-bar";

export function AppHeader({ user, theme }: { user: SessionUser; theme: Theme }) {
  const items = NAV_ITEMS.filter((item) => may(user.role, item.capability));
  const searches = may(user.role, "writeup:read");
  const account = (
    <div className="flex items-center gap-3 text-sm">
      <Link href="/account" data-testid="signed-in-as" className="leading-tight text-on-bar no-underline hover:underline" title="Your account">
        {user.name} · <span className="text-on-bar-accent">{ROLE_LABELS[user.role]}</span>
      </Link>
      <ThemeSwitch theme={theme} />
      <form action={signOut}>
        <button type="submit" className="min-h-9 whitespace-nowrap rounded border border-on-bar/50 px-2 py-1 text-on-bar hover:bg-on-bar/10">Sign out</button>
      </form>
    </div>
  );
  return (
    <HeaderBar
      brand={
        <Link href="/" className="flex shrink-0 items-center gap-2 text-lg font-semibold text-on-bar no-underline hover:no-underline">
          <RootbenchMark />
          Rootbench
        </Link>
      }
      items={items.map(({ href, label }) => ({ href, label }))}
      search={searches ? <HeaderSearch /> : null}
      menuSearch={searches ? <HeaderSearch id="menu-search" className="w-full" /> : null}
      account={account}
    />
  );
}

function RootbenchMark() {
  return (
    <svg width="22" height="22" viewBox="0 0 24 24" aria-hidden="true">
      <circle cx="12" cy="12" r="9" fill="none" stroke="currentColor" strokeWidth="2" />
      <circle cx="12" cy="12" r="3" fill="var(--color-on-bar-accent)" />
      <path d="M12 3v4M12 17v4M3 12h4M17 12h4" stroke="currentColor" strokeWidth="2" />
    </svg>
  );
}
