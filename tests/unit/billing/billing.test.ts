// The pure parts of billing: who is on Plus from a stored subscription, the
// decoding of the SDK's form bodies, and the fake's test-card outcomes.
// The SDK's own encoder (node_modules/stripe/cjs/utils.js), so the test decodes exactly what the SDK sends.
import { createRequire } from "node:module";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { planFromSubscription, planFromSubscriptions } from "@/lib/billing/entitlement";
import { chargeCard, TEST_CARDS } from "@/lib/billing/fake/engine";
import { FormError, parseStripeForm } from "@/lib/billing/fake/form";
import { formatMoney } from "@/lib/billing/config";

const { queryStringifyRequestData: stringifyRequestData } = createRequire(import.meta.url)(path.join(process.cwd(), "node_modules/stripe/cjs/utils.js")) as { queryStringifyRequestData: (d: unknown) => string };

const now = new Date("2026-12-02T12:00:00Z");
const later = new Date("2027-01-02T12:00:00Z");
const earlier = new Date("2026-12-01T12:00:00Z");

describe("planFromSubscription", () => {
  it.each([
    ["active", later, "plus"],
    ["trialing", later, "plus"],
    ["past_due", later, "plus"],
    ["active", earlier, "free"],
    ["canceled", later, "free"],
    ["unpaid", later, "free"],
    ["incomplete", later, "free"],
    ["incomplete_expired", later, "free"],
    ["paused", later, "free"],
  ] as const)("%s ending %s → %s", (status, end, plan) => {
    expect(planFromSubscription({ status, currentPeriodEnd: end }, now)).toBe(plan);
  });

  it("ends exactly at the period end and needs a period end at all", () => {
    expect(planFromSubscription({ status: "active", currentPeriodEnd: now }, now)).toBe("free");
    expect(planFromSubscription({ status: "active", currentPeriodEnd: new Date(now.getTime() + 1) }, now)).toBe("plus");
    expect(planFromSubscription({ status: "active", currentPeriodEnd: null }, now)).toBe("free");
    expect(planFromSubscription(null, now)).toBe("free");
  });

  it("is Plus when any of the driver's subscriptions gives it", () => {
    expect(planFromSubscriptions([{ status: "canceled", currentPeriodEnd: earlier }, { status: "active", currentPeriodEnd: later }], now)).toBe("plus");
    expect(planFromSubscriptions([], now)).toBe("free");
  });
});

describe("parseStripeForm", () => {
  it("reads back what the SDK's own encoder writes", () => {
    // The SDK encodes request bodies itself (qs's indexed format); decode one of its real bodies.
    const params = {
      mode: "subscription",
      line_items: [{ price: "price_1", quantity: 1 }],
      metadata: { fourpatch_user_id: "u_1" },
      subscription_data: { metadata: { a: "b" } },
      expand: ["latest_invoice", "customer"],
    };
    const body = stringifyRequestData(params);
    expect(body).toContain("line_items[0][price]=price_1");
    expect(parseStripeForm(body)).toEqual({ ...params, line_items: [{ price: "price_1", quantity: "1" }] });
  });

  it("refuses prototype keys, deep nesting and floods", () => {
    expect(() => parseStripeForm("__proto__[x]=1")).toThrow(FormError);
    expect(() => parseStripeForm("a[constructor]=1")).toThrow(FormError);
    expect(() => parseStripeForm(`a${"[b]".repeat(9)}=1`)).toThrow(/deeply/);
    expect(() => parseStripeForm(Array.from({ length: 201 }, (_, i) => `k${i}=1`).join("&"))).toThrow(/Too many/);
    expect(() => parseStripeForm("a=1&a[b]=2")).toThrow(FormError);
  });
});

describe("chargeCard (Stripe's documented test cards)", () => {
  const card = (number: string, expiry = "12/34", cvc = "123") => chargeCard({ number, expiry, cvc }, now);
  it("pays with 4242…, declines 0002, and reports insufficient funds for 9995", () => {
    expect(card(TEST_CARDS.success)).toEqual({ ok: true, last4: "4242" });
    expect(card("4242 4242 4242 4242")).toEqual({ ok: true, last4: "4242" });
    expect(card(TEST_CARDS.declined)).toMatchObject({ ok: false, code: "card_declined", declineCode: "generic_decline", message: "Your card was declined." });
    expect(card(TEST_CARDS.insufficientFunds)).toMatchObject({ ok: false, code: "card_declined", declineCode: "insufficient_funds", message: "Your card has insufficient funds." });
  });

  it("checks the number by Luhn (ISO/IEC 7812-1), the expiry and the CVC", () => {
    // 4242 4242 4242 4241 fails the Luhn check digit.
    expect(card("4242424242424241")).toMatchObject({ ok: false, field: "number" });
    expect(card(TEST_CARDS.success, "11/26")).toMatchObject({ ok: false, code: "expired_card" });
    expect(card(TEST_CARDS.success, "12/26")).toMatchObject({ ok: true });
    expect(card(TEST_CARDS.success, "13/30")).toMatchObject({ ok: false, field: "expiry" });
    expect(card(TEST_CARDS.success, "12/34", "1")).toMatchObject({ ok: false, field: "cvc" });
  });
});

describe("formatMoney", () => {
  it("formats minor units by the currency (Intl, CLDR data)", () => {
    expect(formatMoney(250, "eur", "en-GB")).toBe("€2.50");
    expect(formatMoney(2400, "eur", "de-DE")).toBe("24,00\u00a0€");
  });
});
