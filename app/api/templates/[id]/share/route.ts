import { getDb } from "@/db/client";
import { createShareLink, listShareLinks } from "@/db/shareLinks";
import { requireViewer } from "@/server/guard";
import { answer, notFound, ok, parseWith, readJson } from "../../_lib/http";
import { withUrl } from "../../_lib/share";
import { idParamsSchema } from "../schema";
import { shareBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** The template's links that still work. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const links = await listShareLinks(getDb(), viewer, id);
    if (!links) throw notFound();
    return ok({ links: links.map(withUrl) });
  });
}

/** A read-only link to one version (201), or the one already out for it (200, reused). */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const { versionNumber } = await readJson(req, shareBodySchema);
    const { reused, ...link } = await createShareLink(getDb(), viewer, id, versionNumber);
    return ok({ link: withUrl(link), reused }, reused ? 200 : 201);
  });
}
