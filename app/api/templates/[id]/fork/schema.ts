import { z } from "zod";

/** POST /api/templates/[id]/fork: which version to start from (the latest when left out); an empty body is fine. */
export const forkBodySchema = z.object({
  versionNumber: z.number({ error: "versionNumber is a version number" }).int("versionNumber is a version number").min(1, "versionNumber starts at 1").optional(),
});
