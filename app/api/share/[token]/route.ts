import { getDb } from "@/db/client";
import { getSharedVersion, revokeShareLink } from "@/db/shareLinks";
import { requireViewer } from "@/server/guard";
import { answer, notFound, parseWith } from "../../templates/_lib/http";
import { tokenParamsSchema } from "./schema";
import { NextResponse } from "next/server";

type Ctx = { params: Promise<{ token: string }> };

/**
 * Public and read-only: the programme behind a link, with the owner's name
 * and nothing else about them. Not cached, so a revoked link stops at once.
 */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const { token } = parseWith(tokenParamsSchema, await ctx.params);
    const shared = await getSharedVersion(getDb(), token);
    if (!shared) throw notFound("This link does not work: it may have been revoked. Ask the coach for a new one.");
    return NextResponse.json({ shared }, { headers: { "cache-control": "no-store", "x-robots-tag": "noindex" } });
  });
}

/** Revokes a link to one of the coach's own templates. */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { token } = parseWith(tokenParamsSchema, await ctx.params);
    return NextResponse.json(await revokeShareLink(getDb(), viewer, token), { headers: { "cache-control": "no-store" } });
  });
}
