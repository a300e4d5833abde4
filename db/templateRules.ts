/**
 * Field rules for templates, shared by the query modules (which enforce them
 * whoever calls) and the route schemas (which answer a person field by field).
 * Pure zod, no database: the editor's forms may import it too.
 *
 * @example
 * tagsSchema.parse([" Strength ", "strength", "Kg"]); // ["strength", "kg"]
 */
import { z } from "zod";
import type { Diagnostic } from "../lib/notation/model";

export const TITLE_MAX = 120;
export const DESCRIPTION_MAX = 2000;
export const TAGS_MAX = 12;
export const TAG_MAX = 32;
export const NOTE_MAX = 500;
/** The largest programme text accepted anywhere (also the upload limit). */
export const SOURCE_MAX_BYTES = 256 * 1024;

export const VISIBILITIES = ["private", "link", "listed"] as const;

/** CR LF and lone CR become LF, and a leading byte-order mark goes, so equal programmes compare equal. */
export function normaliseSource(source: string): string {
  return source.replace(/^\uFEFF/, "").replace(/\r\n?/g, "\n");
}

const encoder = new TextEncoder();
function utf8Length(s: string): number {
  return encoder.encode(s).length;
}

export const titleSchema = z
  .string({ error: "Give the template a title" })
  .trim()
  .min(1, "Give the template a title")
  .max(TITLE_MAX, `Keep the title to ${TITLE_MAX} characters`);

export const descriptionSchema = z
  .string({ error: "The description must be text" })
  .trim()
  .max(DESCRIPTION_MAX, `Keep the description to ${DESCRIPTION_MAX} characters`);

export const tagsSchema = z
  .array(
    z
      .string({ error: "Each tag must be text" })
      .trim()
      .toLowerCase()
      .min(1, "A tag cannot be empty")
      .max(TAG_MAX, `Keep each tag to ${TAG_MAX} characters`),
    { error: "Tags must be a list of words" },
  )
  .transform((tags) => [...new Set(tags)])
  .refine((tags) => tags.length <= TAGS_MAX, `Use at most ${TAGS_MAX} tags`);

export const noteSchema = z
  .string({ error: "The note must be text" })
  .trim()
  .max(NOTE_MAX, `Keep the note to ${NOTE_MAX} characters`)
  .transform((n) => (n === "" ? null : n));

/** Anything a coach typed, however broken: drafts must never refuse work. */
export const draftSourceSchema = z
  .string({ error: "The programme text is missing" })
  .refine((s) => utf8Length(s) <= SOURCE_MAX_BYTES, `The programme is over ${SOURCE_MAX_BYTES / 1024} KB`)
  .transform(normaliseSource);

/** A version also has to say something; whether it parses is checked when saving. */
export const versionSourceSchema = draftSourceSchema.refine((s) => s.trim() !== "", "The programme is empty");

export const visibilitySchema = z.enum(VISIBILITIES, { error: "Visibility is private, link or listed" });

export type TemplateErrorCode = "not_found" | "invalid_input" | "conflict";

/** What a diagnostic looks like in an error body: position and words, nothing internal. */
export type SourceProblem = Pick<Diagnostic, "line" | "column" | "length" | "severity" | "message">;

/**
 * Raised by the template query modules. The codes are a subset of the app's
 * closed vocabulary (server/errors.ts) so a handler can pass them straight on.
 */
export class TemplateError extends Error {
  constructor(
    readonly code: TemplateErrorCode,
    message: string,
    readonly fields: Record<string, string> = {},
    readonly diagnostics: SourceProblem[] = [],
  ) {
    super(message);
    this.name = "TemplateError";
  }
}

/** Parses a field with its rule or throws invalid_input keyed by the field (and position, e.g. `tags.0`). */
export function check<S extends z.ZodType>(schema: S, value: unknown, field: string): z.output<S> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[[field, ...issue.path].join(".")] ??= issue.message;
  throw new TemplateError("invalid_input", Object.values(fields)[0], fields);
}

/** The error for a programme that does not parse cleanly, with every problem positioned. */
export function sourceProblems(diagnostics: readonly Diagnostic[]): TemplateError | null {
  const errors = diagnostics.filter((d) => d.severity === "error");
  if (errors.length === 0) return null;
  const first = errors[0];
  const count = errors.length === 1 ? "1 problem" : `${errors.length} problems`;
  return new TemplateError(
    "invalid_input",
    `The programme has ${count} to fix before it can be saved as a version; drafts keep your text meanwhile.`,
    { source: `${count}, first at ${first.line}:${first.column}: ${first.message}` },
    errors.map((d) => ({ line: d.line, column: d.column, length: d.length, severity: d.severity, message: d.message })),
  );
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Ids come from URLs; anything that is not a uuid cannot name a template (and must not reach PostgreSQL). */
export function isUuid(value: string): boolean {
  return UUID.test(value);
}
