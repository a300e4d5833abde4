export { sessionParamsSchema } from "../schema";
/** PUT body: exerciseIndex with the exercise done (planned or a listed substitute) and/or a note. */
export { exerciseLogSchema as exerciseBodySchema } from "@/db/logs";
