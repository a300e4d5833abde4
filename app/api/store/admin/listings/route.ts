import { getDb } from "@/db/client";
import { adminListListings } from "@/db/listings";
import { requireViewer } from "@/server/guard";
import { answer, ok } from "@/server/http";

/** Every listing in the store, for admins. */
export async function GET() {
  return answer(async () => {
    const viewer = await requireViewer(["admin"]);
    return ok({ listings: await adminListListings(getDb(), viewer) });
  });
}
