import { z } from "zod";

export const proposalParamsSchema = z.object({ id: z.string().max(100) });
/** POST body: accept (records the max and recomputes future sessions) or dismiss. */
export const decisionBodySchema = z.object({ decision: z.enum(["accept", "dismiss"], { error: "decision is accept or dismiss" }) });
