import Link from "next/link";
import type { ReactNode } from "react";
import { NavLink } from "./NavLink";
import { NibMark } from "./Nameplate";
import { SignOutButton } from "./SignOutButton";

export type NavItem = { href: string; label: string };

const AREA_LABEL = { coach: "Coach desk", athlete: "Training", admin: "Admin" } as const;

/**
 * The frame of every signed-in area: a dark bar with the mark, the area's
 * sections and the account, collapsing to a scrollable row on a phone.
 */
export function AppShell({ area, nav, viewerName, children }: { area: keyof typeof AREA_LABEL; nav: NavItem[]; viewerName: string; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="bg-iron text-white">
        <div className="mx-auto flex max-w-6xl items-center gap-4 px-4 py-3">
          <Link href="/" className="flex items-center gap-2" aria-label="Ironquill home">
            <NibMark className="h-7 w-7" />
            <span className="text-base font-bold tracking-tight">
              Iron<span className="text-ember-400">quill</span>
            </span>
          </Link>
          <span className="hidden rounded bg-iron-700 px-2 py-0.5 text-[11px] font-semibold uppercase tracking-[0.12em] text-iron-200 sm:inline">{AREA_LABEL[area]}</span>
          <div className="ml-auto flex items-center gap-1">
            <span className="hidden max-w-[14rem] truncate text-sm text-iron-300 sm:inline" data-testid="viewer-name">
              {viewerName}
            </span>
            <SignOutButton />
          </div>
        </div>
        <nav aria-label={`${AREA_LABEL[area]} sections`} className="border-t border-iron-700">
          <ul className="mx-auto flex max-w-6xl gap-1 overflow-x-auto px-2">
            {nav.map((item) => (
              <li key={item.href}>
                <NavLink href={item.href} label={item.label} exact={item.href === nav[0]?.href} />
              </li>
            ))}
          </ul>
        </nav>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:py-8">{children}</main>
    </div>
  );
}

export function PageTitle({ title, lead, actions }: { title: string; lead?: string; actions?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-3">
      <div>
        <h1 className="text-2xl font-bold tracking-tight text-iron sm:text-3xl">{title}</h1>
        {lead ? <p className="mt-1 max-w-2xl text-sm text-iron-500">{lead}</p> : null}
      </div>
      {actions}
    </div>
  );
}

export function Forbidden({ area }: { area: string }) {
  return (
    <div className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-6 text-center">
      <NibMark className="h-10 w-10" />
      <h1 className="mt-4 text-xl font-bold text-iron">This area isn&apos;t yours</h1>
      <p className="mt-2 text-sm text-iron-500" data-testid="forbidden">
        Your account can&apos;t open the {area}. If you think it should, ask the person who runs your Ironquill account.
      </p>
      <Link href="/dashboard" className="btn-quiet mt-6">
        Back to your own area
      </Link>
    </div>
  );
}
