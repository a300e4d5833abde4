import { getDb } from "@/db/client";
import { AppError } from "@/server/errors";
import { answer, ok, parseWith } from "@/server/http";
import { appBaseUrl } from "@/server/payments/checkout";
import { receivePaymentEvent } from "@/server/payments/webhook";
import { signatureHeaderSchema, WEBHOOK_MAX_BYTES } from "./schema";

/**
 * The payment provider's events. No session: the signature over the raw body
 * is the authentication. 2xx tells the provider to stop retrying; a refused
 * signature answers 401, a failure on our side 5xx (the provider retries).
 */
export async function POST(req: Request) {
  return answer(async () => {
    if (Number(req.headers.get("content-length") ?? "0") > WEBHOOK_MAX_BYTES) throw new AppError("invalid_input", "The event is too large.");
    const body = await req.text();
    if (body.length > WEBHOOK_MAX_BYTES) throw new AppError("invalid_input", "The event is too large.");
    const signature = parseWith(signatureHeaderSchema, req.headers.get("stripe-signature"));
    const result = await receivePaymentEvent(getDb(), body, signature, appBaseUrl(req));
    return ok({ received: true, outcome: result.outcome });
  });
}
