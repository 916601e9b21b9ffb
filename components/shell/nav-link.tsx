"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export function NavLink({ href, large = false, children }: { href: string; large?: boolean; children: React.ReactNode }) {
  const path = usePathname();
  const active = href === "/" ? path === "/" : path === href || path.startsWith(`${href}/`);
  const size = large ? "flex min-h-11 items-center px-3 py-2 text-base" : "px-2.5 py-1.5 text-sm";
  return (
    <Link
      href={href}
      aria-current={active ? "page" : undefined}
      className={`block whitespace-nowrap rounded text-on-bar no-underline hover:bg-on-bar/10 hover:no-underline ${size} ${active ? "bg-on-bar/15 font-semibold" : ""}`}
    >
      {children}
    </Link>
  );
}
