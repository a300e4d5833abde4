import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { SignInForm } from "./SignInForm";

export const metadata = { title: "Sign in" };

function safeCallback(raw: string | string[] | undefined): string {
  const value = Array.isArray(raw) ? raw[0] : raw;
  // Only same-site paths: an open redirect would let a link send people elsewhere after signing in.
  return value && value.startsWith("/") && !value.startsWith("//") ? value : "/dashboard";
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  return (
    <AuthFrame
      title="Sign in"
      lead="Coaches, athletes and admins all sign in here."
      footer={
        <>
          New coach? <Link href="/signup" className="font-semibold text-ember-600 hover:underline">Create an account</Link>
        </>
      }
    >
      <SignInForm callbackUrl={safeCallback(params.callbackUrl)} />
    </AuthFrame>
  );
}
