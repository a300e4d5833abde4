import { z } from "zod";

/** POST /api/templates/[id]/share: the version the link shows. */
export const shareBodySchema = z.object({
  versionNumber: z.number({ error: "versionNumber is a version number" }).int("versionNumber is a version number").min(1, "versionNumber starts at 1"),
});
