import "server-only";
import type { Viewer } from "@/server/auth";
import { AppError } from "@/server/errors";

/** An athlete asks about themself unless they say otherwise; a coach names the athlete. */
export function athleteIdFor(viewer: Viewer, athleteId: string | undefined): string {
  if (athleteId) return athleteId;
  if (viewer.role === "athlete") return viewer.id;
  throw new AppError("invalid_input", "athleteId: say which athlete", { athleteId: "Say which athlete" });
}
