/**
 * One exercise line, for one athlete, in one week: the warm-up and work sets with loads.
 *
 * Load rules (all loads in the athlete's unit):
 * - `@N%` → N % of the athlete's 1RM for the movement (names and aliases share one max).
 * - `@Nrir` / `@rpeX` → the model's %1RM for (lower end of the reps + RIR) reps to failure.
 *   Outside the model's domain there is no number (and a diagnostic); past its trusted range the
 *   number comes with a warning.
 * - A fixed load is converted from the unit it was written in, then rounded in the athlete's.
 *   It wins over an effort target, which is still shown.
 * - `bw` / `bw+10kg`: `bodyweight` is set and `load` is the added load (0 for plain `bw`).
 *   A catalogue bodyweight movement with no load written is the same as `bw`.
 * - No max on file, or a timed set with only an effort target → load null with a `loadNote`;
 *   no number is ever invented.
 * Rounding: barbell → bar + plates; dumbbell → dumbbellStep; machine and cable → machineStep;
 * other and added bodyweight load → the programme's `round` (see {@link defaultRoundStep}).
 *
 * @example
 * const ctx = createContext(programme, athlete, (d) => diagnostics.push(d));
 * prescribe(ctx, exercise, "bench press", { weekOfBlock: 1, deload: false }).sets[0].load; // 82.5
 * prescribe(ctx, exercise, "dumbbell bench press", week, "bench press"); // a substitute
 */
import type { Exercise, LoadModel, Programme, Unit } from "../notation/model";
import type { AthleteProfile } from "../athlete/profile";
import { exerciseKey, exerciseResolver, type LibraryName } from "../exercises/resolve";
import type { CatalogueEntry, EquipmentKind } from "../exercises/catalogue";
import { checkRepsToFailure, DOMAIN_REPS, percentOf1RM, TRUSTED_REPS } from "./models";
import { rirOf } from "./effort";
import { defaultRoundStep, massIn } from "./units";
import { roundLoad, type RoundingRule } from "./round";
import { DELOAD, deloadSets, weekProgression } from "./progression";
import { warmupRamp } from "./ramp";
import type { ExpandDiagnostic, SetOut, SubstituteOut } from "./types";

/** Sets beyond this on one line are not expanded (a typo such as 300x5 would flood the output). */
export const MAX_SETS = 50;

interface Movement {
  entry: CatalogueEntry | null;
  equipment: EquipmentKind;
  max: number | null;
}

export interface Context {
  athlete: AthleteProfile;
  /** Name as written → catalogue entry and max, looked up once per expansion. */
  movements: Map<string, Movement>;
  /** Built-in catalogue first, then the coach's library. */
  resolve: (name: string) => CatalogueEntry | null;
  unit: Unit;
  model: LoadModel;
  roundStep: number;
  maxes: Map<string, number>;
  report: (d: ExpandDiagnostic) => void;
}

/**
 * Everything that depends on the athlete and programme but not on the week.
 * @example createContext(programme, athlete, console.warn).roundStep; // 2.5
 */
export function createContext(programme: Programme, athlete: AthleteProfile, report: (d: ExpandDiagnostic) => void, library: readonly LibraryName[] = []): Context {
  const maxes = new Map<string, number>();
  for (const [name, value] of Object.entries(athlete.maxes)) {
    const key = exerciseKey(name);
    const prev = maxes.get(key);
    if (prev !== undefined && prev !== value) report({ severity: "warning", code: "duplicate-max", message: `two maxes on file for ${name} (${prev} and ${value}); using ${prev}`, line: null });
    else maxes.set(key, value);
  }
  return { athlete, movements: new Map(), resolve: exerciseResolver(library), unit: athlete.units, model: programme.model, roundStep: defaultRoundStep(athlete.units, programme.round, programme.units), maxes, report };
}

