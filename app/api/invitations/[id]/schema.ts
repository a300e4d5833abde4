import { z } from "zod";

/** Route params of /api/invitations/[id]/…: any text; an id that is not one of the coach's invitations is simply not found. */
export const invitationParamsSchema = z.object({ id: z.string().max(100) });
