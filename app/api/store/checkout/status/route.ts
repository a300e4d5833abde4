import { getDb } from "@/db/client";
import { purchaseForSession } from "@/db/purchases";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf } from "@/server/http";
import { statusQuerySchema } from "./schema";

/**
 * Where the buyer's purchase stands after the provider sent them back:
 * "pending" until the signed webhook has arrived, then "paid" with the copy.
 * Reading it never grants anything.
 */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    const { session_id } = parseWith(statusQuerySchema, queryOf(req));
    const found = await purchaseForSession(getDb(), viewer, session_id);
    if (!found) throw new AppError("not_found", "No purchase of yours has that checkout reference.");
    return ok(found);
  });
}
