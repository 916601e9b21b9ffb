"use client";
import { usePathname } from "next/navigation";
import { useLayoutEffect, useRef, useState } from "react";
import { NavLink } from "./nav-link";

/**
 * The header row never wraps. From 1024 px the navigation sits in the row when it fits; when it does
 * not (narrower screens, or a role with many entries) it folds into a Menu button that opens the
 * navigation, search and account as a list of large targets below the bar.
 */
export function HeaderBar({ brand, items, search, menuSearch, account }: {
  brand: React.ReactNode;
  items: { href: string; label: string }[];
  search: React.ReactNode;
  menuSearch: React.ReactNode;
  account: React.ReactNode;
}) {
  const row = useRef<HTMLDivElement>(null);
  const needed = useRef(0);
  const [folded, setFolded] = useState(false);
  const path = usePathname();
  // The menu is open for the page it was opened on: following one of its links closes it.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === path;

  // Measure the row with the navigation laid out in it; fold when it overflows, unfold once that width is back.
  useLayoutEffect(() => {
    const el = row.current;
    if (!el) return;
    const check = () => {
      if (!folded && el.scrollWidth > el.clientWidth) { needed.current = el.scrollWidth; setFolded(true); }
      else if (folded && el.clientWidth >= needed.current) setFolded(false);
    };
    const observer = new ResizeObserver(check);
    observer.observe(el);
    check();
    return () => observer.disconnect();
  }, [folded]);

  const inline = folded ? "hidden" : "hidden lg:flex";
  return (
    <header className="border-b-4 border-copper bg-bar text-on-bar print:hidden" onKeyDown={(e) => { if (e.key === "Escape") setOpenOn(null); }}>
      <div ref={row} className="flex min-h-14 flex-nowrap items-center gap-4 overflow-hidden px-4 py-2">
        {brand}
        <nav aria-label="Main" className={`${inline} flex-nowrap gap-0.5`}>
          {items.map((item) => <NavLink key={item.href} href={item.href}>{item.label}</NavLink>)}
        </nav>
        <div className="ml-auto flex shrink-0 items-center gap-4">
          {search ? <div className="hidden sm:block">{search}</div> : null}
          <div className={inline}>{account}</div>
          <button
            type="button"
            aria-expanded={open}
            aria-controls="main-menu"
            onClick={() => setOpenOn(open ? null : path)}
            className={`${folded ? "" : "lg:hidden"} inline-flex min-h-11 min-w-11 items-center gap-2 rounded border border-on-bar/50 px-3 text-on-bar hover:bg-on-bar/10`}
            data-testid="menu-button"
          >
            <MenuIcon open={open} />
            Menu
          </button>
        </div>
      </div>
      {open ? (
        <div id="main-menu" className={`${folded ? "" : "lg:hidden"} flex flex-col gap-3 border-t border-on-bar/20 px-4 py-3`}>
          <nav aria-label="Main">
            <ul className="grid gap-1 sm:grid-cols-2 md:grid-cols-3">
              {items.map((item) => <li key={item.href}><NavLink href={item.href} large>{item.label}</NavLink></li>)}
            </ul>
          </nav>
          {menuSearch ? <div className="sm:hidden">{menuSearch}</div> : null}
          <div className="border-t border-on-bar/20 pt-3">{account}</div>
        </div>
      ) : null}
    </header>
  );
}

function MenuIcon({ open }: { open: boolean }) {
  return (
    <svg width="18" height="18" viewBox="0 0 24 24" aria-hidden="true" stroke="currentColor" strokeWidth="2" fill="none">
      {open ? <path d="M5 5l14 14M19 5L5 19" /> : <path d="M3 6h18M3 12h18M3 18h18" />}
    </svg>
  );
}