function ruleFor(equipment: EquipmentKind, bodyweight: boolean, ctx: Context): RoundingRule {
  const a = ctx.athlete;
  if (bodyweight) return { kind: "step", step: ctx.roundStep, min: 0 };
  switch (equipment) {
    case "barbell":
      return { kind: "barbell", bar: a.bar, plates: a.plates };
    case "dumbbell":
      return { kind: "step", step: a.dumbbellStep, min: a.dumbbellStep };
    case "machine":
    case "cable":
      return { kind: "step", step: a.machineStep, min: a.machineStep };
    default:
      return { kind: "step", step: ctx.roundStep, min: 0 };
  }
}

function movement(ctx: Context, name: string): Movement {
  let m = ctx.movements.get(name);
  if (!m) {
    const entry = ctx.resolve(name);
    m = { entry, equipment: entry?.equipment ?? "other", max: ctx.maxes.get(entry?.id ?? exerciseKey(name)) ?? null };
    ctx.movements.set(name, m);
  }
  return m;
}

export interface WeekInfo {
  weekOfBlock: number;
  deload: boolean;
}

const round4 = (x: number) => Math.round(x * 10_000) / 10_000;
const fmt = (x: number) => String(Math.round(x * 100) / 100);

/**
 * Sets for `name` (the line's exercise, a rotation variation or — with `mainName` — a substitute) in one week.
 * @example prescribe(ctx, line, "squat", { weekOfBlock: 2, deload: false }).loadNote; // null when a max is on file
 */
