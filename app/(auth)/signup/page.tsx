import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { SignUpForm } from "./SignUpForm";

export const metadata = { title: "Create a coach account" };

export default function SignUpPage() {
  return (
    <AuthFrame
      title="Create a coach account"
      lead="Write programmes, invite athletes and print their cards. Athletes join through their coach's invitation."
      footer={
        <>
          Already have an account? <Link href="/signin" className="font-semibold text-ember-600 hover:underline">Sign in</Link>
        </>
      }
    >
      <SignUpForm />
    </AuthFrame>
  );
}
