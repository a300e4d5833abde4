import "server-only";
import { ExerciseError } from "@/db/exerciseRules";
import { failure } from "@/app/api/templates/_lib/http";
import { AppError } from "@/server/errors";

export { ok, parseWith, queryOf, readJson } from "@/app/api/templates/_lib/http";

/** Runs a handler body; whatever it throws becomes a closed-vocabulary answer, never a stack trace. */
export async function answer(fn: () => Promise<Response>): Promise<Response> {
  try {
    return await fn();
  } catch (err) {
    return failure(err instanceof ExerciseError ? new AppError(err.code, err.message, err.fields) : err);
  }
}

export function exerciseNotFound(): AppError {
  return new AppError("not_found", "That exercise does not exist or is not yours.");
}
