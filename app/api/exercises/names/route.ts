import { getDb } from "@/db/client";
import { exerciseNamesFor } from "@/db/exercises";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf } from "../_lib/http";
import { namesQuerySchema } from "./schema";

/**
 * Every exercise name and alias the editor should recognise (built-in plus
 * the library of the coach in charge), each with the exercise it means.
 */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    parseWith(namesQuerySchema, queryOf(req));
    return ok({ names: await exerciseNamesFor(getDb(), viewer) });
  });
}
