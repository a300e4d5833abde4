import { z } from "zod";

/**
 * POST /api/webhooks/payments takes the provider's raw bytes: the body is not
 * parsed before its signature is checked (any re-serialising would break it).
 * Only the header is validated here.
 */
export const signatureHeaderSchema = z.string().min(1).max(2000).nullable();

/** Events larger than this are not the provider's. */
export const WEBHOOK_MAX_BYTES = 512 * 1024;
