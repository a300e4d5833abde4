import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { pageViewer } from "@/server/guard";
import { listMessages, type StoredMessage } from "@/server/mailbox";

export const metadata = { title: "Mailbox" };

const WHEN = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", second: "2-digit", timeZone: "UTC" });

function size(bytes: number): string {
  return bytes < 1024 ? `${bytes} B` : bytes < 1024 * 1024 ? `${(bytes / 1024).toFixed(1)} KB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

/** The message text with its web addresses made clickable, so a link in a mail can be followed from here. */
function Linked({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <>
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} data-testid="mail-link" className="break-all font-medium text-ember-600 underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </>
  );
}

function Message({ m }: { m: StoredMessage }) {
  const date = m.date ? new Date(m.date) : null;
  return (
    <li>
      <article className="panel p-4 sm:p-5" data-testid="mail-message" aria-labelledby={`${m.id}-subject`}>
        <header className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
          <h2 id={`${m.id}-subject`} className="min-w-0 break-words text-base font-semibold text-iron" data-testid="mail-subject">
            {m.subject || "(no subject)"}
          </h2>
          <time className="text-xs text-iron-400" dateTime={m.date}>
            {date && !Number.isNaN(date.getTime()) ? `${WHEN.format(date)} UTC` : "date unknown"}
          </time>
        </header>
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-2 text-sm">
          <dt className="text-iron-400">To</dt>
          <dd className="min-w-0 break-all text-iron-700" data-testid="mail-to">{m.to.join(", ")}</dd>
          <dt className="text-iron-400">From</dt>
          <dd className="min-w-0 break-all text-iron-500">{m.from}</dd>
        </dl>
        <div className="mt-3 whitespace-pre-wrap break-words rounded-md bg-chalk-50 p-3 text-sm leading-relaxed text-iron-700" data-testid="mail-text">
          <Linked text={m.text} />
        </div>
        {m.attachments.length > 0 ? (
          <ul className="mt-3 flex flex-wrap gap-2 text-sm" aria-label="Attachments">
            {m.attachments.map((a) => (
              <li key={a.index}>
                <a href={`/admin/mailbox/${m.id}/${a.index}`} download={a.filename} className="btn-quiet px-3 py-1.5" data-testid="mail-attachment">
                  {a.filename} <span className="font-normal text-iron-400">· {size(a.size)}</span>
                </a>
              </li>
            ))}
          </ul>
        ) : null}
        {m.html ? (
          <details className="mt-3 text-sm">
            <summary className="cursor-pointer font-medium text-iron-500">As the recipient sees it (HTML)</summary>
            {/* No scripts, no navigation, no same-origin access: the HTML is only looked at. */}
            <iframe title={`HTML of “${m.subject}”`} sandbox="" srcDoc={m.html} className="mt-2 h-96 w-full rounded-md border border-chalk-300 bg-white" />
          </details>
        ) : null}
      </article>
    </li>
  );
}

export default async function MailboxPage() {
  await pageViewer(["admin"], "/admin/mailbox");
  const messages = await listMessages();
  if (messages === null) {
    return (
      <>
        <PageTitle title="Mailbox" />
        <EmptyState title="Mail goes to the real provider">
          This server sends e-mail through the SMTP provider set in its environment, so there is no local copy to show here. The
          mailbox appears when the local mail catcher is in use (IQ_MAILBOX_DIR is set, as it is for npm start and npm test).
        </EmptyState>
      </>
    );
  }
  return (
    <>
      <PageTitle
        title="Mailbox"
        lead="Every e-mail this server sent, caught on this machine instead of delivered, newest first. Links in them work like the real thing."
        actions={
          <a href="/admin/mailbox" className="btn-quiet">
            Check for new mail
          </a>
        }
      />
      {messages.length === 0 ? (
        <EmptyState title="No e-mail yet">Invitations and password-reset e-mails appear here as soon as they are sent.</EmptyState>
      ) : (
        <ul className="space-y-4" data-testid="mailbox">
          {messages.map((m) => (
            <Message key={m.id} m={m} />
          ))}
        </ul>
      )}
    </>
  );
}
