"use client";

/**
 * Where the athlete's sets are: all saved, on their way, or kept on the phone
 * while there is no connection. Never quiet about sets that are not saved.
 */
export function SyncBanner({ online, pending, failed, trouble, onRetryAll }: { online: boolean; pending: number; failed: number; trouble: boolean; onRetryAll: () => void }) {
  const sets = (n: number) => `${n} change${n === 1 ? "" : "s"}`;
  if (!online) {
    return (
      <div role="status" data-testid="sync-status" data-state="offline" className="sticky top-0 z-20 -mx-4 mb-4 border-b border-brass-500/50 bg-brass-100 px-4 py-3 text-sm text-iron-700">
        <p className="font-semibold">You&apos;re offline.</p>
        <p>{pending > 0 ? `${sets(pending)} kept on this phone; ${pending === 1 ? "it saves" : "they save"} by ${pending === 1 ? "itself" : "themselves"} when you're back online.` : "Keep logging: sets are kept on this phone until you're back online."}</p>
      </div>
    );
  }
  if (failed > 0) {
    return (
      <div role="alert" data-testid="sync-status" data-state="error" className="sticky top-0 z-20 -mx-4 mb-4 border-b border-ember-400 bg-ember-50 px-4 py-3 text-sm text-ember-700">
        <p className="font-semibold">{sets(failed)} could not be saved.</p>
        <p>Your values are still here, marked below. Fix them or try again.</p>
      </div>
    );
  }
  if (pending > 0) {
    return (
      <div role="status" data-testid="sync-status" data-state="pending" className="sticky top-0 z-20 -mx-4 mb-4 flex items-center justify-between gap-3 border-b border-chalk-300 bg-chalk-50 px-4 py-2 text-sm text-iron-600">
        <span>{trouble ? `Can't reach Ironquill yet — ${sets(pending)} kept on this phone, trying again.` : `Saving ${sets(pending)}…`}</span>
        {trouble ? (
          <button type="button" className="btn-quiet h-10 shrink-0 py-1" onClick={onRetryAll}>
            Try now
          </button>
        ) : null}
      </div>
    );
  }
  return (
    <p role="status" data-testid="sync-status" data-state="saved" className="mb-3 text-right text-xs text-moss-700">
      ✓ Everything saved
    </p>
  );
}
