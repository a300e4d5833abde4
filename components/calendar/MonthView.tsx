/**
 * A month in ISO weeks, Monday first. On a wide screen it is a grid of seven
 * columns with the week number on the left; on a phone the same markup folds
 * into a list by week showing only the days with a session (and today), so
 * there are no tiny cells to tap.
 */
import type { MonthGrid } from "@/lib/calendar";
import { itemsByDate } from "@/lib/calendar";
import { SessionCard } from "./SessionCard";
import type { CalendarItem, SessionHref } from "./types";

const WEEKDAYS = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];
const DAY_LABEL = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });
const label = (date: string) => DAY_LABEL.format(new Date(`${date}T00:00:00Z`));

export function MonthView({ grid, items, sessionHref }: { grid: MonthGrid; items: readonly CalendarItem[]; sessionHref: SessionHref }) {
  const byDay = itemsByDate(items);
  return (
    <div className="panel overflow-hidden" data-testid="calendar-month">
      <div className="hidden border-b border-chalk-300 bg-chalk-100 sm:grid sm:grid-cols-[3.5rem_repeat(7,minmax(0,1fr))]" aria-hidden="true">
        <span className="px-2 py-2 text-xs font-bold uppercase tracking-wider text-iron-700">Week</span>
        {WEEKDAYS.map((d) => (
          <span key={d} className="px-2 py-2 text-xs font-bold uppercase tracking-wider text-iron-700">
            {d}
          </span>
        ))}
      </div>
      {grid.weeks.map((week) => {
        const busy = week.days.some((d) => byDay.has(d.date));
        return (
          <section key={week.label} aria-label={`Week ${week.label}`} className="border-b border-chalk-300 last:border-b-0 sm:grid sm:grid-cols-[3.5rem_repeat(7,minmax(0,1fr))]" data-testid="calendar-week">
            <h3 className="bg-chalk-100 px-3 py-2 text-sm font-bold text-iron sm:bg-transparent sm:px-2 sm:text-xs sm:font-semibold sm:text-iron-700">
              <span className="sm:hidden">Week {week.week} · {label(week.days[0].date)} – {label(week.days[6].date)}</span>
              <span className="hidden sm:inline" title={week.label}>W{String(week.week).padStart(2, "0")}</span>
            </h3>
            {week.days.map((day) => {
              const sessions = byDay.get(day.date) ?? [];
              // On a phone only days with something to show take a row.
              const phone = sessions.length > 0 || day.today ? "flex" : "hidden";
              return (
                <div
                  key={day.date}
                  className={`${phone} gap-3 border-t border-chalk-200 px-3 py-2 sm:block sm:min-h-28 sm:border-t-0 sm:border-l sm:px-1.5 sm:py-1.5 ${day.today ? "bg-ember-50 ring-2 ring-inset ring-ember" : day.inMonth ? "" : "bg-chalk-100"}`}
                  data-testid="calendar-day"
                  data-date={day.date}
                  data-today={day.today ? "true" : undefined}
                  aria-current={day.today ? "date" : undefined}
                >
                  <div className="w-20 shrink-0 sm:w-auto">
                    <span className="text-sm font-semibold text-iron sm:hidden">{label(day.date)}</span>
                    <span
                      className={`hidden h-7 w-7 items-center justify-center rounded-full text-sm font-semibold sm:inline-flex ${day.today ? "bg-ember text-white" : day.inMonth ? "text-iron" : "text-iron-400"}`}
                    >
                      {day.day}
                    </span>
                    {day.today ? <span className="block text-xs font-bold uppercase tracking-wider text-ember-700 sm:inline sm:pl-1">Today</span> : null}
                  </div>
                  <div className="min-w-0 flex-1 space-y-1.5 sm:mt-1">
                    {sessions.map((s) => (
                      <SessionCard key={s.id} item={s} href={`${sessionHref}${s.id}`} />
                    ))}
                    {sessions.length === 0 && day.today ? <span className="text-sm text-iron-700 sm:hidden">Rest day</span> : null}
                  </div>
                </div>
              );
            })}
            {!busy && !week.days.some((d) => d.today) ? <p className="border-t border-chalk-200 px-3 py-2 text-sm text-iron-700 sm:hidden">No sessions this week.</p> : null}
          </section>
        );
      })}
    </div>
  );
}
