import { getDb } from "@/db/client";
import { mediaForViewer } from "@/db/exercises";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { getStorage } from "@/server/storage";
import { answer, parseWith } from "../../exercises/_lib/http";
import { keyParamsSchema } from "./schema";

type Ctx = { params: Promise<{ key: string }> };

function missing(): AppError {
  return new AppError("not_found", "That picture or clip does not exist or is not yours to see.");
}

/**
 * An exercise's uploaded media, for the owning coach and that coach's
 * athletes. Keys change with every upload, so a file never changes under its
 * URL and may be cached for a year (privately: it needs a session).
 */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { key } = parseWith(keyParamsSchema, await ctx.params);
    const media = await mediaForViewer(getDb(), viewer, key);
    if (!media) throw missing();
    const file = await getStorage().get(key);
    if (!file) throw missing();
    return new Response(new Blob([file.bytes as Uint8Array<ArrayBuffer>]), {
      status: 200,
      headers: {
        "content-type": media.type,
        "content-length": String(file.bytes.length),
        "cache-control": "private, max-age=31536000, immutable",
        "x-content-type-options": "nosniff",
        "content-disposition": "inline",
      },
    });
  });
}
