export { idParamsSchema } from "../../schema";
