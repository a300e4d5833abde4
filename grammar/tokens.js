// Context-aware tokenizer for the .iq notation.
//
// A "chunk" is a run of characters up to whitespace or punctuation. What a
// chunk becomes depends on what the parser can accept at that point
// (stack.canShift), which is what lets exercise names be free words:
// "pause squat 3x5 pause 2s" has a name word "pause" and a keyword "pause".
//
// A name is emitted as one token running over all its words and the spaces
// between them: the parser pays a fixed cost per token, and names are most of
// the words in a programme. The name ends before the first chunk that could
// not continue it (see `continuesName`).
//
// This runs for every token of every keystroke, so it reads character codes
// only: no substrings, no regular expressions.
import { ExternalTokenizer } from "@lezer/lr";
import * as terms from "./parser.terms.js";

// Plain constants: some bundlers turn namespace members into getters, which is slow in a tokenizer.
const T = { ...terms };
const {
  space, newline, Comment, Cue, MetaKey, MetaValue, Label, ExerciseName, SubstituteName, DayName, BlockName, Word, Quantity, Weeks, DeloadWeek, Weekday,
  SetsReps, Intensity, Bodyweight, RampSteps, Progression, BlockKw, DayKw, WarmupKw, DeloadKw, RampKw, PauseKw, TempoKw,
  RestKw, RotateKw, OrKw,
} = T;

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

/** Words grouped by length, each with the value it stands for. */
function byLength(entries) {
  const out = [];
  for (const [word, value] of entries) (out[word.length] ??= []).push([word, value]);
  return out;
}

const KEYWORDS = byLength([
  ["block", BlockKw], ["day", DayKw], ["warmup", WarmupKw], ["warm-up", WarmupKw], ["deload", DeloadKw], ["ramp", RampKw],
  ["pause", PauseKw], ["tempo", TempoKw], ["rest", RestKw], ["rotate", RotateKw], ["or", OrKw],
]);
const WEEKDAYS = byLength(Object.keys(WEEKDAY_SPELLINGS).map((w) => [w, true]));
const WEEK_UNITS = byLength(["w", "wk", "wks", "week", "weeks"].map((w) => [w, true]));

// Spaces, line break, # " { } | , — and the typographic quotes below.
const ASCII_DELIMITERS = new Uint8Array(128);
for (const ch of [32, 9, 10, 13, 35, 34, 123, 125, 124, 44]) ASCII_DELIMITERS[ch] = 1;

function isDelimiter(ch) {
  return ch < 128 ? ch >= 0 && ASCII_DELIMITERS[ch] === 1 : ch === 0xa0 || ch === 0x201c || ch === 0x201d;
}

const isDigit = (ch) => ch >= 48 && ch <= 57;
const isLetter = (ch) => (ch >= 97 && ch <= 122) || (ch >= 65 && ch <= 90);
const isKeyChar = (ch) => isLetter(ch) || isDigit(ch) || ch === 95 || ch === 45;
const isSpace = (ch) => ch === 32 || ch === 9 || ch === 0xa0 || ch === 13;
/** Lower case as String.prototype.toLowerCase has it for the letters these words use (the Kelvin sign reads as k). */
const lower = (ch) => (ch >= 65 && ch <= 90 ? ch + 32 : ch === 0x212a ? 107 : ch);
/** Lower case as a case-insensitive regular expression (no u flag) compares: ASCII letters only. */
const lowerAscii = (ch) => (ch >= 65 && ch <= 90 ? ch + 32 : ch);

/** Length of the chunk starting at `at`: up to a delimiter, or up to an `@` after its first character. */
function chunkLength(input, at) {
  let len = 1;
  for (;;) {
    const ch = input.peek(at + len);
    if (ch < 0 || ch === 64 || isDelimiter(ch)) return len;
    len++;
  }
}

/** The value of the word (any case, as `toLower` folds it) filling [at, at + len) in a `byLength` table, or undefined. */
function lookup(table, input, at, len, toLower = lower) {
  const words = table[len];
  if (words === undefined) return undefined;
  const first = toLower(input.peek(at));
  for (let w = 0; w < words.length; w++) {
    const word = words[w][0];
    if (word.charCodeAt(0) !== first) continue;
    let i = 1;
    while (i < len && toLower(input.peek(at + i)) === word.charCodeAt(i)) i++;
    if (i === len) return words[w][1];
  }
  return undefined;
}

/** Digits from `at`; the offset of the first non-digit. */
function skipDigits(input, at) {
  while (isDigit(input.peek(at))) at++;
  return at;
}

/** `3x5…`: digits, x (any case) or ×, then a digit. */
function isSetsReps(input, at) {
  const j = skipDigits(input, at);
  if (j === at) return false;
  const x = input.peek(j);
  return (x === 120 || x === 88 || x === 215) && isDigit(input.peek(j + 1));
}

/** `4w`, `6weeks`: digits then a week unit, filling the chunk. */
function isWeeks(input, at, len) {
  const j = skipDigits(input, at);
  return j > at && lookup(WEEK_UNITS, input, j, at + len - j, lowerAscii) === true;
}

/** `A1`, `b12`: a letter and one or two digits, filling the chunk. */
function isLabel(input, at, len) {
  return (len === 2 || len === 3) && isLetter(input.peek(at)) && isDigit(input.peek(at + 1)) && (len === 2 || isDigit(input.peek(at + 2)));
}

/** `w4`: w (any case) and digits, filling the chunk. */
function isDeloadWeek(input, at, len) {
  return len > 1 && (input.peek(at) | 32) === 119 && skipDigits(input, at + 1) === at + len;
}

