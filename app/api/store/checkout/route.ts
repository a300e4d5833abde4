import { getDb } from "@/db/client";
import { appBaseUrl, startCheckout } from "@/server/payments/checkout";
import { requireViewer } from "@/server/guard";
import { answer, ok, readJson } from "@/server/http";
import { checkoutBodySchema } from "./schema";

/** Starts paying for a listing: answers the provider's checkout page to send the buyer to. */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    const body = await readJson(req, checkoutBodySchema);
    const started = await startCheckout(getDb(), viewer, body, appBaseUrl(req));
    return ok(started, 201);
  });
}
