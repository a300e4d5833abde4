/**
 * What a printed card says, worked out from a lib/load Session before any
 * layout: dates spelled out, sets grouped the way the preview groups them,
 * loads and plates in the athlete's unit. Pure, so it is tested without a PDF.
 *
 * @example
 * const card = cardView(session, { athlete: "Tomas Novák" });
 * card.exercises[0].work[0]; // { count: 4, reps: "5–7", load: "67.5 kg", plates: "20 · 2.5 · 1.25" }
 */
import type { ExerciseOut, Session, SetOut, SubstituteOut } from "../lib/load/types";
import { groupSets, loadText, num, platesText, repsText, restText } from "../components/preview/format";

export interface SetLine {
  count: number;
  /** "5–7", "5+", "45 s". */
  reps: string;
  /** "67.5 kg", "BW + 5 kg", or "" when no load could be worked out. */
  load: string;
  /** The same without the unit ("67.5"), for warm-up steps under a heading that names it. */
  bare: string;
  /** "20 · 2.5 · 1.25", "bar only", or null off the barbell. */
  plates: string | null;
}

export interface SubstituteLine {
  name: string;
  /** "3 × 10–12 · 60 kg · 20 · 5 a side", or the reason there is no load. */
  text: string;
}

export interface CardExercise {
  label: string | null;
  name: string;
  effort: string | null;
  /** "rest 90 s", "tempo 3110", "pause 1 s". */
  details: string[];
  cue: string | null;
  note: string | null;
  warmups: SetLine[];
  work: SetLine[];
  /** One write-in cell per work set. */
  workSets: number;
  timed: boolean;
  substitutes: SubstituteLine[];
}

export interface CardView {
  athlete: string;
  units: string;
  /** "Mon 4 Jan 2027". */
  dateText: string;
  date: string;
  isoWeek: string;
  day: string;
  /** "Accumulate · week 1 · programme week 1". */
  blockText: string;
  deload: boolean;
  warmupNotes: string[];
  exercises: CardExercise[];
}

const WEEKDAY = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];
const MONTH = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/** "2027-01-04" → "Mon 4 Jan 2027", computed on the calendar date itself (no time zone). */
export function longDate(date: string): string {
  const [y, m, d] = date.split("-").map(Number);
  const js = new Date(Date.UTC(y, m - 1, d));
  return `${WEEKDAY[(js.getUTCDay() + 6) % 7]} ${d} ${MONTH[m - 1]} ${y}`;
}

/** "7–13 Dec 2026", "30 Nov – 27 Dec 2026", "28 Dec 2026 – 3 Jan 2027". */
export function longDateRange(from: string, to: string): string {
  const [fy, fm, fd] = from.split("-").map(Number);
  const [ty, tm, td] = to.split("-").map(Number);
  if (fy !== ty) return `${fd} ${MONTH[fm - 1]} ${fy} – ${td} ${MONTH[tm - 1]} ${ty}`;
  if (fm !== tm) return `${fd} ${MONTH[fm - 1]} – ${td} ${MONTH[tm - 1]} ${ty}`;
  return `${fd}–${td} ${MONTH[tm - 1]} ${ty}`;
}

function setLine(count: number, s: SetOut, units: string): SetLine {
  const load = loadText(s, units);
  return { count, reps: repsText(s), load, bare: load.endsWith(` ${units}`) ? load.slice(0, -units.length - 1) : load, plates: s.perSide ? platesText(s) : null };
}

function lines(sets: readonly SetOut[], kind: SetOut["kind"], units: string): SetLine[] {
  return groupSets(sets.filter((s) => s.kind === kind)).map((g) => setLine(g.count, g.set, units));
}

function substituteText(sub: SubstituteOut, units: string): string {
  const work = lines(sub.sets, "work", units);
  const first = work[0];
  const parts: string[] = [];
  if (first) {
    const total = work.reduce((n, w) => n + w.count, 0);
    parts.push(`${total} × ${first.reps}`);
    if (first.load) parts.push(first.load);
    if (first.plates) parts.push(`${first.plates} a side`);
  }
  const text = parts.join(" · ");
  return !first?.load && sub.loadNote ? `${text} (${sub.loadNote})` : text;
}

function exerciseView(ex: ExerciseOut, units: string): CardExercise {
  const details: string[] = [];
  const rest = restText(ex.restSeconds);
  if (rest) details.push(`rest ${rest}`);
  if (ex.tempo) details.push(`tempo ${ex.tempo}`);
  if (ex.pauseSeconds !== null) details.push(`pause ${num(ex.pauseSeconds)} s`);
  const workSets = ex.sets.filter((s) => s.kind === "work");
  return {
    label: ex.label,
    name: ex.name,
    effort: ex.effort,
    details,
    cue: ex.cue,
    note: ex.loadNote,
    warmups: lines(ex.sets, "warmup", units),
    work: lines(ex.sets, "work", units),
    workSets: workSets.length,
    timed: workSets.length > 0 && workSets.every((s) => s.seconds !== null),
    substitutes: ex.substitutes.map((sub) => ({ name: sub.name, text: substituteText(sub, units) })),
  };
}

export function cardView(session: Session, who: { athlete: string }): CardView {
  const week = `week ${session.week}`;
  const programmeWeek = session.weekInProgramme !== session.week ? ` · programme week ${session.weekInProgramme}` : "";
  return {
    athlete: who.athlete,
    units: session.units,
    dateText: longDate(session.date),
    date: session.date,
    isoWeek: session.isoWeek,
    day: session.day,
    blockText: `${session.block} · ${week}${programmeWeek}`,
    deload: session.deload,
    warmupNotes: session.warmupNotes,
    exercises: session.exercises.map((ex) => exerciseView(ex, session.units)),
  };
}
