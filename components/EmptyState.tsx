import type { ReactNode } from "react";

/** A calm, specific empty state: what will live here and the first step to fill it. */
export function EmptyState({ title, children, action, icon }: { title: string; children: ReactNode; action?: ReactNode; icon?: ReactNode }) {
  return (
    <div className="panel flex flex-col items-center px-6 py-10 text-center sm:py-14">
      <div className="mb-4 flex h-12 w-12 items-center justify-center rounded-full bg-chalk-200 text-iron-600">{icon ?? <PlateIcon />}</div>
      <h2 className="text-lg font-semibold text-iron">{title}</h2>
      <div className="mt-2 max-w-md text-sm leading-relaxed text-iron-500">{children}</div>
      {action ? <div className="mt-6">{action}</div> : null}
    </div>
  );
}

function PlateIcon() {
  return (
    <svg viewBox="0 0 24 24" className="h-6 w-6" fill="none" stroke="currentColor" strokeWidth="1.8" aria-hidden="true">
      <circle cx="12" cy="12" r="9" />
      <circle cx="12" cy="12" r="2.5" />
    </svg>
  );
}
