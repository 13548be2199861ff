import "server-only";
// The Plus plan's calls to Stripe, all through the SDK (lib/billing/stripe.ts):
// customer, prices by lookup key, checkout, cancel/resume, switching the
// interval, invoices. Identical with a real key and with the local fake.
import { createHash } from "node:crypto";
import type Stripe from "stripe";
import { currentSubscription, customerOf, planOf, rememberCustomer, storeSubscription, subscriptionsOf, userOfCustomer, type SubscriptionInput } from "@/db/queries/billing";
import { db } from "@/db";
import { user } from "@/db/schema";
import { eq } from "drizzle-orm";
import { AppError, notFound } from "@/lib/errors";
import { appUrl } from "@/lib/env";
import { intervalOfLookupKey, PRICE_LOOKUP_KEYS, type BillingInterval } from "./config";
import { stripe } from "./stripe";

/** Turns an SDK failure into a message the driver may see (never a 500 with details). */
export function stripeFailure(err: unknown): AppError {
  const e = err as { type?: string; message?: string; statusCode?: number };
  if (e && typeof e.type === "string" && e.type.startsWith("Stripe")) {
    console.error("stripe:", e.type, e.message);
    if (e.type === "StripeCardError") return new AppError("invalid", e.message ?? "The card was declined.");
    if (e.type === "StripeIdempotencyError") return new AppError("conflict", "That request is already on its way. Please wait a moment and try again.");
    return new AppError("conflict", "The payment service could not do that just now. Nothing was changed; please try again.");
  }
  return err instanceof AppError ? err : new AppError("internal", String(err));
}

async function viaStripe<T>(fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    throw stripeFailure(err);
  }
}

/** The driver's Stripe customer, created once (an idempotency key makes a double request create one) and remembered. */
export async function ensureCustomer({ userId }: { userId: string }): Promise<string> {
  const known = await customerOf({ userId });
  if (known) return known;
  const [u] = await db.select({ email: user.email, name: user.name }).from(user).where(eq(user.id, userId)).limit(1);
  if (!u) throw notFound("Your account");
  const customer = await viaStripe(() =>
    stripe().customers.create({ email: u.email, name: u.name, metadata: { fourpatch_user_id: userId } }, { idempotencyKey: `fourpatch-customer-${userId}` }),
  );
  return rememberCustomer({ userId, stripeCustomerId: customer.id });
}

export type PlusPrice = { id: string; interval: BillingInterval; amount: number; currency: string };

export async function plusPrices(): Promise<Record<BillingInterval, PlusPrice>> {
  const list = await viaStripe(() => stripe().prices.list({ lookup_keys: Object.values(PRICE_LOOKUP_KEYS), active: true, limit: 10 }));
  const out: Partial<Record<BillingInterval, PlusPrice>> = {};
  for (const p of list.data) {
    const interval = intervalOfLookupKey(p.lookup_key);
    if (interval && p.unit_amount != null) out[interval] = { id: p.id, interval, amount: p.unit_amount, currency: p.currency };
  }
  if (!out.month || !out.year) {
    throw new AppError("conflict", `The Plus prices are not set up: create prices with the lookup keys ${Object.values(PRICE_LOOKUP_KEYS).join(" and ")}.`);
  }
  return out as Record<BillingInterval, PlusPrice>;
}

/**
 * Starts a checkout and returns the hosted page's address. The idempotency key
 * covers the driver, the interval and a ten-minute window, so a double click
 * (or a retry) gets the same session instead of a second one.
 */
export async function startCheckout({ userId, interval, now = new Date() }: { userId: string; interval: BillingInterval; now?: Date }): Promise<{ url: string; sessionId: string }> {
  if ((await planOf({ userId, now })) === "plus") throw new AppError("conflict", "You are already on Plus. Change or cancel it on the billing page.");
  const customer = await ensureCustomer({ userId });
  const price = (await plusPrices())[interval];
  const window = Math.floor(now.getTime() / (10 * 60_000));
  const idempotencyKey = `fourpatch-checkout-${createHash("sha256").update(`${userId}|${interval}|${price.id}|${window}`).digest("hex").slice(0, 32)}`;
  const session = await viaStripe(() =>
    stripe().checkout.sessions.create(
      {
        mode: "subscription",
        customer,
        client_reference_id: userId,
        line_items: [{ price: price.id, quantity: 1 }],
        success_url: `${appUrl()}/account/billing?checkout=done&session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${appUrl()}/account/billing?checkout=cancelled`,
        metadata: { fourpatch_user_id: userId },
        subscription_data: { metadata: { fourpatch_user_id: userId } },
      },
      { idempotencyKey },
    ),
  );
  if (!session.url) throw new AppError("conflict", "The payment service gave no checkout page. Please try again.");
  return { url: session.url, sessionId: session.id };
}

