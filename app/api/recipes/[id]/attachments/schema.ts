import { z } from "zod";

export { idParamsSchema } from "../schema";

const id = (what: string) => z.string({ error: `Pick ${what}` }).max(100, `Pick ${what}`);

/** POST /api/recipes/[id]/attachments: exactly one of a template or an assignment. */
export const attachBodySchema = z.union(
  [z.object({ templateId: id("one of your templates") }).strict(), z.object({ assignmentId: id("an assignment") }).strict()],
  { error: "Send either templateId or assignmentId" },
);
