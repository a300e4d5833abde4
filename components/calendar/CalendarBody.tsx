/**
 * The calendar of one athlete, shared by the athlete's page and the coach's:
 * navigation, then the month grid or the week strip with the sessions on it.
 */
import type { CalendarView } from "@/lib/calendar";
import { CalendarNav } from "./CalendarNav";
import { MonthView } from "./MonthView";
import { WeekView } from "./WeekView";
import type { CalendarItem, SessionHref } from "./types";

export function CalendarBody({ view, items, basePath, sessionHref }: { view: CalendarView; items: readonly CalendarItem[]; basePath: string; sessionHref: SessionHref }) {
  return (
    <div data-testid="calendar" data-view={view.kind}>
      <CalendarNav view={view} basePath={basePath} />
      {view.fellBack ? (
        <p role="status" className="mb-3 text-sm text-iron-700">
          That link asked for a {view.kind} we could not read, so this is the current one.
        </p>
      ) : null}
      {view.kind === "month" ? <MonthView grid={view.grid} items={items} sessionHref={sessionHref} /> : <WeekView strip={view.strip} items={items} sessionHref={sessionHref} />}
      {items.length === 0 ? (
        <p className="mt-3 text-base text-iron-700" data-testid="calendar-empty">
          No sessions in this {view.kind}.
        </p>
      ) : null}
    </div>
  );
}
