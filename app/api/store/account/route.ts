import { getDb } from "@/db/client";
import { createUser } from "@/db/users";
import { getViewer, hashPassword } from "@/server/auth";
import { AppError } from "@/server/errors";
import { answer, ok, readJson } from "@/server/http";
import { accountBodySchema } from "./schema";

/**
 * A visitor buying a programme makes an account on the way: an athlete who
 * coaches themself (no coach). The page signs in with the same details next.
 */
export async function POST(req: Request) {
  return answer(async () => {
    if (await getViewer()) throw new AppError("conflict", "You are already signed in.");
    const body = await readJson(req, accountBodySchema);
    const created = await createUser(getDb(), { email: body.email, name: body.name, passwordHash: await hashPassword(body.password), role: "athlete", coachId: null });
    if (!created) throw new AppError("conflict", "That e-mail already has an account; sign in to buy.", { email: "Already registered — sign in instead" });
    return ok({ id: created.id }, 201);
  });
}
