"use client";
import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: "/" })} className="rounded-md px-3 py-2 text-sm font-medium text-iron-300 hover:bg-iron-700 hover:text-white">
      Sign out
    </button>
  );
}
