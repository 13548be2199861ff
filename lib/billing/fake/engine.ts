import "server-only";
// The local fake of the Stripe API: just the part Fourpatch calls, in
// Stripe's JSON shapes (API version of the installed SDK), with its state in
// the app's database. Events are stored with the change that caused them and
// delivered after the commit as webhooks signed the way Stripe signs them.
//
// The fake's clock is the real one; "advance to renewal" on the developer
// page makes a subscription's period end now.
import { randomBytes } from "node:crypto";
import Stripe from "stripe";
import { db, type Transaction } from "@/db";
import { getFakeObject, listFakeObjects, putFakeObject, type FakeObject } from "@/db/queries/fake-stripe";
import { appUrl } from "@/lib/env";
import { billingCurrency, FAKE_PRICE_AMOUNTS, fakeWebhookSecret, PLUS_PRODUCT_NAME, PRICE_LOOKUP_KEYS, webhookSecret, type BillingInterval } from "../config";

type Obj = Record<string, unknown> & { id: string; object: string };
type Exec = typeof db | Transaction;

/** An answer in Stripe's error shape. */
export class FakeStripeError extends Error {
  constructor(
    readonly status: number,
    readonly body: { type: string; code?: string; decline_code?: string; message: string; param?: string },
  ) {
    super(body.message);
  }
}

const missing = (what: string, id: string, param?: string) =>
  new FakeStripeError(404, { type: "invalid_request_error", code: "resource_missing", message: `No such ${what}: '${id}'`, ...(param ? { param } : {}) });
const invalid = (param: string, message: string) => new FakeStripeError(400, { type: "invalid_request_error", code: "parameter_invalid", message, param });

