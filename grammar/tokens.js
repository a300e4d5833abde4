// Context-aware tokenizer for the .iq notation.
//
// A "chunk" is a run of characters up to whitespace or punctuation. What a
// chunk becomes depends on what the parser can accept at that point
// (stack.canShift), which is what lets exercise names be free words:
// "pause squat 3x5 pause 2s" has a name word "pause" and a keyword "pause".
import { ExternalTokenizer } from "@lezer/lr";
import * as terms from "./parser.terms.js";

// Plain constants: some bundlers turn namespace members into getters, which is slow in a tokenizer.
const T = { ...terms };
const {
  MetaKey, MetaValue, Label, Word, Quantity, Weeks, DeloadWeek, Weekday, SetsReps, Intensity, Bodyweight, RampSteps,
  Progression, BlockKw, DayKw, WarmupKw,
} = T;

const KEYWORDS = Object.assign(Object.create(null), {
  block: T.BlockKw,
  day: T.DayKw,
  warmup: T.WarmupKw,
  "warm-up": T.WarmupKw,
  deload: T.DeloadKw,
  ramp: T.RampKw,
  pause: T.PauseKw,
  tempo: T.TempoKw,
  rest: T.RestKw,
  rotate: T.RotateKw,
  or: T.OrKw,
});

/** Weekday spellings; lib/notation maps them onto mon…sun. */
export const WEEKDAY_SPELLINGS = Object.assign(Object.create(null), {
  mon: "mon", monday: "mon",
  tue: "tue", tues: "tue", tuesday: "tue",
  wed: "wed", wednesday: "wed",
  thu: "thu", thur: "thu", thurs: "thu", thursday: "thu",
  fri: "fri", friday: "fri",
  sat: "sat", saturday: "sat",
  sun: "sun", sunday: "sun",
});

function isDelimiter(ch) {
  return (
    ch === 32 || ch === 9 || ch === 10 || ch === 13 || ch === 0xa0 ||
    ch === 35 /* # */ || ch === 34 /* " */ || ch === 0x201c || ch === 0x201d ||
    ch === 123 /* { */ || ch === 125 /* } */ || ch === 124 /* | */ || ch === 44 /* , */
  );
}

const isDigit = (ch) => ch >= 48 && ch <= 57;
const isKeyChar = (ch) =>
  (ch >= 97 && ch <= 122) || (ch >= 65 && ch <= 90) || isDigit(ch) || ch === 95 || ch === 45;
const isSpace = (ch) => ch === 32 || ch === 9 || ch === 0xa0 || ch === 13;

const SETS_REPS = /^\d+[x×]\d/i;
const LABEL = /^[a-z]\d{1,2}$/i;
const DELOAD_WEEK = /^w\d+$/i;
const WEEKS = /^\d+(w|wk|wks|week|weeks)$/i;
const BODYWEIGHT = /^bw(\+.*)?$/i;

/** Nothing but spaces and an optional comment between `offset` and the end of the line. */
function restOfLineEmpty(input, offset) {
  for (let i = offset; ; i++) {
    const ch = input.peek(i);
    if (ch < 0 || ch === 10 || ch === 35) return true;
    if (!isSpace(ch)) return false;
  }
}

/** Does a sets×reps chunk follow later on this line (before a cue or comment)? */
function setsRepsAhead(input, offset) {
  let start = true;
  for (let i = offset; ; i++) {
    const ch = input.peek(i);
    if (ch < 0 || ch === 10 || ch === 35 || ch === 34 || ch === 0x201c) return false;
    if (isDelimiter(ch)) { start = true; continue; }
    if (start && isDigit(ch)) {
      let j = i;
      while (isDigit(input.peek(j))) j++;
      const x = input.peek(j);
      if ((x === 120 || x === 88 || x === 215) && isDigit(input.peek(j + 1))) return true;
    }
    start = false;
  }
}

/** Is the previous non-space character a colon (the end of a settings key)? */
function afterColon(input) {
  for (let i = -1; i >= -24; i--) {
    const ch = input.peek(i);
    if (ch === 58) return true;
    if (!isSpace(ch)) return false;
  }
  return false;
}

export const chunk = new ExternalTokenizer(
  (input, stack) => {
    const first = input.next;
    if (first < 0 || isDelimiter(first)) return;

    if (afterColon(input) && stack.canShift(MetaValue)) {
      let end = 0;
      for (let i = 0; ; i++) {
        const ch = input.peek(i);
        if (ch < 0 || ch === 10 || ch === 35) break;
        if (!isSpace(ch)) end = i + 1;
      }
      input.acceptToken(MetaValue, end);
      return;
    }

    if (isKeyChar(first)) {
      let i = 1;
      while (isKeyChar(input.peek(i))) i++;
      let j = i;
      while (isSpace(input.peek(j))) j++;
      if (input.peek(j) === 58 /* : */ && stack.canShift(MetaKey)) {
        input.acceptToken(MetaKey, j + 1);
        return;
      }
    }

    let len = 0;
    let text = "";
    for (;;) {
      const ch = input.peek(len);
      if (ch < 0 || isDelimiter(ch) || (len > 0 && ch === 64 /* @ */)) break;
      text += String.fromCharCode(ch);
      len++;
    }
    const low = text.toLowerCase();

    if (first === 64) return input.acceptToken(Intensity, len);
    if (first === 43) return input.acceptToken(Progression, len);

    const kw = KEYWORDS[low];
    if (kw !== undefined && stack.canShift(kw)) {
      const headsLine = kw === BlockKw || kw === DayKw || kw === WarmupKw;
      if (!headsLine || !setsRepsAhead(input, len)) return input.acceptToken(kw, len);
    }

    if (isDigit(first)) {
      if (stack.canShift(RampSteps)) return input.acceptToken(RampSteps, len);
      if (SETS_REPS.test(text)) {
        if (stack.canShift(SetsReps) || !stack.canShift(Quantity)) return input.acceptToken(SetsReps, len);
      }
      if (stack.canShift(Weeks) && (WEEKS.test(text) || !stack.canShift(Quantity)))
        return input.acceptToken(Weeks, len);
      if (stack.canShift(Quantity) || !stack.canShift(Word)) return input.acceptToken(Quantity, len);
      return input.acceptToken(Word, len);
    }

    if (WEEKDAY_SPELLINGS[low] !== undefined && stack.canShift(Weekday) && restOfLineEmpty(input, len))
      return input.acceptToken(Weekday, len);
    if (LABEL.test(text) && stack.canShift(Label)) return input.acceptToken(Label, len);
    if (DELOAD_WEEK.test(text) && stack.canShift(DeloadWeek)) return input.acceptToken(DeloadWeek, len);
    if (BODYWEIGHT.test(text) && (stack.canShift(Bodyweight) || !stack.canShift(Word)))
      return input.acceptToken(Bodyweight, len);
    return input.acceptToken(Word, len);
  },
  { contextual: true },
);