/** Stripe's subscription → the row the app keeps. */
export function toStoredSubscription(sub: Stripe.Subscription, { userId, describedAt }: { userId: string; describedAt: Date }): SubscriptionInput {
  const item = sub.items.data[0];
  const price = item?.price;
  const end = item?.current_period_end;
  return {
    stripeSubscriptionId: sub.id,
    userId,
    stripeCustomerId: typeof sub.customer === "string" ? sub.customer : sub.customer.id,
    status: sub.status,
    priceId: price?.id ?? null,
    interval: price?.recurring?.interval ?? null,
    amount: price?.unit_amount ?? null,
    currency: price?.currency ?? null,
    cancelAtPeriodEnd: sub.cancel_at_period_end,
    currentPeriodEnd: end ? new Date(end * 1000) : null,
    endedAt: sub.ended_at ? new Date(sub.ended_at * 1000) : null,
    describedAt,
  };
}

/** Fetches a subscription from Stripe and stores it (used by webhooks and after the driver's own changes). */
export async function refreshSubscription({ subscriptionId, userId }: { subscriptionId: string; userId?: string }) {
  const describedAt = new Date();
  const sub = await stripe().subscriptions.retrieve(subscriptionId);
  const customerId = typeof sub.customer === "string" ? sub.customer : sub.customer.id;
  const owner = userId ?? (await userOfCustomer({ stripeCustomerId: customerId })) ?? (sub.metadata?.fourpatch_user_id || null);
  return { sub, owner, describedAt };
}

async function ownSubscription(userId: string) {
  const current = await currentSubscription({ userId });
  if (!current || current.status === "canceled") throw new AppError("not_found", "You have no Plus subscription to change.");
  return current;
}

async function storeAnswer(userId: string, sub: Stripe.Subscription, describedAt: Date) {
  await storeSubscription({ sub: toStoredSubscription(sub, { userId, describedAt }) });
}

export async function setCancelAtPeriodEnd({ userId, cancel }: { userId: string; cancel: boolean }) {
  const current = await ownSubscription(userId);
  const describedAt = new Date();
  const sub = await viaStripe(() => stripe().subscriptions.update(current.stripeSubscriptionId, { cancel_at_period_end: cancel }));
  await storeAnswer(userId, sub, describedAt);
}

export async function switchInterval({ userId, interval }: { userId: string; interval: BillingInterval }) {
  const current = await ownSubscription(userId);
  if (current.interval === interval) return;
  const describedAt = new Date();
  const price = (await plusPrices())[interval];
  const sub = await viaStripe(async () => {
    const live = await stripe().subscriptions.retrieve(current.stripeSubscriptionId);
    const item = live.items.data[0];
    if (!item) throw new AppError("conflict", "This subscription has no item to change.");
    return stripe().subscriptions.update(live.id, { items: [{ id: item.id, price: price.id }], proration_behavior: "always_invoice" });
  });
  await storeAnswer(userId, sub, describedAt);
}

export type InvoiceLine = { id: string; number: string | null; status: string | null; amount: number; currency: string; created: Date; periodStart: Date | null; periodEnd: Date | null; url: string | null };

export async function invoicesOf({ userId }: { userId: string }): Promise<InvoiceLine[]> {
  const customer = await customerOf({ userId });
  if (!customer) return [];
  const list = await viaStripe(() => stripe().invoices.list({ customer, limit: 24 }));
  return list.data.map((i) => {
    const line = i.lines?.data?.[0];
    return {
      id: i.id ?? "",
      number: i.number,
      status: i.status,
      amount: i.status === "paid" ? i.amount_paid : i.amount_due,
      currency: i.currency,
      created: new Date(i.created * 1000),
      periodStart: line?.period ? new Date(line.period.start * 1000) : null,
      periodEnd: line?.period ? new Date(line.period.end * 1000) : null,
      url: i.hosted_invoice_url ?? null,
    };
  });
}

/** Before an account is deleted: end its subscriptions at once, so Stripe stops charging a card nobody can manage. */
export async function endSubscriptionsOf({ userId }: { userId: string }) {
  for (const s of await subscriptionsOf({ userId })) {
    if (s.status === "canceled" || s.status === "incomplete_expired") continue;
    await viaStripe(() => stripe().subscriptions.cancel(s.stripeSubscriptionId));
  }
}
