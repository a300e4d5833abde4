import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { SignInForm } from "./SignInForm";

export const metadata = { title: "Sign in" };

function safeCallback(raw: string | string[] | undefined): string {
  const value = Array.isArray(raw) ? raw[0] : raw;
  // Only same-site paths: an open redirect would let a link send people elsewhere after signing in.
  return value && value.startsWith("/") && !value.startsWith("//") ? value : "/dashboard";
}

// After joining through an invitation or choosing a new password, the sign-in form says so.
const NOTICES: Record<string, string> = {
  joined: "Your account is ready. Sign in with your new password.",
  reset: "Your new password is saved. Sign in with it.",
};

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const email = typeof params.email === "string" ? params.email.slice(0, 254) : "";
  const notice = typeof params.notice === "string" && Object.hasOwn(NOTICES, params.notice) ? NOTICES[params.notice] : undefined;
  return (
    <AuthFrame
      title="Sign in"
      lead="Coaches, athletes and admins all sign in here."
      footer={
        <>
          New coach? <Link href="/signup" className="font-semibold text-ember-600 hover:underline">Create an account</Link>
          <span className="mx-2 text-iron-300">·</span>
          <Link href="/reset" className="font-semibold text-ember-600 hover:underline">Forgot your password?</Link>
        </>
      }
    >
      {notice ? (
        <p role="status" data-testid="signin-notice" className="mb-4 rounded-md bg-moss-100 px-3 py-2 text-sm text-moss-700">
          {notice}
        </p>
      ) : null}
      <SignInForm callbackUrl={safeCallback(params.callbackUrl)} defaultEmail={email} />
    </AuthFrame>
  );
}
