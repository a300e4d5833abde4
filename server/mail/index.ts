/**
 * E-mail for the rest of the server: `sendMail` hands one message to the SMTP server named in
 * the environment (server/mail/config.ts); the message builders hold the words.
 *
 * @example
 * import { sendMail } from "@/server/mail";
 * await sendMail({ to: "maya@larchmere.test", subject: "Your card", text: "Attached.",
 *   attachments: [{ filename: "card.pdf", content: pdfBytes, contentType: "application/pdf" }] });
 */
export { type Attachment, type MailInput, sendMail } from "./send";
export { invitationMessage, type OutgoingMessage, passwordResetMessage } from "./messages";
