import { getDb } from "@/db/client";
import { weekForCards } from "@/db/cards";
import { DomainError } from "@/db/domainError";
import { toJobView } from "@/db/jobs";
import { attachmentHeader, weekPackFileName } from "@/pdf/fileName";
import { renderCards } from "@/pdf/render";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf, readJson } from "@/server/http";
import { guardedBoss } from "@/server/jobs/boss";
import { enqueueCardPack } from "@/server/jobs/cardPack";
import { cardBaseUrl, pdfResponse } from "../../../sessions/[id]/card/pdfResponse";
import { athleteParamsSchema, cardsQuerySchema, emailBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** A week's (or four weeks') session cards as one PDF, one card per session, for the athlete or their coach. */
export async function GET(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    const { from, weeks, size } = parseWith(cardsQuerySchema, queryOf(req));
    const pack = await weekForCards(getDb(), viewer, id, from, weeks);
    if (pack.sessions.length === 0) {
      throw new DomainError("not_found", `No sessions are planned for ${pack.athlete.name} from ${pack.from} to ${pack.to}.`, { from: "No sessions in that week" });
    }
    const pdf = await renderCards({
      athlete: pack.athlete.name,
      size,
      baseUrl: cardBaseUrl(req),
      title: `Session cards · ${pack.athlete.name} · ${weeks === 1 ? pack.isoWeek : `${weeks} weeks from ${pack.isoWeek}`}`,
      sessions: pack.sessions,
    });
    return pdfResponse(pdf, attachmentHeader(weekPackFileName(pack.athlete.name, pack.isoWeek, weeks)));
  });
}

/**
 * Queues an e-mail of the pack to the athlete (PDF attachment); for their
 * coach. Someone else's athlete or an empty week is refused now; the sending
 * happens in the background and answers 202 `{ job }`, whose progress
 * GET /api/jobs/[id] reports (result `{ to, sessions, fileName }` when done).
 */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    const { from, weeks, size } = await readJson(req, emailBodySchema);
    const run = await enqueueCardPack(getDb(), queue, viewer, { athleteId: id, from, weeks: weeks ?? 1, size, senderName: viewer.name || null });
    return ok({ job: toJobView(run) }, 202);
  });
}

async function queue() {
  try {
    return await guardedBoss();
  } catch (err) {
    if (!(err instanceof AppError)) throw err;
    throw new AppError("unavailable", "The cards cannot be e-mailed right now. Download them and send them yourself, or try again in a minute.");
  }
}
