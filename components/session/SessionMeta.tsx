/**
 * The lines under a session's title: its day, where it sits in the
 * programme, and whether it was moved, logged or done.
 */
import { longDate, shortDate } from "./dates";
import type { SessionMetaData } from "./types";

export function SessionMeta({ session }: { session: SessionMetaData }) {
  return (
    <div className="flex flex-wrap items-center gap-2 text-base text-iron-700" data-testid="session-meta">
      <span className="w-full font-semibold text-iron" data-testid="session-date">
        {longDate(session.date)}
      </span>
      <span>
        {session.block} week {session.week} <span aria-hidden="true">·</span> {session.templateTitle}
      </span>
      {session.deload ? <Badge className="bg-moss-100 text-moss-700">Deload</Badge> : null}
      {session.completed ? (
        <Badge className="bg-moss text-white">Done</Badge>
      ) : session.logged ? (
        <Badge className="bg-brass-100 text-iron">Logged in part</Badge>
      ) : null}
      {session.date !== session.plannedDate ? <span className="w-full text-sm text-iron-700">Moved from {shortDate(session.plannedDate)}</span> : null}
    </div>
  );
}

function Badge({ className, children }: { className: string; children: string }) {
  return <span className={`rounded px-2 py-0.5 text-xs font-bold uppercase tracking-wider ${className}`}>{children}</span>;
}
