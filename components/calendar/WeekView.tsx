/**
 * One ISO week, Monday to Sunday: seven columns on a wide screen, seven rows
 * on a phone, every day shown (a day without a session says so).
 */
import type { WeekStrip } from "@/lib/calendar";
import { itemsByDate } from "@/lib/calendar";
import { SessionCard } from "./SessionCard";
import type { CalendarItem, SessionHref } from "./types";

const DAY_LABEL = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "short", timeZone: "UTC" });

export function WeekView({ strip, items, sessionHref }: { strip: WeekStrip; items: readonly CalendarItem[]; sessionHref: SessionHref }) {
  const byDay = itemsByDate(items);
  return (
    <ol className="grid gap-2 sm:grid-cols-7" data-testid="calendar-week-strip" aria-label={`Week ${strip.label}`}>
      {strip.days.map((day) => {
        const sessions = byDay.get(day.date) ?? [];
        return (
          <li
            key={day.date}
            className={`panel min-h-20 p-2 sm:min-h-48 ${day.today ? "bg-ember-50 ring-2 ring-ember" : ""}`}
            data-testid="calendar-day"
            data-date={day.date}
            data-today={day.today ? "true" : undefined}
            aria-current={day.today ? "date" : undefined}
          >
            <h3 className="flex items-baseline justify-between gap-2 text-sm font-bold text-iron">
              <span>{DAY_LABEL.format(new Date(`${day.date}T00:00:00Z`))}</span>
              {day.today ? <span className="text-xs font-bold uppercase tracking-wider text-ember-700">Today</span> : null}
            </h3>
            <div className="mt-2 space-y-2">
              {sessions.map((s) => (
                <SessionCard key={s.id} item={s} href={`${sessionHref}${s.id}`} roomy />
              ))}
              {sessions.length === 0 ? <p className="text-sm text-iron-700">Rest</p> : null}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
