import "server-only";
import ical, { ICalCalendarMethod } from "ical-generator";
import { CAUTION_TEXT } from "@/components/Caution";
import { planLines } from "@/components/session/planText";
import type { FeedContent } from "@/db/calendarFeeds";

/**
 * The feed as iCalendar text (RFC 5545): one all-day event per session, its
 * UID taken from the session id so a moved or recomputed session updates in
 * place instead of appearing twice.
 */
export function feedCalendar(feed: FeedContent, origin: string): string {
  const cal = ical({
    name: `Training · ${feed.athleteName}`,
    prodId: { company: "Ironquill", product: "Training calendar", language: "EN" },
    method: ICalCalendarMethod.PUBLISH,
    // Calendar apps that honour it re-read the feed every few hours.
    ttl: 60 * 60 * 4,
  });
  for (const s of feed.sessions) {
    cal.createEvent({
      id: `${s.id}@ironquill`,
      // A calendar date, not an instant: the session is on that day wherever the athlete is.
      start: s.date,
      allDay: true,
      summary: s.title,
      description: [...planLines(s.plan), "", CAUTION_TEXT].join("\n"),
      url: `${origin}/athlete/sessions/${s.id}`,
    });
  }
  return cal.toString();
}
