"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

/** A section link that marks itself current; an area's home matches only exactly. */
export function NavLink({ href, label, exact }: { href: string; label: string; exact: boolean }) {
  const path = usePathname() ?? "";
  const current = exact ? path === href : path === href || path.startsWith(`${href}/`);
  return (
    <Link
      href={href}
      aria-current={current ? "page" : undefined}
      className={`block whitespace-nowrap border-b-2 px-3 py-2.5 text-sm font-medium ${current ? "border-ember-400 text-white" : "border-transparent text-iron-200 hover:text-white"}`}
    >
      {label}
    </Link>
  );
}
