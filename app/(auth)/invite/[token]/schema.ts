import { z } from "zod";
import type { ClosedState } from "@/db/invitations";

const token = z.string().max(200, "The link is not valid");

/** Accepting as a new athlete: a name the coach will see and a password typed twice. */
export const newAccountSchema = z
  .object({
    token,
    name: z.string().trim().min(2, "Enter your name as your coach will see it").max(80, "Keep the name under 80 characters"),
    password: z.string().min(10, "Use at least 10 characters").max(200, "Keep the password under 200 characters"),
    confirm: z.string().max(200, "Keep the password under 200 characters"),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords are not the same" });

/** Accepting with an athlete account that already exists: its password proves it is theirs. */
export const existingAccountSchema = z.object({
  token,
  password: z.string().min(1, "Enter the password of your account").max(200, "Keep the password under 200 characters"),
});

export type AcceptState = {
  ok: boolean;
  message: string | null;
  fields: Record<string, string>;
  values: { name: string };
  /** On success: the account's e-mail, for signing straight in. */
  email: string | null;
  /** The link stopped working meanwhile (used, expired, withdrawn): the page reloads to say so. */
  closed: ClosedState | null;
};
