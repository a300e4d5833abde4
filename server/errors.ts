/**
 * The one error vocabulary of the app. Route handlers and actions answer with
 * one of these codes and a message a person can act on; nothing else leaks
 * (no stack traces, no driver messages).
 */
import { NextResponse } from "next/server";
import type { z } from "zod";

export const ERROR_CODES = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  invalid_input: 422,
  conflict: 409,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
} as const;

export type ErrorCode = keyof typeof ERROR_CODES;

/** Field path → message, e.g. `{ "email": "That e-mail is already registered" }`. */
export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields: FieldErrors = {},
  ) {
    super(message);
  }
}

export type ErrorBody = { error: { code: ErrorCode; message: string; fields: FieldErrors } };

export function fieldErrorsFromZod(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    out[key] ??= issue.message;
  }
  return out;
}

export function errorBody(code: ErrorCode, message: string, fields: FieldErrors = {}): ErrorBody {
  return { error: { code, message, fields } };
}

export function errorResponse(code: ErrorCode, message: string, fields: FieldErrors = {}): NextResponse<ErrorBody> {
  return NextResponse.json(errorBody(code, message, fields), { status: ERROR_CODES[code] });
}

/** Turns anything thrown inside a handler into a closed-vocabulary answer; unknown errors are logged, not shown. */
export function toErrorResponse(err: unknown): NextResponse<ErrorBody> {
  if (err instanceof AppError) return errorResponse(err.code, err.message, err.fields);
  console.error("[ironquill] unexpected error:", err);
  return errorResponse("internal", "Something went wrong on our side. Nothing was lost; please try again.");
}
