import { z } from "zod";

/** GET query: whose open proposals. */
export const proposalsQuerySchema = z.object({ athleteId: z.string({ error: "athleteId: say whose proposals" }).max(100) });
