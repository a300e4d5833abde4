import "server-only";
import Stripe from "stripe";
import { AppError } from "../errors";

/**
 * The payment provider's SDK, configured from the environment. Locally the
 * start and test commands point it at the fake payment API on 127.0.0.1
 * (scripts/fakes/payments.mjs) through STRIPE_API_HOST / _PORT / _PROTOCOL;
 * leaving those unset talks to the real service (DEVELOPERS.md, "Payments").
 *
 * @example
 * const stripe = paymentsClient();
 * await stripe.checkout.sessions.create({ … }, { idempotencyKey });
 */

type Env = Record<string, string | undefined>;

export type PaymentsConfig = {
  secretKey: string;
  webhookSecret: string;
  host: string | null;
  port: number | null;
  protocol: "http" | "https" | null;
};

/** Signed events older than this are refused (seconds; the SDK's own default is the same 300). */
export const WEBHOOK_TOLERANCE_SECONDS = 300;

export class PaymentsConfigError extends Error {}

export function paymentsConfig(env: Env = process.env): PaymentsConfig {
  const secretKey = env.STRIPE_SECRET_KEY?.trim();
  if (!secretKey) throw new PaymentsConfigError("STRIPE_SECRET_KEY is not set");
  const webhookSecret = env.STRIPE_WEBHOOK_SECRET?.trim();
  if (!webhookSecret) throw new PaymentsConfigError("STRIPE_WEBHOOK_SECRET is not set");
  const host = env.STRIPE_API_HOST?.trim() || null;
  const rawPort = env.STRIPE_API_PORT?.trim();
  const port = rawPort ? Number(rawPort) : null;
  if (port !== null && (!Number.isInteger(port) || port < 1 || port > 65535)) throw new PaymentsConfigError(`STRIPE_API_PORT is not a port number: ${rawPort}`);
  const rawProtocol = env.STRIPE_API_PROTOCOL?.trim() || null;
  if (rawProtocol !== null && rawProtocol !== "http" && rawProtocol !== "https") throw new PaymentsConfigError(`STRIPE_API_PROTOCOL is http or https, not ${rawProtocol}`);
  return { secretKey, webhookSecret, host, port, protocol: rawProtocol };
}

let cached: { key: string; client: Stripe } | null = null;

function unavailable(err: unknown): AppError {
  if (err instanceof PaymentsConfigError) console.error(`[ironquill] payments are not set up: ${err.message}`);
  return new AppError("unavailable", "Payments are not available on this server just now. Nothing was charged; please try again later.");
}

/** The configured settings, or an `unavailable` AppError (the cause is logged, never shown). */
export function requirePaymentsConfig(): PaymentsConfig {
  try {
    return paymentsConfig();
  } catch (err) {
    throw unavailable(err);
  }
}

/** One SDK client per configuration; rebuilt if the settings change (tests move the fake's port). */
export function paymentsClient(): Stripe {
  const config = requirePaymentsConfig();
  const key = JSON.stringify(config);
  if (cached?.key === key) return cached.client;
  const client = new Stripe(config.secretKey, {
    ...(config.host ? { host: config.host } : {}),
    ...(config.port ? { port: config.port } : {}),
    ...(config.protocol ? { protocol: config.protocol } : {}),
    // Retries reuse the idempotency key we send, so a retried create never makes two sessions.
    maxNetworkRetries: 2,
    timeout: 20_000,
    telemetry: false,
    appInfo: { name: "Ironquill" },
  });
  cached = { key, client };
  return client;
}

/** Provider failures (network, 4xx, 5xx) as one message a person can act on; the cause is logged. */
export function providerFailure(err: unknown, what: string, reassurance: string): AppError {
  if (err instanceof AppError) return err;
  const detail = err instanceof Stripe.errors.StripeError ? `${err.type} ${err.statusCode ?? ""} ${err.code ?? ""}: ${err.message}` : String(err);
  console.error(`[ironquill] payment provider: ${what} failed — ${detail}`);
  return new AppError("unavailable", `The payment provider did not answer as expected, so ${what} did not go through. ${reassurance} Please try again in a minute.`);
}
