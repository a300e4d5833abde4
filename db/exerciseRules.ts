/**
 * Field and media rules for a coach's exercises, shared by the query module
 * (which enforces them whoever calls) and the route schemas and forms (which
 * answer a person field by field). Pure: zod and bytes, no database.
 *
 * @example
 * aliasesSchema.parse([" Pin Squat ", "pin  squat"]); // ["Pin Squat"]
 * sniffMedia(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])); // "image/png"
 */
import { z } from "zod";
import { normaliseExerciseName } from "../lib/exercises/resolve";

export const NAME_MAX = 80;
export const ALIASES_MAX = 12;
export const MUSCLES_MAX = 8;
export const MUSCLE_MAX = 40;
export const PATTERN_MAX = 40;
export const CUES_MAX = 2000;
export const GROUP_MAX = 60;

export const EQUIPMENT = ["barbell", "dumbbell", "cable", "machine", "bodyweight", "other"] as const;
export type Equipment = (typeof EQUIPMENT)[number];

/** Suggestions only: a coach may write any pattern of their own. */
export const MOVEMENT_PATTERNS = [
  "squat",
  "hinge",
  "horizontal push",
  "vertical push",
  "horizontal pull",
  "vertical pull",
  "lunge",
  "carry",
  "core",
  "isolation",
] as const;

/** Runs of spaces become one so that "Pin  squat" is stored as people read it. */
const tidy = (s: string) => s.replace(/\s+/g, " ").trim();

export const nameSchema = z
  .string({ error: "Give the exercise a name" })
  .transform(tidy)
  .pipe(z.string().min(1, "Give the exercise a name").max(NAME_MAX, `Keep the name to ${NAME_MAX} characters`));

export const aliasesSchema = z
  .array(
    z
      .string({ error: "Each alias must be text" })
      .transform(tidy)
      .pipe(z.string().min(1, "An alias cannot be empty").max(NAME_MAX, `Keep each alias to ${NAME_MAX} characters`)),
    { error: "Aliases must be a list of names" },
  )
  // Two spellings that compare equal are one alias; the first as typed is kept.
  .transform((list) => list.filter((a, i) => list.findIndex((b) => normaliseExerciseName(b) === normaliseExerciseName(a)) === i))
  .refine((list) => list.length <= ALIASES_MAX, `Use at most ${ALIASES_MAX} aliases`);

export const equipmentSchema = z.enum(EQUIPMENT, { error: "Equipment is barbell, dumbbell, cable, machine, bodyweight or other" });

export const musclesSchema = z
  .array(
    z
      .string({ error: "Each muscle must be text" })
      .transform((s) => tidy(s).toLowerCase())
      .pipe(z.string().min(1, "A muscle cannot be empty").max(MUSCLE_MAX, `Keep each muscle to ${MUSCLE_MAX} characters`)),
    { error: "Muscles must be a list of words" },
  )
  .transform((list) => [...new Set(list)])
  .refine((list) => list.length <= MUSCLES_MAX, `List at most ${MUSCLES_MAX} muscles`);

/** Empty text means "none". */
const optionalText = (max: number, label: string) =>
  z
    .string({ error: `The ${label} must be text` })
    .transform(tidy)
    .pipe(z.string().max(max, `Keep the ${label} to ${max} characters`))
    .transform((s) => (s === "" ? null : s))
    .nullable()
    .transform((s) => s ?? null);

export const patternSchema = optionalText(PATTERN_MAX, "movement pattern").transform((s) => s?.toLowerCase() ?? null);
export const groupSchema = optionalText(GROUP_MAX, "substitution group");

export const cuesSchema = z
  .string({ error: "Cues must be text" })
  .transform((s) => s.replace(/\r\n?/g, "\n").trim())
  .pipe(z.string().max(CUES_MAX, `Keep the cues to ${CUES_MAX} characters`));

export const SORTS = ["name", "equipment", "pattern"] as const;
export type LibrarySort = (typeof SORTS)[number];

export type ExerciseErrorCode = "not_found" | "invalid_input" | "conflict";

/** Raised by the exercise query module; the codes belong to the app's closed vocabulary (server/errors.ts). */
export class ExerciseError extends Error {
  constructor(
    readonly code: ExerciseErrorCode,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = "ExerciseError";
  }
}

/** Parses a field with its rule or throws invalid_input keyed by the field (and position, e.g. `aliases.0`). */
export function checkField<S extends z.ZodType>(schema: S, value: unknown, field: string): z.output<S> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[[field, ...issue.path].join(".")] ??= issue.message;
  throw new ExerciseError("invalid_input", Object.values(fields)[0], fields);
}

// ---- Media -----------------------------------------------------------------

