import Link from "next/link";
import type { ReactNode } from "react";
import { Nameplate } from "@/components/Nameplate";
import { SignOutButton } from "@/components/SignOutButton";
import type { Viewer } from "@/server/auth";

const HOME = { admin: "/admin", coach: "/coach", athlete: "/athlete" } as const;

/**
 * The store's frame: public pages readable without signing in, so a light
 * header of its own rather than an area's dark bar, with the way back to
 * the viewer's own area when they are signed in.
 */
export function StoreFrame({ viewer, children }: { viewer: Viewer | null; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-chalk-300 bg-white">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-3 px-4 py-3">
          <Link href="/store" aria-label="Ironquill store">
            <Nameplate subtitle="programme store" />
          </Link>
          <nav aria-label="Store" className="ml-auto flex flex-wrap items-center gap-1 text-sm">
            <Link href="/store" className="rounded-md px-3 py-2 font-medium text-iron-700 hover:bg-chalk-200">All programmes</Link>
            {viewer?.role === "athlete" ? <Link href="/store/purchases" className="rounded-md px-3 py-2 font-medium text-iron-700 hover:bg-chalk-200">Your purchases</Link> : null}
            {viewer?.role === "coach" ? <Link href="/coach/sales" className="rounded-md px-3 py-2 font-medium text-iron-700 hover:bg-chalk-200">Your sales</Link> : null}
            {viewer ? (
              <>
                <Link href={HOME[viewer.role]} className="rounded-md px-3 py-2 font-medium text-iron-700 hover:bg-chalk-200">
                  {viewer.role === "athlete" ? "Training" : viewer.role === "coach" ? "Coach desk" : "Admin"}
                </Link>
                <span className="[&_button]:text-iron-500 [&_button:hover]:bg-chalk-200 [&_button:hover]:text-iron">
                  <SignOutButton />
                </span>
              </>
            ) : (
              <Link href="/signin?callbackUrl=%2Fstore" className="rounded-md px-3 py-2 font-semibold text-ember-600 hover:bg-chalk-200">Sign in</Link>
            )}
          </nav>
        </div>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:py-8">{children}</main>
      <footer className="mx-auto w-full max-w-6xl px-4 py-6 text-xs text-iron-400">Programmes are written by independent coaches. Prices include any tax the coach owes; payment is handled by our payment provider.</footer>
    </div>
  );
}
