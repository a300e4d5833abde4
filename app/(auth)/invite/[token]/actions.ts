"use server";
import bcrypt from "bcryptjs";
import { getDb } from "@/db/client";
import { DomainError } from "@/db/domainError";
import { acceptInvitation, type AcceptClaim, LinkClosedError } from "@/db/invitations";
import { hashPassword } from "@/server/auth";
import { fieldErrorsFromZod } from "@/server/errors";
import { type AcceptState, existingAccountSchema, newAccountSchema } from "./schema";

/**
 * Uses an invitation link: creates the athlete account under the inviting coach, or (mode
 * "existing") links the athlete account that already has this e-mail, after checking its password.
 */
export async function acceptInvitationAction(_prev: AcceptState, form: FormData): Promise<AcceptState> {
  const values = { name: String(form.get("name") ?? "") };
  const base = { ok: false, values, email: null, closed: null } as const;
  const raw = {
    token: String(form.get("token") ?? ""),
    name: values.name,
    password: String(form.get("password") ?? ""),
    confirm: String(form.get("confirm") ?? ""),
  };
  let claim: AcceptClaim;
  if (form.get("mode") === "existing") {
    const parsed = existingAccountSchema.safeParse(raw);
    if (!parsed.success) return { ...base, message: "Enter your password.", fields: fieldErrorsFromZod(parsed.error) };
    claim = { kind: "existing", checkPassword: (hash) => bcrypt.compare(parsed.data.password, hash) };
  } else {
    const parsed = newAccountSchema.safeParse(raw);
    if (!parsed.success) return { ...base, message: "Some details need another look.", fields: fieldErrorsFromZod(parsed.error) };
    claim = { kind: "new", name: parsed.data.name, passwordHash: await hashPassword(parsed.data.password) };
  }
  try {
    const accepted = await acceptInvitation(getDb(), raw.token, claim);
    return { ok: true, message: null, fields: {}, values, email: accepted.email, closed: null };
  } catch (err) {
    if (err instanceof LinkClosedError) return { ...base, message: err.message, fields: {}, closed: err.state };
    if (err instanceof DomainError) return { ...base, message: err.message, fields: err.fields };
    console.error("[ironquill] accepting an invitation failed:", err);
    return { ...base, message: "We couldn't finish just now. Nothing was changed; please try again.", fields: {} };
  }
}
