/**
 * One session on the calendar: its title, how many lifts, and whether it is
 * done, logged in part or still to do. The whole card is the link.
 */
import Link from "next/link";
import type { CalendarItem } from "./types";

export type SessionState = "done" | "logged" | "planned";

export function stateOf(item: CalendarItem): SessionState {
  return item.completed ? "done" : item.logged ? "logged" : "planned";
}

const STATE_STYLE: Record<SessionState, { card: string; label: string }> = {
  done: { card: "border-moss bg-moss-100", label: "Done" },
  logged: { card: "border-brass-500 bg-brass-100", label: "Logged in part" },
  planned: { card: "border-iron-200 bg-white", label: "To do" },
};

export function SessionCard({ item, href, roomy = false }: { item: CalendarItem; href: string; roomy?: boolean }) {
  const state = stateOf(item);
  const style = STATE_STYLE[state];
  return (
    <Link
      href={href}
      className={`block rounded-lg border-l-4 border ${style.card} px-3 py-2 text-iron shadow-sm hover:border-ember focus-visible:border-ember`}
      data-testid="calendar-session"
      data-session-id={item.id}
      data-state={state}
    >
      <span className={`block font-semibold leading-snug ${roomy ? "text-base" : "text-sm"}`}>{item.day || item.title}</span>
      <span className="block text-sm text-iron-700">
        {item.exerciseCount} {item.exerciseCount === 1 ? "lift" : "lifts"}
        {roomy ? ` · ${item.block} week ${item.week}` : ""}
        {item.deload ? " · deload" : ""}
      </span>
      <span className="mt-0.5 block text-xs font-bold uppercase tracking-wider text-iron-700">
        {state === "done" ? "✓ " : ""}
        {style.label}
        {item.date !== item.plannedDate ? " · moved" : ""}
      </span>
    </Link>
  );
}