/** `bw` or `bw+…` (anything after the plus except a line or paragraph separator). */
function isBodyweight(input, at, len) {
  if ((input.peek(at) | 32) !== 98 || (input.peek(at + 1) | 32) !== 119) return false;
  if (len === 2) return true;
  if (input.peek(at + 2) !== 43) return false;
  for (let i = 3; i < len; i++) {
    const ch = input.peek(at + i);
    if (ch === 0x2028 || ch === 0x2029) return false;
  }
  return true;
}

/** Offset of the end of the line (its line break or the end of the text). */
function endOfLine(input, offset) {
  while (input.peek(offset) >= 0 && input.peek(offset) !== 10) offset++;
  return offset;
}

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

/** Option keywords, which end a substitute's name. */
const isOptionKeyword = (kw) => kw === RampKw || kw === PauseKw || kw === TempoKw || kw === RestKw || kw === RotateKw || kw === OrKw;

/**
 * Would the chunk [at, at + len) be read as one more word of a `name` token that
 * is already under way? Mirrors what the chunk would become, one word at a time,
 * in the state after a name word: an exercise name runs to its sets×reps; a
 * substitute stops at anything that starts an option; a day name at a weekday
 * that ends the line; a block name at its length.
 */
function continuesName(input, name, at, len) {
  const first = input.peek(at);
  if (first === 64 /* @ */ || first === 43 /* + */) return false;
  switch (name) {
    case ExerciseName:
      return !(isDigit(first) && isSetsReps(input, at));
    case SubstituteName:
      if (isDigit(first) || isBodyweight(input, at, len)) return false;
      return !isOptionKeyword(lookup(KEYWORDS, input, at, len));
    case DayName:
      return isDigit(first) || lookup(WEEKDAYS, input, at, len) === undefined || !restOfLineEmpty(input, at + len);
    default: // BlockName
      return !(isDigit(first) && isWeeks(input, at, len));
  }
}

/** Accept a `name` token from the chunk of length `len` on, through every chunk that continues it. */
function acceptName(input, name, len) {
  let end = len;
  for (;;) {
    let at = end;
    while (isSpace(input.peek(at))) at++;
    if (at === end) break;
    const ch = input.peek(at);
    if (ch < 0 || isDelimiter(ch)) break;
    const next = chunkLength(input, at);
    if (!continuesName(input, name, at, next)) break;
    end = at + next;
  }
  input.acceptToken(name, end);
}

/** The name token the parser can take here, or 0. */
function nameHere(stack) {
  if (stack.canShift(ExerciseName)) return ExerciseName;
  if (stack.canShift(SubstituteName)) return SubstituteName;
  if (stack.canShift(DayName)) return DayName;
  if (stack.canShift(BlockName)) return BlockName;
  return 0;
}

/** Could a number be read here, as a quantity or as the start of a day or block name? */
function quantityHere(stack) {
  return stack.canShift(Quantity) || stack.canShift(DayName) || stack.canShift(BlockName);
}

export const chunk = new ExternalTokenizer(
  (input, stack) => {
    const first = input.next;
    if (isSpace(first)) {
      let end = 1;
      while (isSpace(input.peek(end))) end++;
      return input.acceptToken(space, end);
    }
    if (first === 10) return input.acceptToken(newline, 1);
    if (first === 35 /* # */) return input.acceptToken(Comment, endOfLine(input, 1));
    // A cue runs to its closing quote or the end of the line; straight quotes close either kind.
    if (first === 34 || first === 0x201c) {
      for (let i = 1; ; i++) {
        const ch = input.peek(i);
        if (ch < 0 || ch === 10) return input.acceptToken(Cue, i);
        if (ch === 34 || (ch === 0x201d && first === 0x201c)) return input.acceptToken(Cue, i + 1);
      }
    }
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

    if (first === 64) return input.acceptToken(Intensity, chunkLength(input, 0));
    if (first === 43) return input.acceptToken(Progression, chunkLength(input, 0));
    const len = chunkLength(input, 0);

    const kw = lookup(KEYWORDS, input, 0, len);
    if (kw !== undefined && stack.canShift(kw)) {
      const headsLine = kw === BlockKw || kw === DayKw || kw === WarmupKw;
      if (!headsLine || !setsRepsAhead(input, len)) return input.acceptToken(kw, len);
    }

    if (isDigit(first)) {
      // Where sets×reps can follow, ramp steps cannot, so asking about SetsReps first changes nothing.
      const setsReps = isSetsReps(input, 0);
      if (setsReps && stack.canShift(SetsReps)) return input.acceptToken(SetsReps, len);
      if (stack.canShift(RampSteps)) return input.acceptToken(RampSteps, len);
      // A number can open a day or block name: there the name stands where a Quantity could.
      if (setsReps && !quantityHere(stack)) return input.acceptToken(SetsReps, len);
      if (stack.canShift(Quantity)) return input.acceptToken(Quantity, len);
      if (stack.canShift(Weeks) && (isWeeks(input, 0, len) || !quantityHere(stack))) return input.acceptToken(Weeks, len);
      const name = nameHere(stack);
      return name ? acceptName(input, name, len) : input.acceptToken(Quantity, len);
    }

    if (lookup(WEEKDAYS, input, 0, len) && stack.canShift(Weekday) && restOfLineEmpty(input, len))
      return input.acceptToken(Weekday, len);
    if (isLabel(input, 0, len) && stack.canShift(Label)) return input.acceptToken(Label, len);
    if (isDeloadWeek(input, 0, len) && stack.canShift(DeloadWeek)) return input.acceptToken(DeloadWeek, len);
    if (isBodyweight(input, 0, len) && stack.canShift(Bodyweight)) return input.acceptToken(Bodyweight, len);
    const name = nameHere(stack);
    if (name) return acceptName(input, name, len);
    return input.acceptToken(isBodyweight(input, 0, len) ? Bodyweight : Word, len);
  },
  { contextual: true },
);
