"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export function NavLink({ href, children }: { href: string; children: React.ReactNode }) {
  const path = usePathname();
  const active = href === "/" ? path === "/" : path === href || path.startsWith(`${href}/`);
  return (
    <Link
      href={href}
      aria-current={active ? "page" : undefined}
      className={`rounded px-3 py-1.5 text-sm text-paper no-underline hover:bg-paper/10 hover:no-underline ${active ? "bg-paper/15 font-semibold" : ""}`}
    >
      {children}
    </Link>
  );
}
