/** Small builders for the progress tests. */
import type { LoggedSet, SessionBest } from "./types";

export function set(over: Partial<LoggedSet> = {}): LoggedSet {
  return {
    sessionId: "s1",
    date: "2027-01-04",
    exercise: "back squat",
    exerciseKey: "back-squat",
    kind: "work",
    done: true,
    reps: 5,
    load: 100,
    rir: 0,
    unit: "kg",
    bodyweight: false,
    plannedReps: 5,
    plannedLoad: 100,
    model: "brzycki",
    ...over,
  };
}

export function best(date: string, e1rm: number, over: Partial<SessionBest> = {}): SessionBest {
  return { sessionId: `s-${date}`, date, exercise: "back squat", exerciseKey: "back-squat", e1rm, reps: 5, load: 100, rir: 0, ...over };
}