export function prescribe(ctx: Context, written: Exercise, name: string, week: WeekInfo, mainName?: string): SubstituteOut {
  const { entry, equipment, max } = movement(ctx, name);
  // A load written for the main movement only carries over to a substitute on the same kind of
  // equipment: `dip 3x8 bw or close-grip bench press` must not print "bw" for the bench press.
  const mainEquipment = mainName === undefined ? equipment : movement(ctx, mainName).equipment;
  const dropLoad = written.load !== null && mainEquipment !== equipment;
  const ex: Exercise = dropLoad ? { ...written, load: null } : written;
  const warn = (code: string, message: string, severity: ExpandDiagnostic["severity"] = "warning") => ctx.report({ severity, code, message, line: ex.line });

  const percentLine = ex.intensity?.kind === "percent" && ex.load === null;
  const prog = weekProgression(ex.progression, week.weekOfBlock, ctx.unit, percentLine);

  // Reps for this week.
  let repsMin: number | null = null;
  let repsMax: number | null = null;
  let seconds: number | null = null;
  let amrap = false;
  if (ex.reps.kind === "reps") {
    repsMin = Math.max(1, ex.reps.min + prog.addReps);
    repsMax = Math.max(repsMin, ex.reps.max + prog.addReps);
    amrap = ex.reps.amrap;
  } else {
    seconds = ex.reps.seconds;
    if (prog.addReps !== 0) warn("rep-step-on-timed-set", "a rep step has no effect on a timed set");
  }

  const rir = rirOf(ex.intensity);
  const bodyweight = ex.load?.kind === "bodyweight" || (ex.load === null && equipment === "bodyweight");
  let target: number | null = null;
  let percent1RM: number | null = null;
  let loadNote: string | null = null;

  if (ex.load?.kind === "fixed") {
    target = massIn(ex.load.mass, ctx.unit) * prog.loadFactor + prog.addLoad;
  } else if (bodyweight) {
    const plus = ex.load?.kind === "bodyweight" && ex.load.plus ? massIn(ex.load.plus, ctx.unit) : 0;
    target = plus * prog.loadFactor + prog.addLoad;
  } else if (ex.intensity?.kind === "percent") {
    const pct = (ex.intensity.value + prog.addPercentPoints) / 100;
    if (!(pct > 0)) loadNote = `${fmt(pct * 100)}% of 1RM is not a load`;
    else {
      percent1RM = pct;
      if (pct > 1.1) warn("percent-over-max", `${fmt(pct * 100)}% of 1RM is more than the athlete's max`);
      if (max === null) loadNote = `no 1RM on file for ${name}`;
      else target = max * pct + prog.addLoad;
    }
  } else if (rir !== null) {
    if (rir < 0) {
      warn("effort-beyond-max", `an effort past failure (${fmt(rir)} RIR) cannot be loaded`, "error");
      loadNote = "effort past failure";
    } else if (repsMin === null) {
      loadNote = "an effort target on a timed set has no reps to work a load from";
    } else {
      const rtf = repsMin + rir;
      const check = checkRepsToFailure(rtf, ctx.model);
      if (check === "outside") {
        warn("reps-outside-model", `${fmt(rtf)} reps to failure is outside the ${ctx.model} model (1–${DOMAIN_REPS[ctx.model]}); no load worked out`);
        loadNote = `${fmt(rtf)} reps to failure is outside the ${ctx.model} model`;
      } else {
        if (check === "untrusted" && max !== null) warn("reps-untrusted", `${fmt(rtf)} reps to failure is past the ${TRUSTED_REPS[ctx.model]} reps the ${ctx.model} model is trusted for; the load is a rough estimate`);
        const pct = percentOf1RM(rtf, ctx.model)!;
        percent1RM = pct;
        if (max === null) loadNote = `no 1RM on file for ${name}`;
        else target = max * pct * prog.loadFactor + prog.addLoad;
      }
    }
  } else {
    loadNote = dropLoad ? `the written load is for ${mainName}` : "no load or effort written";
  }
  if (loadNote?.startsWith("no 1RM")) ctx.report({ severity: "info", code: "no-max", message: `no 1RM on file for ${name}: loads left empty`, line: ex.line });

  if (week.deload) {
    if (target !== null) target *= DELOAD.loadFactor;
    if (percent1RM !== null) percent1RM *= DELOAD.loadFactor;
  }

  const rule = ruleFor(equipment, bodyweight, ctx);
  let load: number | null = null;
  let perSide: number[] | null = null;
  if (target !== null) {
    const r = roundLoad(Number.isFinite(target) ? Math.max(0, target) : 0, rule);
    if (!Number.isFinite(target)) warn("load-not-finite", "the load works out to no finite number", "error");
    if (r.beyondPlates) warn("beyond-plates", `${fmt(target)} ${ctx.unit} is more than the plates can make; using ${fmt(r.load)} ${ctx.unit}`);
    load = r.load;
    perSide = r.perSide;
  }

  let count = Math.max(0, Math.floor(ex.sets));
  if (week.deload) count = deloadSets(count);
  if (count > MAX_SETS) {
    warn("too-many-sets", `${count} sets on one line; only ${MAX_SETS} are listed`);
    count = MAX_SETS;
  }

  const sets: SetOut[] = [];
  if (ex.ramp && count > 0) {
    for (const step of warmupRamp(ex.ramp, load, rule)) {
      if (step.percent > 100) warn("ramp-over-work", `a warm-up step at ${fmt(step.percent)}% is held at the working load`);
      sets.push({
        kind: "warmup", repsMin: step.reps, repsMax: step.reps, amrap: false, seconds: null, load: step.load, bodyweight,
        perSide: step.perSide, rir: null, percent1RM: percent1RM === null ? null : round4((percent1RM * Math.min(100, Math.max(0, step.percent))) / 100),
      });
    }
  }
  for (let i = 0; i < count; i++) {
    const last = amrap && i === count - 1;
    sets.push({
      kind: "work", repsMin, repsMax: last ? null : repsMax, amrap: last, seconds, load, bodyweight,
      perSide: perSide ? [...perSide] : null, rir, percent1RM: percent1RM === null ? null : round4(percent1RM),
    });
  }
  return { name, exerciseId: entry?.id ?? null, equipment, max, loadNote, sets };
}
