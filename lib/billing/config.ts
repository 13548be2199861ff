// The Plus plan's prices and the Stripe settings. Prices are found by their
// lookup keys, so the same code runs against the local fake (which creates
// them) and a real account (where the operator creates them once, see README).
import { devFakeKey } from "@/lib/dev-fakes";
import { env, usingFakeStripe } from "@/lib/env";

export type BillingInterval = "month" | "year";

export const PLUS_PRODUCT_NAME = "Fourpatch Plus";

/** Lookup keys of the two Plus prices. */
export const PRICE_LOOKUP_KEYS: Record<BillingInterval, string> = {
  month: "fourpatch_plus_monthly",
  year: "fourpatch_plus_yearly",
};

/** Invented amounts in minor units, used when the fake creates the prices. */
export const FAKE_PRICE_AMOUNTS: Record<BillingInterval, number> = { month: 250, year: 2400 };

/** The API key the app uses against its own fake: made fresh in each process, the fake refuses every other. */
export function fakeStripeKey(): string {
  return devFakeKey("stripe");
}

/** The webhook secret of the fake's deliveries when STRIPE_WEBHOOK_SECRET is unset: fresh in each process too. */
export function fakeWebhookSecret(): string {
  return `whsec_${devFakeKey("stripe-webhook")}`;
}

export function billingCurrency(): string {
  return (process.env.BILLING_CURRENCY || "eur").trim().toLowerCase();
}

/**
 * The secret webhook signatures are checked with. A real deployment must set
 * STRIPE_WEBHOOK_SECRET; without it (and without the local fake) nothing
 * verifies, so no event is ever accepted.
 */
export function webhookSecret(): string | null {
  const configured = env().STRIPE_WEBHOOK_SECRET;
  if (configured) return configured;
  return usingFakeStripe() ? fakeWebhookSecret() : null;
}

export function intervalOfLookupKey(key: string | null | undefined): BillingInterval | null {
  if (key === PRICE_LOOKUP_KEYS.month) return "month";
  if (key === PRICE_LOOKUP_KEYS.year) return "year";
  return null;
}

/** "€2.50" in the viewer's locale. */
export function formatMoney(amount: number, currency: string, locale = "en-GB"): string {
  return new Intl.NumberFormat(locale, { style: "currency", currency: currency.toUpperCase() }).format(amount / 100);
}
