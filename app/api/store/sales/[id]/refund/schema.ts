export { idParamsSchema } from "../../../schema";
