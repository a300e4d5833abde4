import "server-only";
import { forbidden, redirect } from "next/navigation";
import type { Role } from "@/db/database";
import { AppError } from "./errors";
import { getViewer, type Viewer } from "./auth";

/**
 * For server components and layouts: the viewer when their role is allowed.
 * Anonymous visitors go to sign-in; a signed-in person with another role gets
 * the 403 page (app/forbidden.tsx).
 */
export async function pageViewer(roles: Role[], from: string): Promise<Viewer> {
  const viewer = await getViewer();
  if (!viewer) redirect(`/signin?callbackUrl=${encodeURIComponent(from)}`);
  if (!roles.includes(viewer.role)) forbidden();
  return viewer;
}

/** For route handlers and server actions: the viewer, or an AppError to answer with. */
export async function requireViewer(roles: Role[]): Promise<Viewer> {
  const viewer = await getViewer();
  if (!viewer) throw new AppError("unauthenticated", "Sign in to continue.");
  if (!roles.includes(viewer.role)) throw new AppError("forbidden", "Your account does not have access to this.");
  return viewer;
}
