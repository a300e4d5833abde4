// The body of a draft PUT is shared with /api/templates/drafts/new.
export { draftBodySchema } from "../../schema";
export { idParamsSchema } from "../schema";
