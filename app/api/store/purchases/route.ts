import { getDb } from "@/db/client";
import { listMyPurchases } from "@/db/purchases";
import { requireViewer } from "@/server/guard";
import { answer, ok } from "@/server/http";

/** The buyer's receipts: paid and refunded purchases, newest first. */
export async function GET() {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    return ok({ purchases: await listMyPurchases(getDb(), viewer) });
  });
}
