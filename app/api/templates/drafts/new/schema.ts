// The body of a draft PUT is shared with /api/templates/[id]/draft.
export { draftBodySchema } from "../../schema";
