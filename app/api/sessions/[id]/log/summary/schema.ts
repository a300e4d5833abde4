export { sessionParamsSchema } from "../schema";
