import "server-only";
import { CAUTION_TEXT } from "../components/Caution";
import { weekPackFileName } from "../pdf/fileName";
import { longDateRange } from "../pdf/model";
import { renderCards } from "../pdf/render";
import type { CardSize } from "../pdf/sizes";
import { publicBaseUrl } from "../server/mail/config";
import { sendMail } from "../server/mail/send";
import type { Actor, Db } from "./athleteAccess";
import { weekForCards, type WeekForCards } from "./cards";
import { DomainError } from "./domainError";

/**
 * The pack to e-mail, refused as not found (naming `from`) when nothing is
 * planned: checked when the coach asks, so they hear it at once, and again
 * when the queued job runs, since sessions may move in between.
 */
export async function weekToSend(db: Db, actor: Actor, athleteId: string, from: string, weeks: 1 | 4): Promise<WeekForCards> {
  const pack = await weekForCards(db, actor, athleteId, from, weeks);
  if (pack.sessions.length === 0) {
    const span = weeks === 1 ? `the week of ${from}` : `the 4 weeks from ${from}`;
    throw new DomainError("not_found", `No sessions are planned for ${pack.athlete.name} in ${span} (${pack.from} to ${pack.to}), so there is nothing to send.`, {
      from: weeks === 1 ? "No sessions in that week" : "No sessions in those weeks",
    });
  }
  return pack;
}

/**
 * E-mails an athlete the week's session cards as one PDF attachment: the
 * plain function the coach's page (directly or through a queued job) calls.
 * Same access rule as the downloads; a week with nothing planned is refused
 * before anything is sent. It reaches into server/mail because sending is the
 * whole point here; it sits in db/ beside the queries it needs.
 *
 * @example
 * await emailWeekPack(db, coach, athleteId, "2026-12-07"); // { to: "tomas@larchmere.test", sessions: 3, … }
 */
export async function emailWeekPack(
  db: Db,
  actor: Actor,
  athleteId: string,
  from: string,
  options: { weeks?: 1 | 4; size?: CardSize; senderName?: string } = {},
): Promise<{ to: string; sessions: number; fileName: string; messageId: string }> {
  const weeks = options.weeks ?? 1;
  const pack = await weekToSend(db, actor, athleteId, from, weeks);
  let baseUrl: string | null = null;
  try {
    baseUrl = publicBaseUrl();
  } catch {
    // Without a public address the cards still print; they only lose the QR code to the logging page.
  }
  const pdf = await renderCards({ athlete: pack.athlete.name, size: options.size ?? "a6", baseUrl, sessions: pack.sessions });
  const fileName = weekPackFileName(pack.athlete.name, pack.isoWeek, weeks);
  const range = longDateRange(pack.from, pack.to);
  const count = `${pack.sessions.length} session${pack.sessions.length === 1 ? "" : "s"}`;
  const sender = options.senderName ? `${options.senderName} sent you` : "Here are";
  const text = [
    `Hi ${pack.athlete.name},`,
    `${sender} your printable session cards for ${range} (${count}), attached as ${fileName}.`,
    "Each card has your loads and the plates for each side of the bar, with boxes to write down what you did. Scan the code on a card to log that session.",
    `Train safe. ${CAUTION_TEXT}`,
    "— Ironquill",
  ].join("\n\n");
  const { messageId } = await sendMail({
    to: pack.athlete.email,
    subject: `Your session cards for ${range}`,
    text,
    attachments: [{ filename: fileName, content: pdf, contentType: "application/pdf" }],
  });
  return { to: pack.athlete.email, sessions: pack.sessions.length, fileName, messageId };
}
