import { z } from "zod";

/** POST /api/invitations: who to invite. The name is only used to greet them. */
export const createInvitationSchema = z.object({
  email: z.string({ error: "Enter the athlete's e-mail address" }).trim().min(1, "Enter the athlete's e-mail address").max(254, "Keep the e-mail under 254 characters").email("Enter a valid e-mail address"),
  name: z
    .string({ error: "The name is text" })
    .trim()
    .max(120, "Keep the name under 120 characters")
    .nullish()
    .transform((n) => (n ? n : null)),
});

export type CreateInvitationInput = z.input<typeof createInvitationSchema>;
