/**
 * A local stand-in for the payment provider, so checkout, webhooks and
 * refunds run end to end on one machine with the provider's real SDK
 * pointed at it (server/payments: STRIPE_API_HOST / _PORT / _PROTOCOL).
 * Plain node:http, state in memory (optionally mirrored to a JSON file).
 *
 * It answers the API calls the app makes, in the shapes the SDK reads:
 *   POST /v1/checkout/sessions            GET /v1/checkout/sessions/:id
 *   POST /v1/checkout/sessions/:id/expire GET /v1/payment_intents/:id
 *   POST /v1/refunds                      GET /v1/refunds/:id   GET /v1/events/:id
 * honours Idempotency-Key (same key and body → the first answer again; same
 * key, other body → 400), and serves a hosted page per session:
 *   GET /pay/:id  with "Pay" (POST /pay/:id/confirm) and "Cancel" (POST /pay/:id/cancel).
 * Paying sends `checkout.session.completed` to the app's webhook URL, signed
 * with the webhook secret exactly as the provider signs (the SDK's
 * generateTestHeaderString), then redirects to success_url; a refund sends
 * `charge.refunded`. Failed deliveries are retried a few times.
 * For people and tests: GET /_fake/health, GET /_fake/events,
 * POST /_fake/events/:id/resend (delivers the same event again, newly signed).
 *
 * Run on its own:
 *   FAKE_PAYMENTS_PORT=12111 FAKE_PAYMENTS_WEBHOOK_URL=http://127.0.0.1:3000/api/webhooks/payments \
 *   STRIPE_WEBHOOK_SECRET=whsec_local STRIPE_SECRET_KEY=sk_test_local node scripts/fakes/payments.mjs
 * Or in-process:
 *   const fake = await startPaymentsFake({ port: 0, webhookSecret, deliver }); … await fake.close();
 */
