import { getDb } from "@/db/client";
import { getListingForTemplate, saveListing } from "@/db/listings";
import { findOwnTemplate } from "@/db/templateAccess";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { idParamsSchema, listingBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** The listing of one of the coach's templates; `listing: null` when it has none yet. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const db = getDb();
    if (!(await findOwnTemplate(db, viewer, id))) throw new AppError("not_found", "That template does not exist or is not yours.");
    return ok({ listing: await getListingForTemplate(db, viewer, id) });
  });
}

/** Creates or replaces the listing: price, currency, public description, level, version sold, on sale or not. */
export async function PUT(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const body = await readJson(req, listingBodySchema);
    return ok({ listing: await saveListing(getDb(), viewer, id, body) });
  });
}
