import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { getDb } from "@/db/client";
import { findPasswordReset } from "@/db/passwordResets";
import { NewPasswordForm } from "./NewPasswordForm";

export const metadata = { title: "Choose a new password", robots: { index: false } };

const CLOSED = {
  unknown: { title: "This link isn't valid", text: "We don't know this reset link. Check that you opened the whole link from the e-mail, or ask for a new one." },
  used: { title: "This link has been used", text: "Each reset link works once, and this one already has. If you still can't sign in, ask for a new link." },
  expired: {
    title: "This link has run out",
    text: "Reset links work for an hour, and asking again replaces the earlier link. Ask for a new one and use the latest e-mail.",
  },
} as const;

export default async function NewPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = await findPasswordReset(getDb(), token);
  const footer = (
    <>
      Back to <Link href="/signin" className="font-semibold text-ember-600 hover:underline">sign in</Link>
    </>
  );
  if (found.status !== "valid") {
    const c = CLOSED[found.status];
    return (
      <AuthFrame title={c.title} lead="This reset link can't be used." footer={footer}>
        <div data-testid="reset-closed" data-state={found.status} className="space-y-4 text-sm leading-relaxed text-iron-700">
          <p>{c.text}</p>
          <Link href="/reset" className="btn-primary w-full">Ask for a new link</Link>
        </div>
      </AuthFrame>
    );
  }
  return (
    <AuthFrame title="Choose a new password" lead={`For the Ironquill account of ${found.email}.`} footer={footer}>
      <NewPasswordForm token={token} email={found.email} />
    </AuthFrame>
  );
}
