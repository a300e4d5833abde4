import { z } from "zod";

export const signUpSchema = z.object({
  name: z.string().trim().min(2, "Enter your name as athletes will see it").max(80, "Keep the name under 80 characters"),
  email: z.string().trim().email("Enter a valid e-mail address").max(200),
  password: z.string().min(10, "Use at least 10 characters").max(200, "Keep the password under 200 characters"),
});

export type SignUpState = { ok: boolean; message: string | null; fields: Record<string, string>; values: { name: string; email: string } };
