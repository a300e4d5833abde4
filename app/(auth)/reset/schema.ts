import { z } from "zod";

/** /reset: the address to send a link to. */
export const resetRequestSchema = z.object({
  email: z.string().trim().min(1, "Enter the e-mail address of your account").max(254, "Keep the e-mail under 254 characters").email("Enter a valid e-mail address"),
});

/** /reset/[token]: the new password, typed twice. */
export const newPasswordSchema = z
  .object({
    token: z.string().max(200, "The link is not valid"),
    password: z.string().min(10, "Use at least 10 characters").max(200, "Keep the password under 200 characters"),
    confirm: z.string().max(200, "Keep the password under 200 characters"),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords are not the same" });

export type ResetRequestState = { sent: boolean; message: string | null; fields: Record<string, string>; email: string };

export type NewPasswordState = {
  ok: boolean;
  message: string | null;
  fields: Record<string, string>;
  /** On success, for the sign-in page to fill in. */
  email: string | null;
  closed: "unknown" | "used" | "expired" | null;
};

/** The one answer to every well-formed request, whether or not the address has an account. */
export const RESET_SENT_MESSAGE =
  "If an account exists for that e-mail, a link to choose a new password is on its way. It works once, within an hour. Nothing arriving? Check the spam folder, or the address.";
