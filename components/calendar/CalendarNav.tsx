/**
 * Previous / today / next and the month–week switch, as plain links that
 * change the page's search params (so the back button and shared links work).
 */
import Link from "next/link";
import { calendarQuery, type CalendarView } from "@/lib/calendar";

export function CalendarNav({ view, basePath }: { view: CalendarView; basePath: string }) {
  const href = (p: Parameters<typeof calendarQuery>[0]) => `${basePath}${calendarQuery(p)}`;
  const unit = view.kind === "month" ? "month" : "week";
  const tab = "flex min-h-11 items-center px-4 text-sm font-semibold";
  return (
    <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
      <div className="flex items-center gap-2">
        <Link href={href(view.prev)} className="btn-quiet min-h-11 min-w-11 px-3" aria-label={`Previous ${unit}`} data-testid="calendar-prev">
          ←
        </Link>
        <h2 className="min-w-0 text-lg font-bold text-iron sm:text-xl" data-testid="calendar-title" aria-live="polite">
          {view.title}
        </h2>
        <Link href={href(view.next)} className="btn-quiet min-h-11 min-w-11 px-3" aria-label={`Next ${unit}`} data-testid="calendar-next">
          →
        </Link>
      </div>
      <div className="flex items-center gap-2">
        <Link href={href(view.current)} className="btn-quiet min-h-11" data-testid="calendar-today">
          {view.kind === "month" ? "This month" : "This week"}
        </Link>
        <nav aria-label="Calendar view" className="flex overflow-hidden rounded-md border border-iron-200 bg-white">
          {view.kind === "month" ? (
            <>
              <span className={`${tab} bg-iron text-white`} aria-current="page">Month</span>
              <Link href={href(view.other)} className={`${tab} text-iron hover:bg-chalk-100`} data-testid="calendar-switch">Week</Link>
            </>
          ) : (
            <>
              <Link href={href(view.other)} className={`${tab} text-iron hover:bg-chalk-100`} data-testid="calendar-switch">Month</Link>
              <span className={`${tab} bg-iron text-white`} aria-current="page">Week</span>
            </>
          )}
        </nav>
      </div>
    </div>
  );
}
