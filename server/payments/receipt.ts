import "server-only";
import type { Kysely } from "kysely";
import type { Database } from "@/db/database";
import { markReceiptMailed, type Receipt, receiptToMail } from "@/db/purchases";
import { formatMoney } from "@/lib/money";
import { escapeHtml } from "../mail/messages";
import { sendMail } from "../mail/send";

/**
 * The receipt e-mail for a paid purchase. Pure apart from `sendReceipt`, so
 * the words can be checked on their own.
 *
 * @example
 * receiptMessage(receipt, "https://ironquill.example").subject; // "Your receipt: Full-body basics (no. 12)"
 */

const DAY = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });

export function receiptMessage(r: Receipt, baseUrl: string): { to: string; subject: string; text: string; html: string } {
  const link = new URL(`/store/purchases/${r.purchaseId}`, baseUrl).toString();
  const amount = formatMoney(r.amountMinor, r.currency);
  const rows: [string, string][] = [
    ["Receipt no.", r.number],
    ["Date", r.paidAt ? DAY.format(r.paidAt) : "—"],
    ["Programme", r.title],
    ["Coach", r.sellerName],
    ["Amount paid", `${amount} (${r.currency.toUpperCase()})`],
    ["Payment reference", r.paymentReference ?? "—"],
  ];
  const first = r.buyerName.trim().split(/\s+/)[0];
  const text = [
    first ? `Hi ${first},` : "Hello,",
    `Thank you for buying “${r.title}”. Your own copy is ready: enter your maxes and start it whenever you like.`,
    rows.map(([k, v]) => `${k}: ${v}`).join("\n"),
    `Open your copy:\n${link}`,
    "Keep this e-mail as your receipt.",
  ].join("\n\n");
  const html =
    `<!doctype html><html><body style="margin:0;padding:24px;background:#f5f3ee">` +
    `<div style="max-width:520px;margin:0 auto;background:#ffffff;border-radius:10px;padding:28px;font-family:system-ui,-apple-system,'Segoe UI',sans-serif;font-size:15px;line-height:1.5;color:#1c2128">` +
    `<p style="margin:0 0 16px">${escapeHtml(first ? `Hi ${first},` : "Hello,")}</p>` +
    `<p style="margin:0 0 16px">Thank you for buying “${escapeHtml(r.title)}”. Your own copy is ready: enter your maxes and start it whenever you like.</p>` +
    `<table style="border-collapse:collapse;margin:0 0 16px">${rows
      .map(([k, v]) => `<tr><td style="padding:4px 16px 4px 0;color:#5b6472">${escapeHtml(k)}</td><td style="padding:4px 0">${escapeHtml(v)}</td></tr>`)
      .join("")}</table>` +
    `<p style="margin:24px 0 8px"><a href="${escapeHtml(link)}" style="display:inline-block;background:#c4562b;color:#ffffff;padding:12px 20px;border-radius:6px;font-weight:600;text-decoration:none">Open your copy</a></p>` +
    `<p style="margin:24px 0 0;font-size:13px;color:#5b6472">Keep this e-mail as your receipt.</p>` +
    `<p style="margin:24px 0 0;color:#5b6472">— Ironquill</p></div></body></html>`;
  return { to: r.buyerEmail, subject: `Your receipt: ${r.title} (no. ${r.number})`, text: `${text}\n\n— Ironquill\n`, html };
}

export async function sendReceipt(r: Receipt, baseUrl: string): Promise<void> {
  await sendMail(receiptMessage(r, baseUrl));
}

/**
 * Mails a paid purchase's receipt unless it went out already, then records
 * it. Throws when the mail cannot be sent, so a queued retry tries again; the
 * only window for a second copy is a crash between the SMTP server accepting
 * it and the record being written.
 */
export async function deliverReceipt(db: Kysely<Database>, purchaseId: string, baseUrl: string): Promise<"sent" | "nothing to send"> {
  const receipt = await receiptToMail(db, purchaseId);
  if (!receipt) return "nothing to send";
  await sendReceipt(receipt, baseUrl);
  await markReceiptMailed(db, purchaseId);
  return "sent";
}
