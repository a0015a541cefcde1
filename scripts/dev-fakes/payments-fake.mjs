#!/usr/bin/env node
// DEVELOPMENT FAKE — never use in production. A tiny stand-in for the payment provider's API, just
// enough for the official `stripe` SDK (pointed here with host/port/protocol) to create customers and
// hosted checkouts, read and update subscriptions, plus a hosted-checkout page where a tester clicks
// "Pay" or "Fail", and correctly signed webhooks (t=…,v1=HMAC-SHA256(secret, `${t}.${payload}`)).
// State is in memory only. Test hooks under /_fake/… advance a subscription's period (paid or
// failed renewal) or end it at once.
//
//   node scripts/dev-fakes/payments-fake.mjs   (env: PAYMENTS_API_PORT, STRIPE_WEBHOOK_SECRET,
//                                               PAYMENTS_WEBHOOK_URL)
import crypto from "node:crypto";
import http from "node:http";
import { fileURLToPath } from "node:url";

const DAY = 86_400;
const PERIOD_DAYS = 30;

/** The provider's documented signature header for a payload at unix time `t`. */
export function signPayload(payload, secret, t) {
  const v1 = crypto.createHmac("sha256", secret).update(`${t}.${payload}`, "utf8").digest("hex");
  return `t=${t},v1=${v1}`;
}

/** Form-encoded bodies as the SDK sends them (`a[b][0][c]=x`) into nested objects and arrays. */
export function parseForm(body) {
  const out = {};
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const keys = rawKey.split(/\[|\]\[|\]/).filter((k) => k !== "");
    let node = out;
    keys.forEach((key, index) => {
      if (index === keys.length - 1) {
        node[key] = value;
        return;
      }
      node[key] ??= /^\d+$/.test(keys[index + 1]) ? [] : {};
      node = node[key];
    });
  }
  return out;
}

const newId = (prefix) => `${prefix}_test_${crypto.randomBytes(12).toString("hex")}`;
const now = () => Math.floor(Date.now() / 1000);
const escapeHtml = (s) => String(s).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function send(res, status, body, headers = {}) {
  const text = typeof body === "string" ? body : JSON.stringify(body);
  res.writeHead(status, { "content-type": typeof body === "string" ? "text/html; charset=utf-8" : "application/json", ...headers });
  res.end(text);
}

const notFound = (res, what) =>
  send(res, 404, { error: { type: "invalid_request_error", code: "resource_missing", message: `No such ${what}` } });

