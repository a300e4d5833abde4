import { z } from "zod";

const versionId = z.string({ error: "Pick the version to move to" }).min(1, "Pick the version to move to").max(100, "That is not a version id");

/** GET /api/assignments/[id]/upgrade?versionId=… */
export const previewQuerySchema = z.object({ versionId });

/** POST /api/assignments/[id]/upgrade { versionId } */
export const applyBodySchema = z.object({ versionId });
