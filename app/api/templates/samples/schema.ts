import { z } from "zod";

/** GET /api/templates/samples takes no input; this is the shape of each entry it lists. */
export const sampleSchema = z.object({ name: z.string(), title: z.string(), description: z.string() });
