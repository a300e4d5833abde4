/**
 * Highlighting for the .iq notation, from syntax node names to highlight tags.
 *
 * @example
 * LRLanguage.define({ parser: parser.configure({ props: [iqHighlighting] }) });
 */
import { styleTags, tags as t } from "@lezer/highlight";

export const iqHighlighting = styleTags({
  "BlockKw DayKw WarmupKw": t.definitionKeyword,
  "DeloadKw RampKw PauseKw TempoKw RestKw RotateKw": t.keyword,
  OrKw: t.operatorKeyword,
  MetaKey: t.propertyName,
  MetaValue: t.string,
  "BlockName/...": t.heading1,
  "DayName/...": t.heading2,
  Weekday: t.atom,
  Label: t.labelName,
  "ExerciseName/...": t.name,
  SetsReps: t.number,
  "Quantity Weeks DeloadWeek RampSteps": t.number,
  Intensity: t.unit,
  Bodyweight: t.atom,
  Progression: t.changed,
  Cue: t.string,
  Comment: t.lineComment,
  "{ }": t.brace,
  "| ,": t.separator,
});
