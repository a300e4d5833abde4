import { emailWeekPack } from "@/db/cardMail";
import { getDb } from "@/db/client";
import { weekForCards } from "@/db/cards";
import { DomainError } from "@/db/domainError";
import { attachmentHeader, weekPackFileName } from "@/pdf/fileName";
import { renderCards } from "@/pdf/render";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf, readJson } from "@/server/http";
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
 * E-mails the pack to the athlete as a PDF attachment; for their coach. Sent
 * while the coach waits, so they see at once whether it went out.
 */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    const { from, weeks, size } = await readJson(req, emailBodySchema);
    const sent = await emailWeekPack(getDb(), viewer, id, from, { weeks: weeks ?? 1, size, senderName: viewer.name });
    return ok({ sent: { to: sent.to, sessions: sent.sessions, fileName: sent.fileName } });
  });
}
