import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { DomainError } from "@/db/domainError";
import { TemplateError } from "@/db/templateRules";
import { AppError, errorBody, ERROR_CODES, fieldErrorsFromZod, toErrorResponse } from "./errors";

/**
 * Helpers every route handler shares: run a body and answer any failure in the
 * closed vocabulary, read JSON and query strings through a zod schema, answer
 * JSON that is never cached.
 */

/**
 * Answers any failure in the closed vocabulary. A programme that does not
 * parse also carries its positioned problems (`error.diagnostics`) so the
 * editor can mark each line.
 */
export function failure(err: unknown): NextResponse {
  if (err instanceof TemplateError) {
    const body = errorBody(err.code, err.message, err.fields);
    const withDiagnostics = err.diagnostics.length > 0 ? { error: { ...body.error, diagnostics: err.diagnostics } } : body;
    return NextResponse.json(withDiagnostics, { status: ERROR_CODES[err.code] });
  }
  if (err instanceof DomainError) return toErrorResponse(new AppError(err.code, err.message, err.fields));
  return toErrorResponse(err);
}

/** Runs a handler body; whatever it throws becomes a closed-vocabulary answer, never a stack trace. */
export async function answer(fn: () => Promise<Response>): Promise<Response> {
  try {
    return await fn();
  } catch (err) {
    return failure(err);
  }
}

function invalid(error: z.ZodError): AppError {
  const fields = fieldErrorsFromZod(error);
  const [field, message] = Object.entries(fields)[0] ?? ["_", "The request is not valid"];
  return new AppError("invalid_input", field === "_" ? message : `${field}: ${message}`, fields);
}

/** Validates plain data (route params, query strings) against a schema. */
export function parseWith<S extends z.ZodType>(schema: S, data: unknown): z.output<S> {
  const parsed = schema.safeParse(data);
  if (!parsed.success) throw invalid(parsed.error);
  return parsed.data;
}

// A programme is at most 256 KB; JSON escaping and the other fields fit well within 1 MB.
const JSON_MAX_BYTES = 1024 * 1024;

function tooLarge(): AppError {
  return new AppError("invalid_input", "The request is too large (at most 1 MB).", { _: "Too large" });
}

/**
 * Reads and validates a JSON body. Malformed JSON is the sender's mistake
 * (invalid_input), never a 500; an empty body counts as `{}` when allowed.
 */
export async function readJson<S extends z.ZodType>(req: Request, schema: S, options: { emptyIsObject?: boolean } = {}): Promise<z.output<S>> {
  if (Number(req.headers.get("content-length") ?? "0") > JSON_MAX_BYTES) throw tooLarge();
  let text: string;
  try {
    text = await req.text();
  } catch {
    throw new AppError("invalid_input", "The request body could not be read.", { _: "Send a JSON body" });
  }
  if (text.length > JSON_MAX_BYTES) throw tooLarge();
  let data: unknown;
  if (text.trim() === "" && options.emptyIsObject) data = {};
  else {
    try {
      data = JSON.parse(text);
    } catch {
      throw new AppError("invalid_input", "The request body is not valid JSON.", { _: "Send a JSON object, e.g. {\"title\": \"…\"}" });
    }
  }
  if (typeof data !== "object" || data === null || Array.isArray(data)) {
    throw new AppError("invalid_input", "The request body must be a JSON object.", { _: "Send a JSON object" });
  }
  return parseWith(schema, data);
}

/** The query string as a plain object for a schema (repeated keys: the first wins). */
export function queryOf(req: Request): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of new URL(req.url).searchParams) out[k] ??= v;
  return out;
}

/** JSON that is never cached: data changes under the reader. */
export function ok(data: unknown, status = 200): NextResponse {
  return NextResponse.json(data, { status, headers: { "cache-control": "no-store" } });
}
