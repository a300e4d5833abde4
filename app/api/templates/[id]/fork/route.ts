import { getDb } from "@/db/client";
import { forkTemplate, getTemplate } from "@/db/templates";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "../../_lib/http";
import { idParamsSchema } from "../schema";
import { forkBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** A private copy, "Title (copy)", whose version 1 is the chosen version's source. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const { versionNumber } = await readJson(req, forkBodySchema, { emptyIsObject: true });
    const db = getDb();
    const created = await forkTemplate(db, viewer, id, versionNumber);
    return ok({ template: await getTemplate(db, viewer, created.id) }, 201);
  });
}
