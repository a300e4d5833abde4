import { getDb } from "@/db/client";
import { getVersion } from "@/db/templateVersions";
import { slugify } from "@/lib/slug";
import { requireViewer } from "@/server/guard";
import { answer, notFound, ok, parseWith, queryOf } from "../../../_lib/http";
import { versionParamsSchema, versionQuerySchema } from "./schema";

type Ctx = { params: Promise<{ id: string; number: string }> };

/** One version as JSON (source and parsed model), or with ?format=iq its source as a download. */
export async function GET(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id, number } = parseWith(versionParamsSchema, await ctx.params);
    const { format } = parseWith(versionQuerySchema, queryOf(req));
    const version = await getVersion(getDb(), viewer, id, number);
    if (!version) throw notFound("That template or version does not exist or is not yours.");
    if (format !== "iq") return ok({ version });
    const filename = `${slugify(version.templateTitle, "template")}-v${version.number}.iq`;
    return new Response(version.source, {
      headers: {
        "content-type": "text/plain; charset=utf-8",
        "content-disposition": `attachment; filename="${filename}"`,
        "cache-control": "no-store",
      },
    });
  });
}
