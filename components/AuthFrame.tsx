import Link from "next/link";
import type { ReactNode } from "react";
import { Nameplate } from "./Nameplate";

export function AuthFrame({ title, lead, children, footer }: { title: string; lead: string; children: ReactNode; footer: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col items-center justify-center px-4 py-10">
      <Link href="/" aria-label="Ironquill home" className="mb-8">
        <Nameplate subtitle="programmes, worked" />
      </Link>
      <div className="panel w-full max-w-sm p-6 sm:p-8">
        <h1 className="text-xl font-bold tracking-tight">{title}</h1>
        <p className="mt-1 text-sm text-iron-500">{lead}</p>
        <div className="mt-6">{children}</div>
      </div>
      <div className="mt-6 text-sm text-iron-500">{footer}</div>
    </div>
  );
}
