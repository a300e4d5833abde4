import "server-only";
import { getDb } from "@/db/client";
import { clearDraft, getDraft, saveDraft } from "@/db/templateDrafts";
import { requireViewer } from "@/server/guard";
import { draftBodySchema } from "../schema";
import { answer, ok, readJson } from "./http";

/** GET, PUT and DELETE of one draft; `key` is a template id or "new". Both draft routes share them. */
export function draftHandlers(keyOf: (ctx: unknown) => Promise<string>) {
  return {
    async GET(_req: Request, ctx: unknown) {
      return answer(async () => {
        const viewer = await requireViewer(["coach"]);
        return ok({ draft: await getDraft(getDb(), viewer, await keyOf(ctx)) });
      });
    },
    /** Autosave: any text is kept, parseable or not (only size is limited). */
    async PUT(req: Request, ctx: unknown) {
      return answer(async () => {
        const viewer = await requireViewer(["coach"]);
        const key = await keyOf(ctx);
        const body = await readJson(req, draftBodySchema);
        const saved = await saveDraft(getDb(), viewer, key, body);
        return ok({ savedAt: saved.updatedAt });
      });
    },
    async DELETE(_req: Request, ctx: unknown) {
      return answer(async () => {
        const viewer = await requireViewer(["coach"]);
        return ok(await clearDraft(getDb(), viewer, await keyOf(ctx)));
      });
    },
  };
}
