/**
 * The words of every e-mail Ironquill sends, as plain text and simple HTML.
 * Pure: no environment, no clock (callers pass the base URL and dates), so
 * each message can be checked on its own.
 *
 * @example
 * const m = invitationMessage({ to: "tomas@larchmere.test", athleteName: "Tomas", coachName: "Rowan Hale",
 *   baseUrl: "https://ironquill.example", token: "abc", expiresAt: new Date("2027-03-12T10:00:00Z"), resend: false });
 * m.subject; // "Rowan Hale invited you to train on Ironquill"
 * m.text.includes("https://ironquill.example/invite/abc"); // true
 */

export type OutgoingMessage = { to: string; subject: string; text: string; html: string };

const WHEN = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", hour: "2-digit", minute: "2-digit", timeZone: "UTC", hour12: false });

/** "12 March 2027 at 10:00 UTC" */
export function formatExpiry(date: Date): string {
  const parts = Object.fromEntries(WHEN.formatToParts(date).map((p) => [p.type, p.value]));
  return `${parts.day} ${parts.month} ${parts.year} at ${parts.hour}:${parts.minute} UTC`;
}

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

/** An absolute link under the app's public address; the token is URL-safe already but encoded anyway. */
export function linkTo(baseUrl: string, path: string, token: string): string {
  // Relative to the base (no leading slash), so an app served under a path keeps it.
  const relative = `${path.replace(/^\/+/, "")}/${encodeURIComponent(token)}`;
  return new URL(relative, baseUrl.endsWith("/") ? baseUrl : `${baseUrl}/`).toString();
}

type Block = { kind: "p"; text: string } | { kind: "button"; label: string; href: string } | { kind: "small"; text: string };

/** One layout for every message: paragraphs, one button with the raw link under it, a quiet footer. */
function render(blocks: Block[]): { text: string; html: string } {
  const text = blocks
    .map((b) => (b.kind === "button" ? `${b.label}:\n${b.href}` : b.text))
    .join("\n\n");
  const html = blocks
    .map((b) => {
      if (b.kind === "p") return `<p style="margin:0 0 16px">${escapeHtml(b.text)}</p>`;
      if (b.kind === "small") return `<p style="margin:24px 0 0;font-size:13px;color:#5b6472">${escapeHtml(b.text)}</p>`;
      const href = escapeHtml(b.href);
      return (
        `<p style="margin:24px 0 8px"><a href="${href}" style="display:inline-block;background:#c4562b;color:#ffffff;` +
        `padding:12px 20px;border-radius:6px;font-weight:600;text-decoration:none">${escapeHtml(b.label)}</a></p>` +
        `<p style="margin:0 0 16px;font-size:13px;color:#5b6472;word-break:break-all">Or paste this address into your browser: ${href}</p>`
      );
    })
    .join("\n");
  return {
    text: `${text}\n\n— Ironquill\n`,
    html:
      `<!doctype html><html><body style="margin:0;padding:24px;background:#f5f3ee">` +
      `<div style="max-width:520px;margin:0 auto;background:#ffffff;border-radius:10px;padding:28px;` +
      `font-family:system-ui,-apple-system,'Segoe UI',sans-serif;font-size:15px;line-height:1.5;color:#1c2128">\n${html}\n` +
      `<p style="margin:24px 0 0;color:#5b6472">— Ironquill</p></div></body></html>`,
  };
}

function greeting(name: string | null): string {
  const first = name?.trim();
  return first ? `Hi ${first},` : "Hello,";
}

export type InvitationInput = {
  to: string;
  athleteName: string | null;
  coachName: string;
  baseUrl: string;
  token: string;
  expiresAt: Date;
  /** A fresh link for an invitation sent before: say the old link no longer works. */
  resend: boolean;
  days: number;
};

export function invitationMessage(input: InvitationInput): OutgoingMessage {
  const href = linkTo(input.baseUrl, "/invite", input.token);
  const coach = input.coachName.trim() || "Your coach";
  const blocks: Block[] = [
    { kind: "p", text: greeting(input.athleteName) },
    input.resend
      ? { kind: "p", text: `${coach} has sent you a fresh link to join their athletes on Ironquill. The link in any earlier invitation no longer works; use this one.` }
      : { kind: "p", text: `${coach} would like to coach you on Ironquill. Once you join, your programme, the weights for each set and your training days will be waiting on your phone.` },
    { kind: "button", label: "Accept the invitation", href },
    { kind: "p", text: `The link works once and stays open for ${input.days} days, until ${formatExpiry(input.expiresAt)}. If it has run out, ask ${coach} to send you a new one.` },
    { kind: "small", text: "Not expecting this? You can ignore this e-mail: nothing happens unless the link is used." },
  ];
  return {
    to: input.to,
    subject: input.resend ? `A fresh invitation from ${coach}` : `${coach} invited you to train on Ironquill`,
    ...render(blocks),
  };
}

export type PasswordResetInput = { to: string; name: string; baseUrl: string; token: string; minutes: number };

export function passwordResetMessage(input: PasswordResetInput): OutgoingMessage {
  const href = linkTo(input.baseUrl, "/reset", input.token);
  const blocks: Block[] = [
    { kind: "p", text: greeting(input.name) },
    { kind: "p", text: `We were asked to reset the password of the Ironquill account for ${input.to}. Choose a new password with the link below.` },
    { kind: "button", label: "Choose a new password", href },
    { kind: "p", text: `The link works once, within ${input.minutes} minutes of this e-mail. After that, ask for another on the sign-in page.` },
    { kind: "small", text: "Didn't ask for this? Ignore this e-mail and your password stays as it is." },
  ];
  return { to: input.to, subject: "Choose a new Ironquill password", ...render(blocks) };
}