import { randomBytes } from "node:crypto";
import { existsSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { createServer } from "node:http";
import { resolve } from "node:path";
import { fileURLToPath } from "node:url";
import Stripe from "stripe";
import { money, parseForm, payPage } from "./payments-page.mjs";

const API_VERSION = Stripe.API_VERSION;
const RETRY_DELAYS_MS = [1_000, 5_000, 15_000];
const MAX_BODY = 256 * 1024;

const newId = (prefix) => `${prefix}_${randomBytes(12).toString("hex")}`;
const nowSeconds = () => Math.floor(Date.now() / 1000);

function apiError(status, type, message, extra = {}) {
  return { status, body: { error: { type, message, ...extra } } };
}

function integerParam(value, name) {
  if (value === undefined) return { missing: true };
  if (!/^\d+$/.test(String(value))) return { error: apiError(400, "invalid_request_error", `${name} must be a whole number of the currency's smallest unit`, { param: name, code: "parameter_invalid_integer" }) };
  return { value: Number(value) };
}

/**
 * @typedef {{
 *   sessions: Record<string, any>, paymentIntents: Record<string, any>, charges: Record<string, any>,
 *   refunds: Record<string, any>, events: Record<string, { event: any, deliveries: { at: string, status: number }[] }>,
 *   idempotency: Record<string, { fingerprint: string, status: number, body: any }>
 * }} FakeState
 */

/**
 * Starts the fake on `host` (127.0.0.1). `port: 0` picks a free port.
 * Webhooks go to `webhookUrl` over HTTP, or to `deliver(payload, headers)`
 * when given (tests call the route handler directly); either answers a status.
 * @param {{
 *   port?: number, host?: string, publicUrl?: string, webhookUrl?: string, webhookSecret: string, apiKey?: string, stateFile?: string,
 *   deliver?: (payload: string, headers: Record<string, string>) => Promise<{ status: number }>, log?: (line: string) => void
 * }} options
 * @returns {Promise<{ port: number, url: string, state: FakeState, idle: () => Promise<void>, close: () => Promise<void> }>}
 */
export async function startPaymentsFake({ port = 12111, host = "127.0.0.1", publicUrl, webhookUrl, deliver, webhookSecret, apiKey, stateFile, log = () => {} }) {
  if (!webhookSecret) throw new Error("fake payments: a webhook secret (STRIPE_WEBHOOK_SECRET) is required to sign events");
  /** @type {FakeState} */
  const state = { sessions: {}, paymentIntents: {}, charges: {}, refunds: {}, events: {}, idempotency: {} };
  if (stateFile && existsSync(stateFile)) Object.assign(state, JSON.parse(readFileSync(stateFile, "utf8")));
  const save = () => {
    if (!stateFile) return;
    writeFileSync(`${stateFile}.partial`, JSON.stringify(state));
    renameSync(`${stateFile}.partial`, stateFile);
  };
  const pending = new Set();
  let base = publicUrl;
  let closed = false;

  async function sendOnce(event) {
    const payload = JSON.stringify(event, null, 2);
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    const headers = { "content-type": "application/json; charset=utf-8", "stripe-signature": signature, "user-agent": "ironquill-fake-payments" };
    let status = 0;
    try {
      if (deliver) status = (await deliver(payload, headers)).status;
      else if (webhookUrl) status = (await fetch(webhookUrl, { method: "POST", headers, body: payload })).status;
      else status = -1;
    } catch (err) {
      log(`webhook ${event.type} ${event.id} not delivered: ${err.message}`);
    }
    state.events[event.id].deliveries.push({ at: new Date().toISOString(), status });
    save();
    return status >= 200 && status < 300;
  }

  /** Delivers now; on failure keeps trying in the background, as the provider does. */
  function dispatch(event) {
    const job = (async () => {
      if (await sendOnce(event)) return;
      for (const delay of RETRY_DELAYS_MS) {
        await new Promise((ok) => setTimeout(ok, delay).unref());
        if (closed) return;
        if (await sendOnce(event)) return;
      }
    })();
    pending.add(job);
    job.finally(() => pending.delete(job));
    return job;
  }

  function newEvent(type, object) {
    const event = {
      id: newId("evt"),
      object: "event",
      api_version: API_VERSION,
      created: nowSeconds(),
      data: { object },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    state.events[event.id] = { event, deliveries: [] };
    save();
    return event;
  }

  function createSession(p) {
    if (p.mode !== "payment") return apiError(400, "invalid_request_error", "Only mode=payment is supported here", { param: "mode" });
    for (const name of ["success_url", "cancel_url"]) {
      if (!p[name] || !/^https?:\/\//.test(p[name])) return apiError(400, "invalid_request_error", `${name} must be an absolute http(s) URL`, { param: name });
    }
    const items = Array.isArray(p.line_items) ? p.line_items : [];
    if (items.length !== 1) return apiError(400, "invalid_request_error", "Send exactly one line item", { param: "line_items" });
    const li = items[0];
    const data = li.price_data ?? {};
    const amount = integerParam(data.unit_amount, "line_items[0][price_data][unit_amount]");
    if (amount.error) return amount.error;
    if (amount.missing || amount.value <= 0) return apiError(400, "invalid_request_error", "unit_amount must be above zero", { param: "line_items[0][price_data][unit_amount]" });
    const quantity = integerParam(li.quantity ?? "1", "line_items[0][quantity]");
    if (quantity.error) return quantity.error;
    const currency = String(data.currency ?? "").toLowerCase();
    if (!/^[a-z]{3}$/.test(currency)) return apiError(400, "invalid_request_error", "currency must be a three-letter ISO 4217 code", { param: "line_items[0][price_data][currency]" });
    const name = data.product_data?.name;
    if (!name) return apiError(400, "invalid_request_error", "product_data.name is required", { param: "line_items[0][price_data][product_data][name]" });
    const id = newId("cs_test");
    const total = amount.value * quantity.value;
    const created = nowSeconds();
    const session = {
      id,
      object: "checkout.session",
      amount_subtotal: total,
      amount_total: total,
      cancel_url: p.cancel_url,
      client_reference_id: p.client_reference_id ?? null,
      created,
      currency,
      customer: null,
      customer_details: null,
      customer_email: p.customer_email ?? null,
      expires_at: created + 24 * 3600,
      livemode: false,
      metadata: p.metadata ?? {},
      mode: "payment",
      payment_intent: null,
      payment_status: "unpaid",
      status: "open",
      success_url: p.success_url,
      url: `${base}/pay/${id}`,
      // Kept for the hosted page; the provider answers line items on a separate endpoint.
      line_items: [{ name, unit_amount: amount.value, quantity: quantity.value }],
    };
    state.sessions[id] = session;
    save();
    return { status: 200, body: publicSession(session) };
  }

  function publicSession(s) {
    const { line_items: _items, ...rest } = s;
    return rest;
  }

  function completeSession(session) {
    const pi = newId("pi");
    const ch = newId("ch");
    state.charges[ch] = { id: ch, object: "charge", amount: session.amount_total, amount_refunded: 0, currency: session.currency, payment_intent: pi, paid: true, refunded: false, status: "succeeded", metadata: session.metadata, created: nowSeconds(), livemode: false };
    state.paymentIntents[pi] = { id: pi, object: "payment_intent", amount: session.amount_total, amount_received: session.amount_total, currency: session.currency, status: "succeeded", latest_charge: ch, metadata: session.metadata, created: nowSeconds(), livemode: false };
    Object.assign(session, {
      status: "complete",
      payment_status: "paid",
      payment_intent: pi,
      customer_details: { email: session.customer_email, name: null },
    });
    save();
    return newEvent("checkout.session.completed", publicSession(session));
  }

  function createRefund(p) {
    const pi = p.payment_intent ? state.paymentIntents[p.payment_intent] : null;
    const charge = pi ? state.charges[pi.latest_charge] : p.charge ? state.charges[p.charge] : null;
    if (!charge) return apiError(400, "invalid_request_error", "No such payment to refund", { param: p.payment_intent ? "payment_intent" : "charge", code: "resource_missing" });
    const left = charge.amount - charge.amount_refunded;
    if (left <= 0) return apiError(400, "invalid_request_error", "That payment has already been refunded in full", { code: "charge_already_refunded" });
    const amount = p.amount === undefined ? { value: left } : integerParam(p.amount, "amount");
    if (amount.error) return amount.error;
    if (amount.value <= 0 || amount.value > left) return apiError(400, "invalid_request_error", `amount must be between 1 and ${left}`, { param: "amount", code: "amount_too_large" });
    const refund = { id: newId("re"), object: "refund", amount: amount.value, charge: charge.id, currency: charge.currency, payment_intent: charge.payment_intent, reason: p.reason ?? null, metadata: p.metadata ?? {}, status: "succeeded", created: nowSeconds() };
    state.refunds[refund.id] = refund;
    charge.amount_refunded += amount.value;
    charge.refunded = charge.amount_refunded === charge.amount;
    save();
    dispatch(newEvent("charge.refunded", { ...charge }));
    return { status: 200, body: refund };
  }

  function found(collection, id, what) {
    const obj = state[collection][id];
    return obj ? { status: 200, body: collection === "sessions" ? publicSession(obj) : obj } : apiError(404, "invalid_request_error", `No such ${what}: '${id}'`, { code: "resource_missing" });
  }

  /** The /v1 API: authorised by the secret key, idempotent POSTs. */
  function api(method, path, params) {
    let m;
    if (method === "POST" && path === "/v1/checkout/sessions") return createSession(params);
    if (method === "GET" && (m = /^\/v1\/checkout\/sessions\/([\w]+)$/.exec(path))) return found("sessions", m[1], "checkout.session");
    if (method === "POST" && (m = /^\/v1\/checkout\/sessions\/([\w]+)\/expire$/.exec(path))) {
      const s = state.sessions[m[1]];
      if (!s) return found("sessions", m[1], "checkout.session");
      if (s.status !== "open") return apiError(400, "invalid_request_error", `Only an open session can be expired; this one is ${s.status}`);
      s.status = "expired";
      save();
      return { status: 200, body: publicSession(s) };
    }
    if (method === "GET" && (m = /^\/v1\/payment_intents\/([\w]+)$/.exec(path))) return found("paymentIntents", m[1], "payment_intent");
    if (method === "POST" && path === "/v1/refunds") return createRefund(params);
    if (method === "GET" && (m = /^\/v1\/refunds\/([\w]+)$/.exec(path))) return found("refunds", m[1], "refund");
    if (method === "GET" && (m = /^\/v1\/events\/([\w]+)$/.exec(path))) {
      const e = state.events[m[1]];
      return e ? { status: 200, body: e.event } : apiError(404, "invalid_request_error", `No such event: '${m[1]}'`, { code: "resource_missing" });
    }
    return apiError(404, "invalid_request_error", `This local stand-in does not answer ${method} ${path}`);
  }

  function authorised(req) {
    const header = req.headers.authorization ?? "";
    const key = /^Bearer (.+)$/.exec(header)?.[1] ?? "";
    return apiKey ? key === apiKey : /^sk_/.test(key);
  }

  async function readBody(req) {
    let size = 0;
    const chunks = [];
    for await (const c of req) {
      size += c.length;
      if (size > MAX_BODY) throw new Error("body too large");
      chunks.push(c);
    }
    return Buffer.concat(chunks).toString("utf8");
  }

  function send(res, status, body, headers = {}) {
    res.writeHead(status, { "content-type": "application/json", "request-id": newId("req"), ...headers });
    res.end(JSON.stringify(body));
  }

  function redirect(res, location) {
    res.writeHead(303, { location });
    res.end();
  }

  function html(res, status, page) {
    res.writeHead(status, { "content-type": "text/html; charset=utf-8", "cache-control": "no-store" });
    res.end(page);
  }

  async function handle(req, res) {
    const url = new URL(req.url ?? "/", "http://fake.local");
    const path = url.pathname;
    const method = req.method ?? "GET";
    const body = method === "POST" ? await readBody(req) : "";
    let m;

    if (path.startsWith("/v1/")) {
      if (!authorised(req)) return send(res, 401, { error: { type: "invalid_request_error", message: "The API key sent is not the one this stand-in was started with." } });
      const key = req.headers["idempotency-key"];
      const fingerprint = `${method} ${path} ${body}`;
      if (method === "POST" && typeof key === "string") {
        const seen = state.idempotency[key];
        if (seen) {
          if (seen.fingerprint !== fingerprint) {
            return send(res, 400, { error: { type: "idempotency_error", message: `Idempotency-Key ${key} was first used with other parameters; use a new key for a new request.` } });
          }
          return send(res, seen.status, seen.body, { "idempotent-replayed": "true" });
        }
      }
      const params = method === "POST" ? parseForm(body) : Object.fromEntries(url.searchParams);
      const answer = api(method, path, params);
      if (method === "POST" && typeof key === "string" && answer.status === 200) {
        state.idempotency[key] = { fingerprint, status: answer.status, body: answer.body };
        save();
      }
      return send(res, answer.status, answer.body);
    }

    if (method === "GET" && (m = /^\/pay\/([\w]+)$/.exec(path))) {
      const s = state.sessions[m[1]];
      return s ? html(res, 200, payPage(s)) : html(res, 404, "<!doctype html><title>Not found</title><p>No such checkout.</p>");
    }
    if (method === "POST" && (m = /^\/pay\/([\w]+)\/(confirm|cancel)$/.exec(path))) {
      const s = state.sessions[m[1]];
      if (!s) return html(res, 404, "<!doctype html><title>Not found</title><p>No such checkout.</p>");
      if (m[2] === "cancel") return redirect(res, s.cancel_url.replace("{CHECKOUT_SESSION_ID}", s.id));
      if (s.status === "open") {
        const event = completeSession(s);
        log(`paid ${s.id} (${money(s.amount_total, s.currency)}), sending ${event.type}`);
        // Waiting for the first delivery keeps local runs in step; retries carry on afterwards.
        await Promise.race([dispatch(event), new Promise((ok) => setTimeout(ok, 5_000).unref())]);
      } else if (s.status !== "complete") {
        return html(res, 409, payPage(s, "This checkout can no longer be paid."));
      }
      return redirect(res, s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id));
    }

    if (method === "GET" && path === "/_fake/health") return send(res, 200, { ok: true });
    if (method === "GET" && path === "/_fake/events") return send(res, 200, { data: Object.values(state.events).map((e) => ({ id: e.event.id, type: e.event.type, deliveries: e.deliveries })) });
    if (method === "POST" && (m = /^\/_fake\/events\/([\w]+)\/resend$/.exec(path))) {
      const e = state.events[m[1]];
      if (!e) return send(res, 404, { error: { type: "invalid_request_error", message: "No such event" } });
      const delivered = await sendOnce(e.event);
      return send(res, 200, { delivered, deliveries: e.deliveries });
    }
    return send(res, 404, { error: { type: "invalid_request_error", message: `Nothing here: ${method} ${path}` } });
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((err) => {
      log(`error: ${err.message}`);
      if (!res.headersSent) send(res, 500, { error: { type: "api_error", message: "The local stand-in failed; see its log." } });
      else res.end();
    });
  });
  await new Promise((ok, fail) => {
    server.once("error", fail);
    server.listen(port, host, () => {
      server.off("error", fail);
      ok();
    });
  });
  const actualPort = server.address().port;
  base ??= `http://${host}:${actualPort}`;
  return {
    port: actualPort,
    url: base,
    state,
    /** Resolves once every webhook in flight (including retries) has finished. */
    idle: () => Promise.all([...pending]).then(() => undefined),
    close: () =>
      new Promise((ok) => {
        closed = true;
        server.closeAllConnections?.();
        server.close(() => ok());
      }),
  };
}

// Run as a child of scripts/fakes.mjs (or by hand).
if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const port = Number(process.env.FAKE_PAYMENTS_PORT ?? process.env.STRIPE_API_PORT ?? 12111);
  const webhookUrl = process.env.FAKE_PAYMENTS_WEBHOOK_URL;
  const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!webhookSecret || !webhookUrl) {
    console.error("fake payments: set STRIPE_WEBHOOK_SECRET and FAKE_PAYMENTS_WEBHOOK_URL (the app's /api/webhooks/payments)");
    process.exit(2);
  }
  try {
    const fake = await startPaymentsFake({
      port,
      webhookUrl,
      webhookSecret,
      apiKey: process.env.STRIPE_SECRET_KEY || undefined,
      publicUrl: process.env.FAKE_PAYMENTS_PUBLIC_URL || undefined,
      stateFile: process.env.FAKE_PAYMENTS_STATE || undefined,
      log: (line) => console.log(`[payments] ${line}`),
    });
    console.log(`[payments] fake payment API on ${fake.url}, webhooks to ${webhookUrl}`);
    process.send?.({ ready: true, port: fake.port });
    const stop = () => fake.close().then(() => process.exit(0));
    process.on("SIGINT", stop);
    process.on("SIGTERM", stop);
    process.on("disconnect", stop);
  } catch (err) {
    console.error(`fake payments could not listen on 127.0.0.1:${port}: ${err.code ?? err.message}. Set FAKE_PAYMENTS_PORT (and STRIPE_API_PORT) to another port.`);
    process.exit(1);
  }
}
