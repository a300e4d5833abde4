/**
 * Renders printable session cards to a PDF buffer: one card per session (a
 * long session continues on the next page), all in one document, so a week
 * or four weeks print as one pack. Used by the web routes, the e-mailed pack
 * and `iq cards`.
 *
 * @example
 * const pdf = await renderCards({ athlete: "Tomas Novák", size: "a6", baseUrl: "https://ironquill.test",
 *   sessions: [{ session, id: "0f…" }] });
 * // pdf: Buffer starting with "%PDF-"
 */
import { Document, renderToBuffer } from "@react-pdf/renderer";
import type { Session } from "../lib/load/types";
import { registerCardFonts } from "./fonts";
import { cardView } from "./model";
import { SessionCard } from "./SessionCard";
import type { CardSize } from "./sizes";

export interface CardSession {
  session: Session;
  /** The stored session's id; with `baseUrl` it puts a QR code to its logging page on the card. */
  id?: string | null;
}

export interface RenderCardsInput {
  athlete: string;
  sessions: CardSession[];
  size?: CardSize;
  /** Origin of the web app (NEXTAUTH_URL); without it, or without a session id, the card has no QR code. */
  baseUrl?: string | null;
  /** Document title shown by PDF viewers. */
  title?: string;
}

/** The athlete's logging page for a stored session. */
export function sessionLogUrl(baseUrl: string, sessionId: string): string {
  return `${baseUrl.replace(/\/+$/, "")}/athlete/sessions/${encodeURIComponent(sessionId)}/log`;
}

export async function renderCards(input: RenderCardsInput): Promise<Buffer> {
  if (input.sessions.length === 0) throw new RangeError("there are no sessions to print");
  registerCardFonts();
  const size = input.size ?? "a6";
  const first = input.sessions[0].session;
  const last = input.sessions[input.sessions.length - 1].session;
  const title = input.title ?? `Session cards · ${input.athlete} · ${first.date}${last.date !== first.date ? ` to ${last.date}` : ""}`;
  const doc = (
    <Document title={title} author="Ironquill" creator="Ironquill" producer="Ironquill" language="en">
      {input.sessions.map(({ session, id }, i) => (
        <SessionCard
          key={i}
          card={cardView(session, { athlete: input.athlete })}
          size={size}
          qrUrl={input.baseUrl && id ? sessionLogUrl(input.baseUrl, id) : null}
        />
      ))}
    </Document>
  );
  return renderToBuffer(doc);
}
