/**
 * Settings lines (`title: …`, `units: kg`, `round: 2.5`, `model: brzycki`,
 * `weeks: 4`) and the free descriptive keys kept in `Programme.meta`.
 *
 * @example
 * // "units: kgs" → error "unknown unit 'kgs' — did you mean kg?"
 */
import type { SyntaxNode } from "@lezer/common";
import type { BuildContext } from "./context";
import { LOAD_MODELS, type LoadModel, type Unit } from "./model";
import { didYouMean } from "./suggest";

/** Keys with a meaning of their own. */
export const SETTING_KEYS = ["title", "units", "round", "model", "weeks"] as const;
/** Descriptive keys stored as text in `Programme.meta`. */
export const DESCRIPTIVE_KEYS = ["description", "level", "goal", "tags", "author", "notes"] as const;
const ALL_KEYS: readonly string[] = [...SETTING_KEYS, ...DESCRIPTIVE_KEYS];

export interface Settings {
  title: string | null;
  units: Unit;
  round: number | null;
  model: LoadModel;
  /** Length of the implicit block (days before any `block` line). */
  weeks: number | null;
  weeksNode: { from: number; to: number } | null;
  meta: Record<string, string>;
  /** key → line it was first set on. */
  seen: Map<string, number>;
}

export function emptySettings(): Settings {
  return { title: null, units: "kg", round: null, model: "brzycki", weeks: null, weeksNode: null, meta: {}, seen: new Map() };
}

/** Canonical key text: lower-case, no spaces. */
export function metaKeyName(raw: string): string {
  return raw.replace(/\s*:$/, "").toLowerCase();
}

export function applySetting(ctx: BuildContext, node: SyntaxNode, s: Settings, afterContent: boolean): void {
  const keyNode = ctx.child(node, "MetaKey");
  if (!keyNode) return;
  const key = metaKeyName(ctx.text(keyNode));
  const valueNode = ctx.child(node, "MetaValue");
  const value = valueNode ? ctx.text(valueNode).trim() : "";
  const at = valueNode ?? keyNode;
  const first = s.seen.get(key);
  if (first !== undefined) {
    ctx.report(keyNode.from, keyNode.to, "error", `${key} is already set on line ${first}`);
    return;
  }
  s.seen.set(key, ctx.line(node));
  if (afterContent) ctx.report(keyNode.from, keyNode.to, "warning", `settings go at the top, before the first block or day`);
  if (value === "") {
    ctx.report(keyNode.from, keyNode.to, "error", `${key}: needs a value`);
    return;
  }
  const low = value.toLowerCase();
  switch (key) {
    case "title":
      s.title = value;
      return;
    case "units":
      if (low === "kg" || low === "lb") s.units = low;
      else ctx.report(at.from, at.to, "error", `unknown unit '${value}'${didYouMean(low, ["kg", "lb"]) || " — use kg or lb"}`);
      return;
    case "round": {
      const m = /^(\d+(?:\.\d+)?)$/.exec(value);
      if (m && Number(m[1]) > 0) s.round = Number(m[1]);
      else ctx.report(at.from, at.to, "error", `round takes a step above 0 in the programme's units, e.g. round: 2.5`);
      return;
    }
    case "model":
      if ((LOAD_MODELS as readonly string[]).includes(low)) s.model = low as LoadModel;
      else ctx.report(at.from, at.to, "error", `unknown model '${value}'${didYouMean(low, LOAD_MODELS) || ` — use ${LOAD_MODELS.join(", ")}`}`);
      return;
    case "weeks": {
      const m = /^(\d+)\s*(w|wk|wks|week|weeks)?$/i.exec(value);
      if (m && Number(m[1]) > 0) {
        s.weeks = Number(m[1]);
        s.weeksNode = at;
      } else ctx.report(at.from, at.to, "error", `weeks takes a whole number of weeks, e.g. weeks: 4`);
      return;
    }
  }
  if (!(DESCRIPTIVE_KEYS as readonly string[]).includes(key))
    ctx.report(keyNode.from, keyNode.to, "warning", `unknown setting '${key}'${didYouMean(key, ALL_KEYS) || ` — known: ${ALL_KEYS.join(", ")}`}`);
  // defineProperty: a key such as __proto__ must stay an ordinary entry.
  Object.defineProperty(s.meta, key, { value, enumerable: true, writable: true, configurable: true });
}
