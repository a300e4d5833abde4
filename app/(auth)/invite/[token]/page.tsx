import Link from "next/link";
import type { ReactNode } from "react";
import { AuthFrame } from "@/components/AuthFrame";
import { getDb } from "@/db/client";
import { findInvitationByToken, INVITATION_DAYS } from "@/db/invitations";
import { AcceptForm } from "./AcceptForm";

export const metadata = { title: "Your invitation", robots: { index: false } };

const WHEN = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });

const signInLink = (
  <>
    Already on Ironquill? <Link href="/signin" className="font-semibold text-ember-600 hover:underline">Sign in</Link>
  </>
);

/** A link that cannot be used: which of the cases it is, and the one thing to do about it. */
function Closed({ state, title, children, footer = signInLink }: { state: string; title: string; children: ReactNode; footer?: ReactNode }) {
  return (
    <AuthFrame title={title} lead="This invitation link can't be used." footer={footer}>
      <div data-testid="invite-closed" data-state={state} className="space-y-3 text-sm leading-relaxed text-iron-700">
        {children}
      </div>
    </AuthFrame>
  );
}

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = await findInvitationByToken(getDb(), token);

  switch (found.status) {
    case "unknown":
      return (
        <Closed state="unknown" title="This link isn't valid">
          <p>We don&apos;t know this invitation link. Check that you opened the whole link from the e-mail — some mail apps break long links in two.</p>
          <p>If it still doesn&apos;t work, ask your coach to send the invitation again.</p>
        </Closed>
      );
    case "accepted":
      return (
        <Closed state="used" title="This invitation has been used">
          <p>Someone has already joined {found.coachName} with this link, and each link works once.</p>
          <p>If that was you, sign in with the e-mail address the invitation came to. If it wasn&apos;t, tell {found.coachName}.</p>
        </Closed>
      );
    case "expired":
      return (
        <Closed state="expired" title="This invitation has expired">
          <p>Invitation links stay open for {INVITATION_DAYS} days, and this one has run out.</p>
          <p>Ask {found.coachName} to send it again — the new e-mail carries a fresh link.</p>
        </Closed>
      );
    case "revoked":
      return (
        <Closed state="revoked" title="This invitation was withdrawn">
          <p>{found.coachName} withdrew this invitation, so the link no longer works.</p>
          <p>If you think that was a mistake, ask them to invite you again.</p>
        </Closed>
      );
  }

  if (found.account === "staff" || found.account === "disabled") {
    return (
      <Closed state={found.account} title="This address can't join as an athlete">
        {found.account === "staff" ? (
          <p>{found.email} already belongs to a coach or admin account, and those can&apos;t also join as an athlete.</p>
        ) : (
          <p>The account for {found.email} is switched off, so it can&apos;t accept invitations.</p>
        )}
        <p>Ask {found.coachName} to invite a different e-mail address for your training.</p>
      </Closed>
    );
  }

  const existing = found.account === "athlete";
  return (
    <AuthFrame
      title={`Join ${found.coachName} on Ironquill`}
      lead={
        existing
          ? `You already have an athlete account for ${found.email}. Enter its password to make ${found.coachName} your coach.`
          : `${found.coachName} invited ${found.email} to train with them. Choose your password to create your athlete account.`
      }
      footer={
        <span data-testid="invite-expiry">This link works once, until {WHEN.format(found.expiresAt)}.</span>
      }
    >
      <AcceptForm token={token} email={found.email} mode={existing ? "existing" : "new"} suggestedName={found.name ?? ""} />
    </AuthFrame>
  );
}
