import { z } from "zod";

export const paramsSchema = z.object({ id: z.string().max(100), attachmentId: z.string().max(100) });
