import { z } from "zod";

/** /admin/mailbox/[id]/[n]: a stored message's id and the attachment's place in it (from 1). */
export const attachmentParamsSchema = z.object({
  id: z.string().regex(/^m\d{10,16}-[0-9a-f]{8}$/, "Not a message id"),
  n: z.string().regex(/^\d{1,3}$/, "The attachment number is a whole number").transform(Number),
});