function readBody(req) {
  return new Promise((resolve, reject) => {
    const chunks = [];
    req.on("data", (c) => chunks.push(c));
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

/**
 * Starts the fake. `deliver: "post"` sends each webhook to `webhookUrl` at once; `"hold"` only queues
 * it in `outbox` (tests deliver them themselves, in any order, as often as they like).
 */
export async function startPaymentsFake({ port = 0, host = "127.0.0.1", webhookUrl = "", webhookSecret, deliver = "post", publicUrl } = {}) {
  if (!webhookSecret) throw new Error("the payments fake needs a webhook secret");
  const customers = new Map();
  const sessions = new Map();
  const subscriptions = new Map();
  const outbox = [];
  let base = publicUrl ?? "";

  async function emit(type, object) {
    const event = {
      id: newId("evt"),
      object: "event",
      api_version: "2026-10-28.endive",
      created: now(),
      livemode: false,
      type,
      data: { object },
    };
    const payload = JSON.stringify(event);
    const delivery = { event, payload, header: signPayload(payload, webhookSecret, now()) };
    outbox.push(delivery);
    if (deliver === "post" && webhookUrl) {
      try {
        await fetch(webhookUrl, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": delivery.header }, body: payload });
      } catch (error) {
        console.error(`[payments-fake] webhook ${type} not delivered: ${error instanceof Error ? error.message : error}`);
      }
    }
    return delivery;
  }

  function invoiceFor(sub, paid) {
    const item = sub.items.data[0];
    return {
      id: newId("in"),
      object: "invoice",
      customer: sub.customer,
      currency: item.price.currency,
      amount_due: item.price.unit_amount,
      amount_paid: paid ? item.price.unit_amount : 0,
      status: paid ? "paid" : "open",
      status_transitions: { paid_at: paid ? now() : null },
      parent: { type: "subscription_details", subscription_details: { subscription: sub.id, metadata: sub.metadata } },
    };
  }

  function newPeriod(sub, start) {
    const item = sub.items.data[0];
    item.current_period_start = start;
    item.current_period_end = start + PERIOD_DAYS * DAY;
  }

  async function pay(session) {
    const line = session.line_items_input[0];
    const start = now();
    const sub = {
      id: newId("sub"),
      object: "subscription",
      customer: session.customer,
      status: "active",
      cancel_at_period_end: false,
      canceled_at: null,
      ended_at: null,
      created: start,
      metadata: session.subscription_metadata,
      items: {
        object: "list",
        data: [
          {
            id: newId("si"),
            object: "subscription_item",
            quantity: 1,
            price: { id: newId("price"), object: "price", currency: line.currency, unit_amount: line.unit_amount, recurring: { interval: "month" }, product_data: { name: line.name } },
            current_period_start: start,
            current_period_end: start + PERIOD_DAYS * DAY,
          },
        ],
      },
    };
    subscriptions.set(sub.id, sub);
    Object.assign(session, { status: "complete", payment_status: "paid", subscription: sub.id });
    await emit("checkout.session.completed", publicSession(session));
    await emit("customer.subscription.created", sub);
    await emit("invoice.paid", invoiceFor(sub, true));
    return sub;
  }

  /** Test hook: the next period's charge succeeds or fails. */
  async function renew(sub, outcome) {
    if (outcome === "fail") {
      sub.status = "past_due";
      await emit("invoice.payment_failed", invoiceFor(sub, false));
    } else {
      sub.status = "active";
      newPeriod(sub, sub.items.data[0].current_period_end);
      await emit("invoice.paid", invoiceFor(sub, true));
    }
    await emit("customer.subscription.updated", sub);
  }

  async function end(sub) {
    Object.assign(sub, { status: "canceled", ended_at: now(), canceled_at: sub.canceled_at ?? now() });
    await emit("customer.subscription.deleted", sub);
  }

  function publicSession(session) {
    const { line_items_input: _lines, subscription_metadata: _meta, ...rest } = session;
    return rest;
  }

  function checkoutPage(session) {
    const line = session.line_items_input[0];
    const amount = new Intl.NumberFormat("en", { style: "currency", currency: line.currency.toUpperCase() }).format(
      line.unit_amount / 10 ** new Intl.NumberFormat("en", { style: "currency", currency: line.currency.toUpperCase() }).resolvedOptions().maximumFractionDigits,
    );
    const done = session.status !== "open";
    return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Test checkout</title>
<style>body{font-family:system-ui,sans-serif;max-width:28rem;margin:2rem auto;padding:0 1rem}.banner{background:#fde68a;padding:.75rem;border-radius:.5rem;font-weight:600}button{font-size:1.1rem;padding:.8rem 1.4rem;margin:.5rem .5rem 0 0;border-radius:.5rem;border:1px solid #333;cursor:pointer}</style></head>
<body><p class="banner" role="status">Test mode: development payments fake. No real money moves.</p>
<h1>${escapeHtml(line.name)}</h1><p>${escapeHtml(amount)} per month</p>
${done ? `<p>This checkout is ${escapeHtml(session.status)}.</p>` : `<form method="post" action="/checkout/${session.id}/pay"><button type="submit">Pay</button></form>
<form method="post" action="/checkout/${session.id}/fail"><button type="submit">Fail</button></form>`}
</body></html>`;
  }

  const withSessionId = (url, id) => url.replaceAll("{CHECKOUT_SESSION_ID}", id);

  async function handle(req, res) {
    const url = new URL(req.url ?? "/", "http://fake");
    const parts = url.pathname.split("/").filter(Boolean);
    const method = req.method ?? "GET";
    const body = method === "POST" ? parseForm(await readBody(req)) : {};

    if (method === "GET" && url.pathname === "/health") return send(res, 200, { ok: true });

    if (method === "POST" && url.pathname === "/v1/customers") {
      const customer = { id: newId("cus"), object: "customer", email: body.email ?? null, name: body.name ?? null, metadata: body.metadata ?? {} };
      customers.set(customer.id, customer);
      return send(res, 200, customer);
    }
    if (method === "POST" && url.pathname === "/v1/checkout/sessions") {
      const line = body.line_items?.[0];
      const price = line?.price_data;
      if (body.mode !== "subscription" || !price?.currency || !price.unit_amount || !price.product_data?.name || !body.success_url) {
        return send(res, 400, { error: { type: "invalid_request_error", message: "mode=subscription, line_items[0][price_data] and success_url are required" } });
      }
      if (body.customer && !customers.has(body.customer)) return notFound(res, `customer: '${body.customer}'`);
      const id = newId("cs");
      const session = {
        id,
        object: "checkout.session",
        mode: "subscription",
        status: "open",
        payment_status: "unpaid",
        customer: body.customer ?? null,
        client_reference_id: body.client_reference_id ?? null,
        metadata: body.metadata ?? {},
        success_url: body.success_url,
        cancel_url: body.cancel_url ?? null,
        subscription: null,
        amount_total: Number(price.unit_amount),
        currency: price.currency,
        url: `${base}/checkout/${id}`,
        line_items_input: [{ currency: price.currency, unit_amount: Number(price.unit_amount), name: price.product_data.name }],
        subscription_metadata: body.subscription_data?.metadata ?? {},
      };
      sessions.set(id, session);
      return send(res, 200, publicSession(session));
    }
    if (parts[0] === "v1" && parts[1] === "checkout" && parts[2] === "sessions" && parts[3] && method === "GET") {
      const session = sessions.get(parts[3]);
      return session ? send(res, 200, publicSession(session)) : notFound(res, `checkout.session: '${parts[3]}'`);
    }
    if (parts[0] === "v1" && parts[1] === "subscriptions" && parts[2]) {
      const sub = subscriptions.get(parts[2]);
      if (!sub) return notFound(res, `subscription: '${parts[2]}'`);
      if (method === "GET") return send(res, 200, sub);
      if (method === "DELETE") {
        if (sub.status !== "canceled") await end(sub);
        return send(res, 200, sub);
      }
      if (method === "POST") {
        if (body.cancel_at_period_end !== undefined) {
          sub.cancel_at_period_end = body.cancel_at_period_end === "true";
          sub.canceled_at = sub.cancel_at_period_end ? now() : null;
        }
        await emit("customer.subscription.updated", sub);
        return send(res, 200, sub);
      }
    }
    if (parts[0] === "checkout" && parts[1]) {
      const session = sessions.get(parts[1]);
      if (!session) return send(res, 404, "<p>No such checkout.</p>");
      if (method === "GET" && parts.length === 2) return send(res, 200, checkoutPage(session));
      if (method === "POST" && parts[2] === "pay") {
        if (session.status === "open") await pay(session);
        return send(res, 303, "", { location: withSessionId(session.success_url, session.id) });
      }
      if (method === "POST" && parts[2] === "fail") {
        // A declined card leaves the checkout open, as the provider does; the athlete may retry.
        return send(res, 303, "", { location: withSessionId(session.cancel_url ?? session.success_url, session.id) });
      }
    }
    // Test hooks (not part of the provider's API).
    if (parts[0] === "_fake" && parts[1] === "subscriptions" && parts[2] && method === "POST") {
      const sub = subscriptions.get(parts[2]);
      if (!sub) return notFound(res, "subscription");
      if (parts[3] === "renew") await renew(sub, url.searchParams.get("outcome") === "fail" ? "fail" : "pay");
      else if (parts[3] === "end") await end(sub);
      else return notFound(res, "hook");
      return send(res, 200, sub);
    }
    if (parts[0] === "_fake" && parts[1] === "events" && method === "GET") return send(res, 200, outbox.map((d) => d.event));
    return notFound(res, `route ${method} ${url.pathname}`);
  }

  const server = http.createServer((req, res) => {
    handle(req, res).catch((error) => {
      console.error("[payments-fake]", error);
      if (!res.headersSent) send(res, 500, { error: { type: "api_error", message: "fake crashed" } });
    });
  });
  await new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, resolve);
  });
  const address = server.address();
  const actualPort = typeof address === "object" && address ? address.port : port;
  base ||= `http://${host}:${actualPort}`;
  return {
    port: actualPort,
    url: base,
    outbox,
    subscriptions,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

// Run directly: `node scripts/dev-fakes/payments-fake.mjs`.
if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const fake = await startPaymentsFake({
    port: Number(process.env.PAYMENTS_API_PORT || 12111),
    webhookUrl: process.env.PAYMENTS_WEBHOOK_URL ?? "",
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET,
  });
  console.log(`[payments-fake] development fake listening on ${fake.url}`);
}
