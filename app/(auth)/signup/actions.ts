"use server";
import { getDb } from "@/db/client";
import { createUser } from "@/db/users";
import { getViewer, hashPassword } from "@/server/auth";
import { fieldErrorsFromZod } from "@/server/errors";
import { signUpSchema, type SignUpState } from "./schema";

/** Creates a coach account. Anyone may sign up as a coach; athletes join by invitation. */
export async function createCoachAccount(_prev: SignUpState, form: FormData): Promise<SignUpState> {
  const values = { name: String(form.get("name") ?? ""), email: String(form.get("email") ?? "") };
  if (await getViewer()) return { ok: false, message: "You are already signed in. Sign out first to create another account.", fields: {}, values };
  const parsed = signUpSchema.safeParse({ ...values, password: String(form.get("password") ?? "") });
  if (!parsed.success) return { ok: false, message: "Some details need another look.", fields: fieldErrorsFromZod(parsed.error), values };
  try {
    const created = await createUser(getDb(), {
      email: parsed.data.email,
      name: parsed.data.name,
      passwordHash: await hashPassword(parsed.data.password),
      role: "coach",
    });
    if (!created) return { ok: false, message: "That e-mail already has an account.", fields: { email: "Already registered — sign in instead" }, values };
    return { ok: true, message: null, fields: {}, values };
  } catch (err) {
    console.error("[ironquill] sign-up failed:", err);
    return { ok: false, message: "We couldn't create the account just now. Nothing was saved; please try again.", fields: {}, values };
  }
}
