/**
 * What the logging screen exchanges with /api/sessions/[id]/log — plain data
 * shapes mirrored from db/logs.ts and db/progress.ts so client code never
 * imports server modules.
 */
import type { Session as SessionPlan } from "@/lib/load/types";

export type Units = "kg" | "lb";

export type SetLog = {
  exerciseIndex: number;
  setIndex: number;
  kind: "warmup" | "work";
  exercise: string;
  exerciseKey: string;
  plannedExercise: string;
  plannedReps: number | null;
  plannedLoad: number | null;
  reps: number;
  load: number;
  unit: Units;
  rir: number | null;
  done: boolean;
  clientTime: string;
};

export type ExerciseLog = { exerciseIndex: number; exercise: string; note: string | null };

export type LogSheet = {
  session: {
    id: string;
    athleteId: string;
    athleteName: string;
    date: string;
    title: string;
    units: Units;
    model: string;
    plan: SessionPlan;
    loggedAt: string | null;
    completedAt: string | null;
  };
  sets: SetLog[];
  exercises: ExerciseLog[];
  canWrite: boolean;
};

export type Summary = {
  sessionId: string;
  date: string;
  title: string;
  units: Units;
  completedAt: string | null;
  minutes: number | null;
  totals: { workSetsDone: number; workSetsPlanned: number; reps: number; volume: number };
  exercises: {
    index: number;
    name: string;
    plannedName: string;
    setsDone: number;
    workSets: number;
    top: { reps: number; load: number; rir: number | null; bodyweight: boolean } | null;
    e1rm: number | null;
    pb: boolean;
    note: string | null;
  }[];
};

/** One set as the athlete has it on screen: saved, waiting in the queue, or a draft. */
export type SetValues = { reps: number; load: number; rir: number | null; done: boolean };
