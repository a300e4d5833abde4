import type { DefaultSession } from "next-auth";
import type { Role } from "@/db/database";

declare module "next-auth" {
  interface Session {
    user: DefaultSession["user"] & { id: string; role: Role; signedInAt?: number | null };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    id?: string;
    role?: Role;
    /** When this session signed in, ms since the epoch. */
    signedInAt?: number;
  }
}
