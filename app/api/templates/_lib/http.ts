import "server-only";
import { AppError } from "@/server/errors";

export { answer, failure, ok, parseWith, queryOf, readJson } from "@/server/http";

export function notFound(message = "That template does not exist or is not yours."): AppError {
  return new AppError("not_found", message);
}

