/**
 * One exercise line → an `Exercise` in the model, with diagnostics for values
 * that cannot be right (0 sets, a backwards rep range, RIR over 10…).
 *
 * @example
 * // "  A1 bench press 4x5-7 @2rir ramp 50/70/85%" inside a day gives
 * // { label: "A1", variations: ["bench press"], sets: 4, reps: {kind:"reps",min:5,max:7,amrap:false}, … }
 */
import type { SyntaxNode } from "@lezer/common";
import type { BuildContext } from "./context";
import type { Exercise, Intensity, Load, Progression, RampStep } from "./model";
import {
  readCue, readBodyweight, readDuration, readIntensity, readMass, readProgression, readRamp, readSetsReps, readTempo, readWeeks,
} from "./values";

/** Where a name was written, for the exercise-library check. */
export interface NameUse {
  name: string;
  from: number;
  to: number;
}

const ONCE: Record<string, string> = {
  Intensity: "an intensity", Load: "a load", Ramp: "a ramp", Pause: "a pause", Tempo: "a tempo", Rest: "a rest", Rotate: "a rotation", Substitutes: "substitutes",
};

function cueText(ctx: BuildContext, node: SyntaxNode): string {
  const cue = readCue(ctx.text(node));
  if (!cue.closed) ctx.report(node.from, node.to, "error", "this cue is missing its closing quote");
  return cue.text;
}

export { cueText };

/** Build an exercise; null when the line is too broken to say what it prescribes. */
export function buildExercise(ctx: BuildContext, node: SyntaxNode, used: NameUse[]): Exercise | null {
  const names: NameUse[] = [];
  current = ctx;
  const ex: Exercise = {
    line: ctx.line(node), label: null, variations: [], rotateWeeks: null, sets: 0, reps: { kind: "reps", min: 0, max: 0, amrap: false },
    intensity: null, load: null, ramp: null, pauseSeconds: null, tempo: null, restSeconds: null, progression: [], substitutes: [], cue: null,
  };
  let setsRead = false;
  let variationsNode: SyntaxNode | null = null;
  let rotateNode: SyntaxNode | null = null;
  let rampNode: SyntaxNode | null = null;
  const seen = new Set<string>();
  const cues: string[] = [];

  for (let c = node.firstChild; c; c = c.nextSibling) {
    if (!ctx.usable(c) || c.name === "Comment") continue;
    if (ONCE[c.name]) {
      if (seen.has(c.name)) ctx.report(c.from, c.to, "error", `this line already has ${ONCE[c.name]} — keep one`);
      seen.add(c.name);
    }
    switch (c.name) {
      case "Label":
        ex.label = ctx.text(c).toUpperCase();
        break;
      case "ExerciseName": {
        const name = ctx.words(c);
        ex.variations = [name];
        names.push({ name, from: c.from, to: c.to });
        break;
      }
      case "Variations":
        variationsNode = c;
        for (const n of ctx.children(c, "ExerciseName")) {
          const name = ctx.words(n);
          ex.variations.push(name);
          names.push({ name, from: n.from, to: n.to });
        }
        break;
      case "SetsReps": {
        const v = ctx.take(c, readSetsReps(ctx.text(c)));
        if (v) {
          ex.sets = v.sets;
          ex.reps = v.reps;
          setsRead = true;
        }
        break;
      }
      case "Intensity":
        ex.intensity ??= ctx.take<Intensity>(c, readIntensity(ctx.text(c)));
        break;
      case "Load":
        ex.load ??= readLoad(ctx, c);
        break;
      case "Ramp":
        rampNode = c;
        ex.ramp ??= child(c, "RampSteps", (s) => ctx.take<RampStep[]>(s, readRamp(ctx.text(s))));
        break;
      case "Pause":
        ex.pauseSeconds ??= child(c, "Quantity", (q) => ctx.take(q, readDuration(ctx.text(q), "pause")));
        break;
      case "Rest":
        ex.restSeconds ??= child(c, "Quantity", (q) => {
          const s = ctx.take(q, readDuration(ctx.text(q), "rest"));
          if (s !== null && s > 30 * 60) ctx.report(q.from, q.to, "warning", `rest of ${Math.round(s / 60)} minutes is unusually long — check the unit`);
          return s;
        });
        break;
      case "Tempo":
        ex.tempo ??= child(c, "Quantity", (q) => ctx.take(q, readTempo(ctx.text(q))));
        break;
      case "Rotate":
        rotateNode = c;
        ex.rotateWeeks ??= child(c, "Weeks", (w) => ctx.take(w, readWeeks(ctx.text(w), "rotate")));
        break;
      case "Progression": {
        const p = ctx.take<Progression>(c, readProgression(ctx.text(c)));
        if (p && p.kind === "reps" && ex.reps.kind === "time")
          ctx.report(c.from, c.to, "error", "a timed set has no reps to add — progress the load or the time instead");
        else if (p && ex.progression.some((q) => q.kind === p.kind))
          ctx.report(c.from, c.to, "error", `this line already has a ${p.kind === "load" ? "load" : p.kind === "percent" ? "percent" : "rep"} progression — combine them into one`);
        else if (p) ex.progression.push(p);
        break;
      }
      case "Substitutes":
        for (const n of ctx.children(c, "ExerciseName")) {
          const name = ctx.words(n);
          ex.substitutes.push(name);
          names.push({ name, from: n.from, to: n.to });
        }
        break;
      case "Cue":
        cues.push(cueText(ctx, c));
        if (cues.length === 2) ctx.report(c.from, c.to, "warning", "one cue per line reads best — the cues are joined");
        break;
    }
  }
  if (!setsRead || ex.variations.length === 0) return null;
  used.push(...names);
  if (cues.length > 0) ex.cue = cues.join(" ");
  checkCombination(ctx, ex, variationsNode, rotateNode, rampNode);
  return ex;
}

let current: BuildContext;
function child<T>(node: SyntaxNode, name: string, read: (n: SyntaxNode) => T | null): T | null {
  const c = current.child(node, name);
  return c ? read(c) : null;
}

function readLoad(ctx: BuildContext, node: SyntaxNode): Load | null {
  const q = node.firstChild;
  if (!q || !ctx.usable(q)) return null;
  if (q.name === "Bodyweight") return ctx.take(q, readBodyweight(ctx.text(q)));
  const mass = ctx.take(q, readMass(ctx.text(q)));
  return mass ? { kind: "fixed", mass } : null;
}

function checkCombination(ctx: BuildContext, ex: Exercise, variations: SyntaxNode | null, rotate: SyntaxNode | null, ramp: SyntaxNode | null): void {
  if (rotate && ex.variations.length < 2)
    ctx.report(rotate.from, rotate.to, "error", "rotate needs at least two variations written as {a | b}");
  if (variations && ex.variations.length >= 2 && !rotate)
    ctx.report(variations.from, variations.to, "error", "variations need rotate Nw to say when to switch, e.g. rotate 2w");
  if (ramp && !ex.intensity && !ex.load)
    ctx.report(ramp.from, ramp.to, "warning", "a ramp is counted from the working load — add @%, @rir, @rpe or a load");
}
