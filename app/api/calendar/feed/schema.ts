import { z } from "zod";

/** GET ?athleteId=… and POST / DELETE {athleteId}: whose feed; an athlete may leave it out. */
export const feedTargetSchema = z.object({ athleteId: z.string({ error: "athleteId is an athlete's id" }).max(100, "That id is too long").optional() });
