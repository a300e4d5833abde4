/**
 * Expand a programme for one athlete into dated sessions with worked loads.
 *
 * Never throws on a model the notation accepts: anything that cannot be worked out becomes a
 * diagnostic, an empty load with a `loadNote`, or a skipped week — never an invented number.
 *
 * Rotations (`{a | b} rotate 2w`) count weeks from the programme's first week across blocks:
 * weeks 1–2 use the first variation, 3–4 the second, and so on, wrapping round. A rotation with
 * no `rotate` period changes variation every week. Substitutes carry their own loads, worked
 * from their own maxes; a fixed or bodyweight load written on the line carries over only to a
 * substitute on the same kind of equipment.
 *
 * @example
 * const { sessions } = expandProgramme(programme, athlete, { start: "2027-01-04", days: ["mon", "thu"] });
 * sessions[0].exercises[0].sets.at(-1)?.load; // 82.5
 */
import { WEEKDAYS, type Exercise, type Programme, type Unit } from "../notation/model";
import type { AthleteProfile } from "../athlete/profile";
import { isDateString } from "../dates/date";
import { isoWeekLabel } from "../dates/isoWeek";
import { createContext, prescribe } from "./prescription";
import { scheduleWeeks } from "./schedule";
import { effortText } from "./effort";
import { weekProgression } from "./progression";
import type { ExerciseOut, ExpandDiagnostic, ExpandOptions, ExpandResult, Session } from "./types";

/** Programmes longer than this many weeks (ten years) are cut, with a warning. */
export const MAX_WEEKS = 520;

/**
 * Which variation of a rotation a programme week uses (0-based).
 * @example variationFor(3, 2, 2); // 1 (weeks 3–4 use the second variation)
 */
export function variationFor(weekInProgramme: number, rotateWeeks: number | null, count: number): number {
  if (count <= 1) return 0;
  const period = rotateWeeks !== null && rotateWeeks >= 1 ? Math.floor(rotateWeeks) : 1;
  return Math.floor((weekInProgramme - 1) / period) % count;
}

/** The week's effort target as printed; a %-based line shows this week's percentage. */
function effortOf(ex: Exercise, weekOfBlock: number, unit: Unit): string | null {
  const percentLine = ex.intensity?.kind === "percent" && ex.load === null;
  return effortText(ex.intensity, percentLine ? weekProgression(ex.progression, weekOfBlock, unit, true).addPercentPoints : 0);
}

/**
 * Expand `programme` for `athlete` from `options.start`. Sessions come in date order (programme
 * order on the same date), exercises in written order, one set entry per set.
 * @example expandProgramme(programme, athlete, { start: "2027-01-04", weeks: 1 }).sessions.length; // days in week 1
 */
export function expandProgramme(programme: Programme, athlete: AthleteProfile, options: ExpandOptions): ExpandResult {
  const diagnostics: ExpandDiagnostic[] = [];
  const seen = new Set<string>();
  const report = (d: ExpandDiagnostic) => {
    const key = `${d.code}|${d.line}|${d.message}`;
    if (!seen.has(key)) {
      seen.add(key);
      diagnostics.push(d);
    }
  };

  if (!isDateString(options.start)) {
    report({ severity: "error", code: "bad-start", message: `start date must be YYYY-MM-DD, got "${options.start}"`, line: null });
    return { sessions: [], diagnostics };
  }
  const badDay = options.days?.find((d) => !(WEEKDAYS as readonly string[]).includes(d));
  if (badDay !== undefined) {
    report({ severity: "error", code: "bad-days", message: `"${badDay}" is not a weekday (mon … sun)`, line: null });
    return { sessions: [], diagnostics };
  }
  let weeks = options.weeks;
  if (weeks !== undefined && !(Number.isInteger(weeks) && weeks >= 0)) {
    report({ severity: "error", code: "bad-weeks", message: `weeks must be a whole number, got ${weeks}`, line: null });
    return { sessions: [], diagnostics };
  }
  const total = programme.blocks.reduce((s, b) => s + Math.max(0, b.weeks), 0);
  if (total > MAX_WEEKS && (weeks === undefined || weeks > MAX_WEEKS)) {
    report({ severity: "warning", code: "too-many-weeks", message: `the programme runs ${total} weeks; only the first ${MAX_WEEKS} are expanded`, line: null });
    weeks = MAX_WEEKS;
  }
  if (weeks !== undefined && weeks > total) {
    report({ severity: "info", code: "short-programme", message: `the programme has only ${total} weeks`, line: null });
  }

  const ctx = createContext(programme, athlete, report, options.library);
  const { slots, notes } = scheduleWeeks(programme.blocks, options.start, options.days, weeks);
  for (const n of notes) {
    const block = programme.blocks[n.blockIndex];
    const line = n.dayIndex === null ? block.line : block.days[n.dayIndex].line;
    report({ severity: "warning", code: "schedule", message: n.message, line });
  }
  for (const block of programme.blocks) {
    if (block.weeks < 1) report({ severity: "warning", code: "empty-block", message: `block ${block.name} has no weeks`, line: block.line });
    for (const w of block.deloadWeeks) {
      if (w < 1 || w > block.weeks) report({ severity: "warning", code: "deload-outside-block", message: `deload week ${w} is outside block ${block.name} (${block.weeks} weeks)`, line: block.line });
    }
  }

  const sessions: Session[] = slots.map((slot) => {
    const block = programme.blocks[slot.blockIndex];
    const day = block.days[slot.dayIndex];
    const deload = block.deloadWeeks.includes(slot.weekOfBlock);
    const week = { weekOfBlock: slot.weekOfBlock, deload };
    const exercises: ExerciseOut[] = day.exercises.map((ex) => {
      const variationIndex = variationFor(slot.weekInProgramme, ex.rotateWeeks, ex.variations.length);
      const main = prescribe(ctx, ex, ex.variations[variationIndex] ?? ex.variations[0] ?? "", week);
      return {
        name: main.name,
        exerciseId: main.exerciseId,
        equipment: main.equipment,
        max: main.max,
        loadNote: main.loadNote,
        sets: main.sets,
        line: ex.line,
        label: ex.label,
        cue: ex.cue,
        effort: effortOf(ex, slot.weekOfBlock, athlete.units),
        restSeconds: ex.restSeconds,
        tempo: ex.tempo,
        pauseSeconds: ex.pauseSeconds,
        variationIndex,
        substitutes: ex.substitutes.map((name) => prescribe(ctx, ex, name, week, main.name)),
      };
    });
    return {
      date: slot.date,
      isoWeek: isoWeekLabel(slot.date),
      weekday: slot.weekday,
      block: block.name,
      blockIndex: slot.blockIndex,
      week: slot.weekOfBlock,
      weekInProgramme: slot.weekInProgramme,
      deload,
      day: day.name,
      dayLine: day.line,
      units: athlete.units,
      warmupNotes: [...day.warmups],
      exercises,
    };
  });
  // Stable sort keeps programme order for days that share a date.
  sessions.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  return { sessions, diagnostics };
}