export const MB = 1024 * 1024;
export const IMAGE_MAX_BYTES = 5 * MB;
export const VIDEO_MAX_BYTES = 25 * MB;

export const MEDIA_TYPES = ["image/jpeg", "image/png", "image/webp", "video/mp4", "video/webm"] as const;
export type MediaType = (typeof MEDIA_TYPES)[number];

export const MEDIA_EXTENSIONS: Record<MediaType, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
  "video/mp4": "mp4",
  "video/webm": "webm",
};

/** The one sentence a person reads whenever a file is refused. */
export const MEDIA_RULE = "Upload a JPEG, PNG or WebP image (up to 5 MB) or an MP4 or WebM video (up to 25 MB).";

export function mediaLimit(type: MediaType): number {
  return type.startsWith("video/") ? VIDEO_MAX_BYTES : IMAGE_MAX_BYTES;
}

const ascii = (bytes: Uint8Array, from: number, length: number) => String.fromCharCode(...bytes.subarray(from, from + length));

// ISO base media files open with a `ftyp` box naming a major brand; these are
// the brands of ordinary MP4 video. HEIF pictures and QuickTime also use ftyp
// and are left out on purpose.
const MP4_BRANDS = new Set(["isom", "iso2", "iso3", "iso4", "iso5", "iso6", "mp41", "mp42", "avc1", "M4V ", "dash", "mmp4", "MSNV", "f4v "]);

/**
 * The media type a file really is, read from its first bytes, or null when it
 * is none of the allowed ones.
 *
 * @example
 * sniffMedia(new Uint8Array([0xff, 0xd8, 0xff, 0xe0])); // "image/jpeg"
 * sniffMedia(new TextEncoder().encode("%PDF-1.7")); // null
 */
export function sniffMedia(bytes: Uint8Array): MediaType | null {
  const b = bytes;
  if (b.length >= 8 && b[0] === 0x89 && ascii(b, 1, 3) === "PNG" && b[4] === 0x0d && b[5] === 0x0a && b[6] === 0x1a && b[7] === 0x0a) return "image/png";
  if (b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff) return "image/jpeg";
  if (b.length >= 12 && ascii(b, 0, 4) === "RIFF" && ascii(b, 8, 4) === "WEBP") return "image/webp";
  if (b.length >= 12 && ascii(b, 4, 4) === "ftyp" && MP4_BRANDS.has(ascii(b, 8, 4))) return "video/mp4";
  if (b.length >= 4 && b[0] === 0x1a && b[1] === 0x45 && b[2] === 0xdf && b[3] === 0xa3) {
    // EBML is shared with Matroska; the DocType element in the header says "webm".
    const head = ascii(b, 4, Math.min(60, b.length - 4));
    if (head.includes("webm")) return "video/webm";
  }
  return null;
}

/**
 * Checks an upload: the declared type (when the browser sent a useful one)
 * and the bytes must both be an allowed type, and the size within that
 * type's limit. Returns the type read from the bytes.
 */
export function checkMedia(bytes: Uint8Array, declaredType: string): MediaType {
  const declared = declaredType.split(";")[0].trim().toLowerCase();
  if (bytes.length === 0) throw new ExerciseError("invalid_input", `That file is empty. ${MEDIA_RULE}`, { file: "The file is empty" });
  const vague = declared === "" || declared === "application/octet-stream";
  if (!vague && !(MEDIA_TYPES as readonly string[]).includes(declared)) {
    throw new ExerciseError("invalid_input", `Files of type ${declared} are not accepted. ${MEDIA_RULE}`, { file: "Not an allowed type" });
  }
  const real = sniffMedia(bytes);
  if (!real) {
    throw new ExerciseError("invalid_input", `That file's contents are not a JPEG, PNG, WebP, MP4 or WebM file, whatever its name says. ${MEDIA_RULE}`, {
      file: "Not an allowed type",
    });
  }
  const limit = mediaLimit(real);
  if (bytes.length > limit) {
    const kind = real.startsWith("video/") ? "A video" : "An image";
    throw new ExerciseError("invalid_input", `That file is ${(bytes.length / MB).toFixed(1)} MB. ${kind} can be at most ${limit / MB} MB.`, {
      file: `Over the ${limit / MB} MB limit`,
    });
  }
  return real;
}

/** Where uploaded files live; server/storage.ts provides the drivers. */
export interface MediaStore {
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  get(key: string): Promise<{ bytes: Uint8Array; contentType: string } | null>;
  remove(key: string): Promise<void>;
}

/** Keys are flat and unguessable: `ex-<exercise id>-<random>.<ext>`; nothing that could climb folders. */
export const MEDIA_KEY = /^ex-[0-9a-f-]{36}-[0-9a-f]{16}\.(jpg|png|webp|mp4|webm)$/;
