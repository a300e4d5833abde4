import "server-only";
import bcrypt from "bcryptjs";
import type { NextAuthOptions, Session } from "next-auth";
import { getServerSession } from "next-auth";
import { cache } from "react";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import type { Role } from "@/db/database";
import { getDb } from "@/db/client";
import { findUserForSignIn, viewerForSession } from "@/db/users";

export const credentialsSchema = z.object({
  email: z.string().trim().email("Enter the e-mail address you signed up with"),
  password: z.string().min(1, "Enter your password").max(200),
});

// A hash of a random string: comparing against it when the e-mail is unknown
// keeps the answer time the same, so timing does not reveal who has an account.
const DUMMY_HASH = "$2b$10$jslPf1slAsGEgPfr/Ew0CufxxN/FpvvZXW.dwr95Tzf48XzJC28C.";

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 30 * 24 * 60 * 60 },
  pages: { signIn: "/signin", error: "/signin" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw) {
        const parsed = credentialsSchema.safeParse(raw ?? {});
        if (!parsed.success) return null;
        const user = await findUserForSignIn(getDb(), parsed.data.email);
        const ok = await bcrypt.compare(parsed.data.password, user?.passwordHash ?? DUMMY_HASH);
        if (!user || !ok || user.disabled) return null;
        return { id: user.id, email: user.email, name: user.name, role: user.role };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.id = user.id;
        token.role = (user as unknown as { role: Role }).role;
        // Kept through every refresh of the token (unlike iat), so a later password change can end it.
        token.signedInAt = Date.now();
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.id as string;
        session.user.role = token.role as Role;
        session.user.signedInAt = typeof token.signedInAt === "number" ? token.signedInAt : null;
      }
      return session;
    },
  },
};

export type Viewer = { id: string; name: string; email: string; role: Role };

/**
 * The signed-in person, or null. Every page, handler and action asks this
 * itself. The token alone is not trusted for long: the account is read on each
 * request (once: layout and page share the answer), so a disabled account or
 * a password reset ends sessions at once.
 */
export const getViewer = cache(async (): Promise<Viewer | null> => {
  const session: Session | null = await getServerSession(authOptions);
  const u = session?.user;
  if (!u?.id || !u.role) return null;
  return viewerForSession(getDb(), { id: u.id, signedInAt: u.signedInAt ?? null });
});

export function homeFor(role: Role): string {
  return role === "admin" ? "/admin" : role === "coach" ? "/coach" : "/athlete";
}

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, 10);
}