export const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString("base64url").replace(/[-_]/g, "x")}`;
const nowSec = () => Math.floor(Date.now() / 1000);

function addInterval(start: number, interval: BillingInterval): number {
  const d = new Date(start * 1000);
  if (interval === "year") d.setUTCFullYear(d.getUTCFullYear() + 1);
  else d.setUTCMonth(d.getUTCMonth() + 1);
  return Math.floor(d.getTime() / 1000);
}

// ---------------------------------------------------------------- catalog

/** The fake's product and two prices, created on first use in the configured currency. */
export async function ensureCatalog(tx: Exec = db): Promise<Record<BillingInterval, Obj>> {
  const out = {} as Record<BillingInterval, Obj>;
  const currency = billingCurrency();
  const productId = "prod_fourpatch_plus";
  if (!(await getFakeObject({ id: productId, tx }))) {
    await putFakeObject({ tx, object: { id: productId, object: "product", active: true, name: PLUS_PRODUCT_NAME, created: nowSec(), livemode: false, metadata: {} } });
  }
  for (const interval of ["month", "year"] as const) {
    const id = `price_fourpatch_plus_${interval}ly_${currency}`;
    let row = await getFakeObject({ id, tx });
    if (!row) {
      const price: Obj = {
        id,
        object: "price",
        active: true,
        billing_scheme: "per_unit",
        created: nowSec(),
        currency,
        livemode: false,
        lookup_key: PRICE_LOOKUP_KEYS[interval],
        metadata: {},
        nickname: interval === "month" ? "Plus monthly" : "Plus yearly",
        product: productId,
        recurring: { interval, interval_count: 1, meter: null, usage_type: "licensed" },
        tax_behavior: "unspecified",
        type: "recurring",
        unit_amount: FAKE_PRICE_AMOUNTS[interval],
        unit_amount_decimal: String(FAKE_PRICE_AMOUNTS[interval]),
      };
      await putFakeObject({ tx, object: price });
      row = await getFakeObject({ id, tx });
    }
    out[interval] = row!.data as Obj;
  }
  return out;
}

async function priceById(id: string, tx: Exec = db): Promise<Obj> {
  await ensureCatalog(tx);
  const row = await getFakeObject({ id, type: "price", tx });
  if (!row) throw missing("price", id, "price");
  return row.data as Obj;
}

const intervalOf = (price: Obj) => (price.recurring as { interval: BillingInterval }).interval;

// ---------------------------------------------------------------- customers

export async function createCustomer(params: Record<string, unknown>): Promise<Obj> {
  const customer: Obj = {
    id: newId("cus"),
    object: "customer",
    created: nowSec(),
    email: str(params.email) ?? null,
    name: str(params.name) ?? null,
    metadata: obj(params.metadata),
    livemode: false,
    invoice_settings: { default_payment_method: null, custom_fields: null, footer: null, rendering_options: null },
    balance: 0,
    currency: null,
    delinquent: false,
    description: null,
  };
  await putFakeObject({ object: customer });
  return customer;
}

export async function getObject(type: string, id: string, what = type): Promise<Obj> {
  const row = await getFakeObject({ id, type });
  if (!row) throw missing(what, id);
  return row.data as Obj;
}

// ---------------------------------------------------------------- checkout

export async function createCheckoutSession(params: Record<string, unknown>): Promise<Obj> {
  if (params.mode !== "subscription") throw invalid("mode", "This fake only supports `mode: subscription`.");
  const customerId = str(params.customer);
  if (!customerId) throw invalid("customer", "Missing required param: customer.");
  if (!(await getFakeObject({ id: customerId, type: "customer" }))) throw missing("customer", customerId, "customer");
  const items = Array.isArray(params.line_items) ? (params.line_items as Record<string, unknown>[]) : [];
  if (items.length !== 1 || !str(items[0]?.price)) throw invalid("line_items", "Exactly one line item with a price is supported.");
  const price = await priceById(str(items[0]!.price)!);
  const quantity = Number(items[0]!.quantity ?? 1);
  if (quantity !== 1) throw invalid("line_items[0][quantity]", "Quantity must be 1.");
  const successUrl = str(params.success_url);
  if (!successUrl || !/^https?:\/\//.test(successUrl)) throw invalid("success_url", "Not a valid URL");
  const cancelUrl = str(params.cancel_url);
  const id = newId("cs_test");
  const created = nowSec();
  const session: Obj = {
    id,
    object: "checkout.session",
    mode: "subscription",
    status: "open",
    payment_status: "unpaid",
    customer: customerId,
    client_reference_id: str(params.client_reference_id) ?? null,
    success_url: successUrl,
    cancel_url: cancelUrl ?? null,
    url: `${appUrl()}/dev/stripe/checkout/${id}`,
    subscription: null,
    invoice: null,
    currency: price.currency,
    amount_subtotal: price.unit_amount,
    amount_total: price.unit_amount,
    metadata: obj(params.metadata),
    created,
    expires_at: created + 24 * 3600,
    livemode: false,
  };
  await putFakeObject({
    object: session,
    fakeFlags: { priceId: price.id, subscriptionMetadata: obj(obj(params.subscription_data).metadata) },
  });
  return session;
}

// ---------------------------------------------------------------- cards

export const TEST_CARDS = {
  success: "4242424242424242",
  declined: "4000000000000002",
  insufficientFunds: "4000000000009995",
} as const;

function luhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return sum % 10 === 0;
}

export type CardInput = { number: string; expiry: string; cvc: string };
export type CardResult = { ok: true; last4: string } | { ok: false; code: string; declineCode?: string; message: string; field?: "number" | "expiry" | "cvc" };

/** Stripe's test-card outcomes and messages for the three cards the hosted page documents. */
export function chargeCard(card: CardInput, now = new Date()): CardResult {
  const number = card.number.replace(/[\s-]/g, "");
  if (!/^\d{12,19}$/.test(number) || !luhn(number)) return { ok: false, code: "incorrect_number", message: "Your card number is incorrect.", field: "number" };
  const m = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(card.expiry);
  if (!m) return { ok: false, code: "invalid_expiry_month", message: "Your card's expiration date is incomplete.", field: "expiry" };
  const month = Number(m[1]);
  const year = m[2]!.length === 2 ? 2000 + Number(m[2]) : Number(m[2]);
  if (month < 1 || month > 12) return { ok: false, code: "invalid_expiry_month", message: "Your card's expiration month is invalid.", field: "expiry" };
  if (year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1)) {
    return { ok: false, code: "expired_card", message: "Your card has expired.", field: "expiry" };
  }
  if (!/^\d{3,4}$/.test(card.cvc.trim())) return { ok: false, code: "incorrect_cvc", message: "Your card's security code is incomplete.", field: "cvc" };
  if (number === TEST_CARDS.declined) return { ok: false, code: "card_declined", declineCode: "generic_decline", message: "Your card was declined." };
  if (number === TEST_CARDS.insufficientFunds) return { ok: false, code: "card_declined", declineCode: "insufficient_funds", message: "Your card has insufficient funds." };
  return { ok: true, last4: number.slice(-4) };
}

// ---------------------------------------------------------------- events

async function addEvent(tx: Exec, type: string, object: Obj, previous?: Record<string, unknown>): Promise<Obj> {
  const event: Obj = {
    id: newId("evt"),
    object: "event",
    api_version: Stripe.API_VERSION,
    created: nowSec(),
    data: { object, ...(previous ? { previous_attributes: previous } : {}) },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
  };
  await putFakeObject({ tx, object: event, fakeFlags: { delivery: "pending" } });
  return event;
}

export function fakeWebhookUrl(): string {
  return process.env.STRIPE_FAKE_WEBHOOK_URL || `${appUrl()}/api/stripe/webhook`;
}

/**
 * Sends events to the app's webhook route, one at a time and in order, signed
 * with the SDK's own helper (`t=<timestamp>,v1=<HMAC-SHA256 of "t.body">`),
 * exactly what `constructEvent` verifies. Called after the commit that stored them.
 */
export async function deliverEvents(events: Obj[]): Promise<void> {
  for (const event of events) {
    const payload = JSON.stringify(event, null, 2);
    const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret() ?? fakeWebhookSecret() });
    let outcome: string;
    try {
      const res = await fetch(fakeWebhookUrl(), {
        method: "POST",
        headers: { "content-type": "application/json; charset=utf-8", "stripe-signature": header },
        body: payload,
        signal: AbortSignal.timeout(20_000),
      });
      outcome = String(res.status);
    } catch (err) {
      outcome = `error: ${err instanceof Error ? err.message : String(err)}`;
    }
    await putFakeObject({ object: event, fakeFlags: { delivery: outcome } });
  }
}

/** Sends an already stored event again (developer page). */
export async function redeliverEvent(id: string) {
  const row = await getFakeObject({ id, type: "event" });
  if (!row) throw missing("event", id);
  await deliverEvents([row.data as Obj]);
}

// ---------------------------------------------------------------- invoices

async function addInvoice(
  tx: Exec,
  { sub, price, paid, reason, amount, periodStart, periodEnd, cardLast4 }: { sub: Obj; price: Obj; paid: boolean; reason: string; amount: number; periodStart: number; periodEnd: number; cardLast4?: string },
): Promise<Obj> {
  const count = (await listFakeObjects({ type: "invoice", limit: 500, tx })).length;
  const id = newId("in");
  const created = nowSec();
  const invoice: Obj = {
    id,
    object: "invoice",
    customer: sub.customer,
    status: paid ? "paid" : "open",
    amount_due: amount,
    amount_paid: paid ? amount : 0,
    amount_remaining: paid ? 0 : amount,
    attempt_count: 1,
    attempted: true,
    billing_reason: reason,
    collection_method: "charge_automatically",
    created,
    currency: price.currency,
    description: null,
    hosted_invoice_url: `${appUrl()}/dev/stripe/invoice/${id}`,
    livemode: false,
    metadata: {},
    number: `FP-FAKE-${String(count + 1).padStart(4, "0")}`,
    parent: { type: "subscription_details", quote_details: null, subscription_details: { subscription: sub.id, metadata: sub.metadata ?? {} } },
    period_start: periodStart,
    period_end: periodEnd,
    receipt_number: paid ? `RCPT-${String(count + 1).padStart(4, "0")}` : null,
    status_transitions: { finalized_at: created, paid_at: paid ? created : null, marked_uncollectible_at: null, voided_at: null },
    subtotal: amount,
    total: amount,
    lines: {
      object: "list",
      data: [
        {
          id: newId("il"),
          object: "line_item",
          amount,
          currency: price.currency,
          description: `1 × ${PLUS_PRODUCT_NAME} (at ${price.unit_amount} / ${intervalOf(price)})`,
          period: { start: periodStart, end: periodEnd },
          pricing: { type: "price_details", price_details: { price: price.id, product: price.product }, unit_amount_decimal: String(price.unit_amount) },
          quantity: 1,
        },
      ],
      has_more: false,
      url: `/v1/invoices/${id}/lines`,
    },
  };
  await putFakeObject({ tx, object: invoice, fakeFlags: cardLast4 ? { cardLast4 } : {} });
  return invoice;
}

// ---------------------------------------------------------------- subscriptions

function subscriptionObject({ id, customer, price, start, end, metadata }: { id: string; customer: string; price: Obj; start: number; end: number; metadata: Record<string, unknown> }): Obj {
  return {
    id,
    object: "subscription",
    customer,
    status: "active",
    cancel_at: null,
    cancel_at_period_end: false,
    canceled_at: null,
    ended_at: null,
    created: start,
    start_date: start,
    billing_cycle_anchor: start,
    collection_method: "charge_automatically",
    currency: price.currency,
    default_payment_method: null,
    latest_invoice: null,
    livemode: false,
    metadata,
    items: {
      object: "list",
      data: [{ id: newId("si"), object: "subscription_item", created: start, current_period_start: start, current_period_end: end, metadata: {}, price, quantity: 1, subscription: id }],
      has_more: false,
      total_count: 1,
      url: `/v1/subscription_items?subscription=${id}`,
    },
  };
}

type Item = { id: string; price: Obj; current_period_start: number; current_period_end: number };
const itemOf = (sub: Obj) => ((sub.items as { data: Item[] }).data[0]!);

function withItem(sub: Obj, patch: Partial<Item>): Obj {
  const items = sub.items as { data: Item[] };
  return { ...sub, items: { ...items, data: [{ ...items.data[0]!, ...patch }] } };
}

export type CheckoutOutcome = { ok: true; successUrl: string } | { ok: false; message: string; field?: string };

/** The hosted page's "Pay": charges the card; on success creates the subscription and its paid invoice and sends the events. */
export async function payCheckoutSession(sessionId: string, card: CardInput): Promise<CheckoutOutcome> {
  const charge = chargeCard(card);
  if (!charge.ok) return { ok: false, message: charge.message, field: charge.field };
  const events: Obj[] = [];
  const result = await db.transaction(async (tx) => {
    const row = await getFakeObject({ id: sessionId, type: "checkout.session", tx });
    if (!row) throw missing("checkout.session", sessionId);
    const session = row.data as Obj;
    if (session.status !== "open") return { ok: false as const, message: "This checkout is no longer open." };
    const price = await priceById(String(row.fakeFlags.priceId), tx);
    const start = nowSec();
    const end = addInterval(start, intervalOf(price));
    const customerId = String(session.customer);
    let sub = subscriptionObject({ id: newId("sub"), customer: customerId, price, start, end, metadata: obj(row.fakeFlags.subscriptionMetadata) });
    const invoice = await addInvoice(tx, { sub, price, paid: true, reason: "subscription_create", amount: Number(price.unit_amount), periodStart: start, periodEnd: end, cardLast4: charge.last4 });
    sub = { ...sub, latest_invoice: invoice.id };
    await putFakeObject({ tx, object: sub, fakeFlags: {} });
    const customer = await getFakeObject({ id: customerId, type: "customer", tx });
    if (customer) await putFakeObject({ tx, object: customer.data as Obj, fakeFlags: { ...customer.fakeFlags, cardLast4: charge.last4 } });
    const done: Obj = { ...session, status: "complete", payment_status: "paid", subscription: sub.id, invoice: invoice.id };
    await putFakeObject({ tx, object: done });
    events.push(await addEvent(tx, "customer.subscription.created", sub));
    events.push(await addEvent(tx, "invoice.paid", invoice));
    events.push(await addEvent(tx, "checkout.session.completed", done));
    return { ok: true as const, successUrl: String(session.success_url).replace("{CHECKOUT_SESSION_ID}", session.id) };
  });
  await deliverEvents(events);
  return result;
}

export async function updateSubscription(id: string, params: Record<string, unknown>): Promise<Obj> {
  const events: Obj[] = [];
  const updated = await db.transaction(async (tx) => {
    const row = await getFakeObject({ id, type: "subscription", tx });
    if (!row) throw missing("subscription", id);
    let sub = row.data as Obj;
    if (sub.status === "canceled") throw new FakeStripeError(400, { type: "invalid_request_error", message: "A canceled subscription can only update its cancellation_details and metadata." });
    const previous: Record<string, unknown> = {};
    let charged = false;
    if (params.cancel_at_period_end !== undefined) {
      const v = params.cancel_at_period_end === "true";
      if (params.cancel_at_period_end !== "true" && params.cancel_at_period_end !== "false") throw invalid("cancel_at_period_end", "Invalid boolean");
      if (v !== sub.cancel_at_period_end) {
        previous.cancel_at_period_end = sub.cancel_at_period_end;
        sub = { ...sub, cancel_at_period_end: v, cancel_at: v ? itemOf(sub).current_period_end : null, canceled_at: v ? nowSec() : null };
      }
    }
    if (params.metadata !== undefined) sub = { ...sub, metadata: { ...obj(sub.metadata), ...obj(params.metadata) } };
    const items = Array.isArray(params.items) ? (params.items as Record<string, unknown>[]) : [];
    if (items.length > 0) {
      const it = items[0]!;
      if (str(it.id) !== itemOf(sub).id) throw missing("subscription_item", String(it.id ?? ""), "items[0][id]");
      const price = await priceById(String(it.price ?? ""), tx);
      const old = itemOf(sub);
      if (price.id !== old.price.id) {
        previous.items = sub.items;
        if (intervalOf(price) === intervalOf(old.price)) {
          sub = withItem(sub, { price });
        } else {
          // Like Stripe: a change of interval starts a new period now and bills it at once,
          // less the unused part of the old period when prorations are asked for.
          const start = nowSec();
          const end = addInterval(start, intervalOf(price));
          const unused = Math.max(0, old.current_period_end - start) / Math.max(1, old.current_period_end - old.current_period_start);
          const credit = params.proration_behavior === "none" ? 0 : Math.round(Number(old.price.unit_amount) * unused);
          const amount = Math.max(0, Number(price.unit_amount) - credit);
          const customer = await getFakeObject({ id: String(sub.customer), type: "customer", tx });
          const failing = row.fakeFlags.failNextRenewal === true;
          const invoice = await addInvoice(tx, { sub, price, paid: !failing, reason: "subscription_update", amount, periodStart: start, periodEnd: end, cardLast4: customer?.fakeFlags.cardLast4 as string | undefined });
          sub = withItem({ ...sub, latest_invoice: invoice.id, billing_cycle_anchor: start, status: failing ? "past_due" : "active" }, { price, current_period_start: start, current_period_end: end });
          events.push(await addEvent(tx, failing ? "invoice.payment_failed" : "invoice.paid", invoice));
          charged = true;
        }
      }
    }
    await putFakeObject({ tx, object: sub, fakeFlags: charged ? { ...row.fakeFlags, failNextRenewal: false } : row.fakeFlags });
    if (Object.keys(previous).length > 0 || events.length > 0) events.unshift(await addEvent(tx, "customer.subscription.updated", sub, previous));
    return sub;
  });
  await deliverEvents(events);
  return updated;
}

export async function cancelSubscription(id: string): Promise<Obj> {
  const events: Obj[] = [];
  const sub = await db.transaction(async (tx) => {
    const row = await getFakeObject({ id, type: "subscription", tx });
    if (!row) throw missing("subscription", id);
    const current = row.data as Obj;
    if (current.status === "canceled") return current;
    const now = nowSec();
    const ended = withItem({ ...current, status: "canceled", canceled_at: now, ended_at: now, cancel_at_period_end: false }, { current_period_end: Math.min(itemOf(current).current_period_end, now) });
    await putFakeObject({ tx, object: ended });
    events.push(await addEvent(tx, "customer.subscription.deleted", ended));
    return ended;
  });
  await deliverEvents(events);
  return sub;
}

/**
 * Developer page: the current period ends now. A subscription set to cancel
 * ends; any other renews, charging the customer's card, which fails when
 * "make the next renewal fail" was chosen.
 */
export async function advanceToRenewal(id: string): Promise<Obj> {
  const events: Obj[] = [];
  const sub = await db.transaction(async (tx) => {
    const row = await getFakeObject({ id, type: "subscription", tx });
    if (!row) throw missing("subscription", id);
    const current = row.data as Obj;
    if (current.status === "canceled") throw new FakeStripeError(400, { type: "invalid_request_error", message: "This subscription has ended." });
    const now = nowSec();
    if (current.cancel_at_period_end) {
      const ended = withItem({ ...current, status: "canceled", ended_at: now }, { current_period_end: now });
      await putFakeObject({ tx, object: ended });
      events.push(await addEvent(tx, "customer.subscription.deleted", ended));
      return ended;
    }
    const item = itemOf(current);
    const price = item.price;
    const end = addInterval(now, intervalOf(price));
    const failing = row.fakeFlags.failNextRenewal === true;
    const customer = await getFakeObject({ id: String(current.customer), type: "customer", tx });
    const invoice = await addInvoice(tx, { sub: current, price, paid: !failing, reason: "subscription_cycle", amount: Number(price.unit_amount), periodStart: now, periodEnd: end, cardLast4: customer?.fakeFlags.cardLast4 as string | undefined });
    const renewed = withItem({ ...current, status: failing ? "past_due" : "active", latest_invoice: invoice.id }, { current_period_start: now, current_period_end: end });
    await putFakeObject({ tx, object: renewed, fakeFlags: { ...row.fakeFlags, failNextRenewal: false } });
    events.push(await addEvent(tx, "customer.subscription.updated", renewed, { status: current.status, items: current.items }));
    events.push(await addEvent(tx, failing ? "invoice.payment_failed" : "invoice.paid", invoice));
    return renewed;
  });
  await deliverEvents(events);
  return sub;
}

export async function setFailNextRenewal(id: string, fail: boolean) {
  const row = await getFakeObject({ id, type: "subscription" });
  if (!row) throw missing("subscription", id);
  await putFakeObject({ object: row.data as Obj, fakeFlags: { ...row.fakeFlags, failNextRenewal: fail } });
}

/** The hosted invoice page's "Pay": settles an open invoice with a new card; the subscription becomes active again. */
export async function payInvoice(invoiceId: string, card: CardInput): Promise<{ ok: true } | { ok: false; message: string; field?: string }> {
  const charge = chargeCard(card);
  if (!charge.ok) return { ok: false, message: charge.message, field: charge.field };
  const events: Obj[] = [];
  const result = await db.transaction(async (tx) => {
    const row = await getFakeObject({ id: invoiceId, type: "invoice", tx });
    if (!row) throw missing("invoice", invoiceId);
    const invoice = row.data as Obj;
    if (invoice.status !== "open") return { ok: false as const, message: "This invoice is already settled." };
    const now = nowSec();
    const paid: Obj = {
      ...invoice,
      status: "paid",
      amount_paid: invoice.amount_due,
      amount_remaining: 0,
      attempt_count: Number(invoice.attempt_count ?? 1) + 1,
      receipt_number: `RCPT-${String(invoice.number).slice(-4)}`,
      status_transitions: { ...obj(invoice.status_transitions), paid_at: now },
    };
    await putFakeObject({ tx, object: paid, fakeFlags: { cardLast4: charge.last4 } });
    const customer = await getFakeObject({ id: String(invoice.customer), type: "customer", tx });
    if (customer) await putFakeObject({ tx, object: customer.data as Obj, fakeFlags: { ...customer.fakeFlags, cardLast4: charge.last4 } });
    const subId = String(obj(obj(invoice.parent).subscription_details).subscription ?? "");
    const subRow = subId ? await getFakeObject({ id: subId, type: "subscription", tx }) : null;
    if (subRow && (subRow.data as Obj).status === "past_due") {
      const sub = { ...(subRow.data as Obj), status: "active" };
      await putFakeObject({ tx, object: sub });
      events.push(await addEvent(tx, "customer.subscription.updated", sub, { status: "past_due" }));
    }
    events.push(await addEvent(tx, "invoice.paid", paid));
    return { ok: true as const };
  });
  await deliverEvents(events);
  return result;
}

export async function listInvoices(params: Record<string, unknown>): Promise<Record<string, unknown>> {
  const customer = str(params.customer);
  const limit = Math.min(Math.max(Number(params.limit ?? 10) || 10, 1), 100);
  const status = str(params.status);
  const subscription = str(params.subscription);
  const rows: FakeObject[] = await listFakeObjects({ type: "invoice", customerId: customer, limit: 500 });
  const data = rows
    .map((r) => r.data as Obj)
    .filter((i) => !status || i.status === status)
    .filter((i) => !subscription || obj(obj(i.parent).subscription_details).subscription === subscription);
  return { object: "list", data: data.slice(0, limit), has_more: data.length > limit, url: "/v1/invoices" };
}

export async function listPrices(params: Record<string, unknown>): Promise<Record<string, unknown>> {
  const catalog = await ensureCatalog();
  const keys = Array.isArray(params.lookup_keys) ? (params.lookup_keys as unknown[]).map(String) : null;
  const data = Object.values(catalog).filter((p) => !keys || keys.includes(String(p.lookup_key)));
  return { object: "list", data, has_more: false, url: "/v1/prices" };
}

function str(v: unknown): string | undefined {
  return typeof v === "string" && v !== "" ? v : undefined;
}
function obj(v: unknown): Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v) ? (v as Record<string, unknown>) : {};
}

/**
 * The demo's paid subscription, written straight into the fake's tables (the
 * seed runs with no server to call): a customer with a test card, an active
 * subscription and its paid first invoice, as a checkout would leave them.
 * The caller stores the app's side from the returned subscription.
 */
export async function seedPaidSubscription({ email, name, userId, interval, startedDaysAgo }: { email: string; name: string; userId: string; interval: BillingInterval; startedDaysAgo: number }) {
  return db.transaction(async (tx) => {
    const catalog = await ensureCatalog(tx);
    const price = catalog[interval];
    const customer: Obj = {
      id: newId("cus"),
      object: "customer",
      created: nowSec() - startedDaysAgo * 86_400,
      email,
      name,
      metadata: { fourpatch_user_id: userId },
      livemode: false,
      invoice_settings: { default_payment_method: null, custom_fields: null, footer: null, rendering_options: null },
      balance: 0,
      currency: null,
      delinquent: false,
      description: null,
    };
    await putFakeObject({ tx, object: customer, fakeFlags: { cardLast4: "4242" } });
    const start = nowSec() - startedDaysAgo * 86_400;
    const end = addInterval(start, interval);
    let sub = subscriptionObject({ id: newId("sub"), customer: customer.id, price, start, end, metadata: { fourpatch_user_id: userId } });
    const invoice = await addInvoice(tx, { sub, price, paid: true, reason: "subscription_create", amount: Number(price.unit_amount), periodStart: start, periodEnd: end, cardLast4: "4242" });
    sub = { ...sub, latest_invoice: invoice.id };
    await putFakeObject({ tx, object: sub });
    return { customerId: customer.id, subscription: sub as unknown as Stripe.Subscription };
  });
}
