import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { ResetRequestForm } from "./ResetRequestForm";

export const metadata = { title: "Forgotten password" };

export default async function ResetPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const email = typeof params.email === "string" ? params.email.slice(0, 254) : "";
  return (
    <AuthFrame
      title="Forgotten your password?"
      lead="Enter the e-mail address of your account and we'll send a link to choose a new password."
      footer={
        <>
          Remembered it? <Link href="/signin" className="font-semibold text-ember-600 hover:underline">Sign in</Link>
        </>
      }
    >
      <ResetRequestForm defaultEmail={email} />
    </AuthFrame>
  );
}
