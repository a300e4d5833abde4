import { getDb } from "@/db/client";
import { sessionForCard } from "@/db/cards";
import { attachmentHeader, sessionCardFileName } from "@/pdf/fileName";
import { renderCards } from "@/pdf/render";
import { requireViewer } from "@/server/guard";
import { answer, parseWith, queryOf } from "@/server/http";
import { cardBaseUrl, pdfResponse } from "./pdfResponse";
import { cardQuerySchema, idParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** One session's printable card as a PDF download, for the athlete or their coach. */
export async function GET(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const { size } = parseWith(cardQuerySchema, queryOf(req));
    const card = await sessionForCard(getDb(), viewer, id);
    const pdf = await renderCards({ athlete: card.athlete.name, size, baseUrl: cardBaseUrl(req), sessions: [{ id: card.id, session: card.session }] });
    return pdfResponse(pdf, attachmentHeader(sessionCardFileName(card.athlete.name, card.session.date, card.session.day)));
  });
}
