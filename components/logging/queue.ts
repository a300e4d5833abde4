/**
 * The phone's own copy of changes not yet saved, kept in localStorage so a
 * dropped connection, a closed tab or a flat battery between sets loses
 * nothing. One entry per set (or per exercise note/swap); a newer change to
 * the same set replaces the older one, and the server ignores a replay older
 * than what it has (clientTime), so sending twice is harmless.
 */
export type QueueEntry =
  | { key: string; kind: "set"; body: { exerciseIndex: number; setIndex: number; exercise: string; reps: number; load: number; rir: number | null; done: boolean; clientId: string; clientTime: string }; error: string | null }
  | { key: string; kind: "exercise"; body: { exerciseIndex: number; exercise?: string; note?: string | null }; clientTime: string; error: string | null };

export type Queue = Record<string, QueueEntry>;

const storageKey = (sessionId: string) => `iq.log-queue.v1.${sessionId}`;

export const setKey = (exerciseIndex: number, setIndex: number) => `set:${exerciseIndex}:${setIndex}`;
export const exerciseKeyOf = (exerciseIndex: number) => `exercise:${exerciseIndex}`;

export function readQueue(sessionId: string): Queue {
  if (typeof window === "undefined") return {};
  try {
    const raw = window.localStorage.getItem(storageKey(sessionId));
    const parsed = raw ? (JSON.parse(raw) as unknown) : {};
    return parsed && typeof parsed === "object" && !Array.isArray(parsed) ? (parsed as Queue) : {};
  } catch {
    return {};
  }
}

export function writeQueue(sessionId: string, queue: Queue): void {
  if (typeof window === "undefined") return;
  try {
    if (Object.keys(queue).length === 0) window.localStorage.removeItem(storageKey(sessionId));
    else window.localStorage.setItem(storageKey(sessionId), JSON.stringify(queue));
  } catch {
    // Storage full or blocked (private mode): the in-memory queue still holds the change until it saves.
  }
}

/** A time that never goes backwards on this phone, so two quick taps keep their order. */
let last = 0;
export function clientNow(): string {
  const now = Math.max(Date.now(), last + 1);
  last = now;
  return new Date(now).toISOString();
}

export function entryTime(e: QueueEntry): string {
  return e.kind === "set" ? e.body.clientTime : e.clientTime;
}
