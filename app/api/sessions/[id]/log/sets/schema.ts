export { sessionParamsSchema } from "../schema";
/** PUT body: one set — reps 0–100, load 0–1500, RIR 0–10 or null, done, and the queue's clientId/clientTime. */
export { setLogSchema as setBodySchema } from "@/db/logs";
