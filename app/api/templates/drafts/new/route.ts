import { NEW_DRAFT } from "@/db/templateDrafts";
import { draftHandlers } from "../../_lib/drafts";

const handlers = draftHandlers(async () => NEW_DRAFT);

/** The coach's programme in progress that is not a template yet: { draft: … | null }. */
export async function GET(req: Request) {
  return handlers.GET(req, undefined);
}

/** Autosave { source }: kept whatever it contains. Creating the template with fromDraft: true clears it. */
export async function PUT(req: Request) {
  return handlers.PUT(req, undefined);
}

export async function DELETE(req: Request) {
  return handlers.DELETE(req, undefined);
}
