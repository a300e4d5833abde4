import { z } from "zod";

/** POST /api/invitations/[id]/resend takes no body; an empty object (or nothing) is fine. */
export const resendBodySchema = z.object({}).strict();
