// The Plus plan end to end below the browser: the app's calls go through the
// real stripe SDK over HTTP to the local fake (served by its own route
// handlers on a loopback server), the fake signs its webhooks with the SDK's
// helper, and the webhook route verifies them with constructEvent.
// Signature scheme: Stripe's documented `t=<unix>,v1=<hex HMAC-SHA256(secret, "t.body")>`,
// re-computed here with node:crypto as an independent check.
import { createHmac } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { billingEvent, billingSubscription, driverProfile, fakeOutbox, fakeStripeObject } from "@/db/schema";
import { searchAccounts } from "@/db/queries/admin";
import { currentSubscription, planOf, storeSubscription } from "@/db/queries/billing";
import { sessionFromRequest } from "@/lib/auth/session";
import { POST as webhookPOST } from "@/app/api/stripe/webhook/route";
import { PUT as settingsPUT } from "@/app/api/reminders/settings/route";
import { DELETE as accountDELETE } from "@/app/api/account/route";
import { fakeStripeKey, fakeWebhookSecret } from "@/lib/billing/config";
import { advanceToRenewal, payCheckoutSession, payInvoice, setFailNextRenewal, TEST_CARDS } from "@/lib/billing/fake/engine";
import { invoicesOf, plusPrices, setCancelAtPeriodEnd, startCheckout, switchInterval } from "@/lib/billing/service";
import { stripe } from "@/lib/billing/stripe";
import { resetEnvForTests } from "@/lib/env";
import { startFakeStripeServer, type FakeStripeServer } from "../../support/stripe-server";
import { request, signUp, type TestUser } from "../../support/users";

let server: FakeStripeServer;
beforeAll(async () => {
  server = await startFakeStripeServer();
});
afterAll(async () => {
  await server.close();
});

const card = (number: string) => ({ number, expiry: "12 / 34", cvc: "123" });

async function buyPlus(u: TestUser, interval: "month" | "year" = "month") {
  const { sessionId } = await startCheckout({ userId: u.id, interval });
  const paid = await payCheckoutSession(sessionId, card(TEST_CARDS.success));
  expect(paid.ok).toBe(true);
  return sessionId;
}

function sign(payload: string, secret = fakeWebhookSecret(), timestamp = Math.floor(Date.now() / 1000)) {
  return `t=${timestamp},v1=${createHmac("sha256", secret).update(`${timestamp}.${payload}`).digest("hex")}`;
}

const postWebhook = (body: string, signature?: string) =>
  webhookPOST(new Request(`${server.base}/api/stripe/webhook`, { method: "POST", headers: { "content-type": "application/json", ...(signature ? { "stripe-signature": signature } : {}) }, body }));

const mailsTo = async (email: string) => (await db.select().from(fakeOutbox)).filter((m) => m.toAddresses.includes(email.toLowerCase()));

describe("checkout through the SDK against the local fake", () => {
  it("finds the prices by lookup key and creates one session for a double click", async () => {
    const prices = await plusPrices();
    expect(prices.month).toMatchObject({ interval: "month", currency: "eur" });
    expect(prices.year.amount).toBeGreaterThan(prices.month.amount);

    const u = await signUp({ name: "Orla Fenwick" });
    // Two clicks at once: the second request meets the first's idempotency key (a 409 while it is in flight, which the SDK retries) and gets the same session.
    const [a, b] = await Promise.all([startCheckout({ userId: u.id, interval: "month" }), startCheckout({ userId: u.id, interval: "month" })]);
    expect(a.sessionId).toBe(b.sessionId);
    const sessions = await db.select().from(fakeStripeObject).where(eq(fakeStripeObject.objectType, "checkout.session"));
    expect(sessions.filter((s) => s.data.client_reference_id === u.id)).toHaveLength(1);
    const customers = await db.select().from(fakeStripeObject).where(eq(fakeStripeObject.objectType, "customer"));
    expect(customers.filter((c) => (c.data.metadata as Record<string, string>).fourpatch_user_id === u.id)).toHaveLength(1);

    // The fake's answer parses as the SDK's type.
    const session: Stripe.Checkout.Session = await stripe().checkout.sessions.retrieve(a.sessionId);
    expect(session).toMatchObject({ object: "checkout.session", mode: "subscription", status: "open", client_reference_id: u.id });
    expect(session.url).toBe(a.url);
    expect(session.success_url).toContain("{CHECKOUT_SESSION_ID}");
  });

  it("leaves a driver on Free with Stripe's message for the declined and insufficient-funds cards", async () => {
    const u = await signUp({ name: "Bram Kestle" });
    const { sessionId } = await startCheckout({ userId: u.id, interval: "month" });
    expect(await payCheckoutSession(sessionId, card(TEST_CARDS.declined))).toMatchObject({ ok: false, message: "Your card was declined." });
    expect(await payCheckoutSession(sessionId, card(TEST_CARDS.insufficientFunds))).toMatchObject({ ok: false, message: "Your card has insufficient funds." });
    expect(await payCheckoutSession(sessionId, card("4242 4242 4242 4241"))).toMatchObject({ ok: false, message: "Your card number is incorrect." });
    expect(await planOf({ userId: u.id })).toBe("free");
    expect((await stripe().checkout.sessions.retrieve(sessionId)).status).toBe("open");
  });

  it("puts a driver on Plus only when the signed webhooks arrive, and mails one receipt", async () => {
    const u = await signUp({ name: "Wynn Allard" });
    // The receipt's dates are in the driver's stored zone. One of UTC+14 and
    // UTC-11 always puts "now" on another calendar day than UTC (14 + 11 > 24),
    // so the check below fails if the e-mail were written in UTC.
    const east = new Date().getUTCHours() >= 10;
    const zone = east ? { name: "Pacific/Kiritimati", hours: 14 } : { name: "Pacific/Pago_Pago", hours: -11 };
    await db
      .insert(driverProfile)
      .values({ userId: u.id, timezone: zone.name })
      .onConflictDoUpdate({ target: driverProfile.userId, set: { timezone: zone.name } });
    server.mode = "hold";
    try {
      const { sessionId } = await startCheckout({ userId: u.id, interval: "year" });
      expect((await payCheckoutSession(sessionId, card(TEST_CARDS.success))).ok).toBe(true);
      // Paid, but nothing delivered yet: the success redirect alone gives nothing.
      expect(await planOf({ userId: u.id })).toBe("free");
      expect(server.held.map((h) => h.type)).toEqual(["customer.subscription.created", "invoice.paid", "checkout.session.completed"]);
      // The header verifies by an independent HMAC computation.
      const first = server.held[0]!;
      const t = /t=(\d+)/.exec(first.signature)![1]!;
      expect(first.signature).toContain(`v1=${createHmac("sha256", fakeWebhookSecret()).update(`${t}.${first.body}`).digest("hex")}`);
      for (const h of server.held) expect((await postWebhook(h.body, h.signature)).status).toBe(200);
    } finally {
      server.mode = "forward";
      server.held = [];
    }
    expect(await planOf({ userId: u.id })).toBe("plus");
    const sub = await currentSubscription({ userId: u.id });
    expect(sub).toMatchObject({ status: "active", interval: "year", cancelAtPeriodEnd: false, currency: "eur" });
    // A yearly period: one calendar year after the start (Stripe bills yearly prices on the anniversary).
    expect(sub!.currentPeriodEnd!.getTime() - Date.now()).toBeGreaterThan(364 * 86_400_000);
    const receipts = (await mailsTo(u.email)).filter((m) => m.subject.startsWith("Your Fourpatch Plus receipt"));
    expect(receipts).toHaveLength(1);
    // The period's end, shifted by the zone's fixed offset by hand (neither zone keeps summer time), as "2 Dec 2027".
    const end = new Date(sub!.currentPeriodEnd!.getTime() + zone.hours * 3_600_000);
    const endText = `${end.getUTCDate()} ${["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"][end.getUTCMonth()]} ${end.getUTCFullYear()}`;
    expect(receipts[0]!.text ?? receipts[0]!.html).toContain(endText);
    const invoices = await invoicesOf({ userId: u.id });
    expect(invoices).toHaveLength(1);
    expect(invoices[0]).toMatchObject({ status: "paid", currency: "eur" });
    // The operator's account list shows the same plan, from the same stored subscription.
    const ops = await signUp({ name: "Ops Tester", admin: true });
    const { rows: accounts } = await searchAccounts({ actor: await sessionFromRequest(request("/", { as: ops })) });
    expect(accounts.find((a) => a.id === u.id)?.plan).toBe("plus");
    expect(accounts.find((a) => a.id === ops.id)?.plan).toBe("free");
  });
});

describe("webhook signatures and replays", () => {
  const payload = (id = `evt_test_${Math.random().toString(36).slice(2)}`) =>
    JSON.stringify({ id, object: "event", type: "customer.subscription.updated", created: Math.floor(Date.now() / 1000), data: { object: { id: "sub_nope", object: "subscription" } } });

  it("answers 400 and records nothing for a missing, bad, wrong-secret or stale signature", async () => {
    const before = (await db.select().from(billingEvent)).length;
    const body = payload();
    const cases: [string, string | undefined][] = [
      ["missing", undefined],
      ["malformed", "nonsense"],
      ["bad HMAC", sign(body).replace(/v1=.{4}/, "v1=0000")],
      ["wrong secret", sign(body, "whsec_someone_else")],
      ["body changed after signing", sign(body)],
      ["stale (10 minutes old)", sign(body, fakeWebhookSecret(), Math.floor(Date.now() / 1000) - 600)],
    ];
    for (const [name, sig] of cases) {
      const res = await postWebhook(name === "body changed after signing" ? body.replace("sub_nope", "sub_else") : body, sig);
      expect(res.status, name).toBe(400);
      const json = (await res.json()) as { error: { fields?: Record<string, string[]> } };
      expect(json.error.fields, name).toHaveProperty("stripe-signature");
    }
    expect((await db.select().from(billingEvent)).length).toBe(before);

    // Correctly signed but about a subscription Stripe does not know: recorded, ignored, 200 (so Stripe stops retrying).
    const ok = await postWebhook(body, sign(body));
    expect(ok.status).toBe(200);
    expect(await ok.json()).toMatchObject({ outcome: "ignored" });
  });

  it("applies a replayed event once: same state, no second e-mail", async () => {
    const u = await signUp({ name: "Tamsin Roake" });
    server.mode = "hold";
    let held: typeof server.held;
    try {
      await buyPlus(u);
      held = server.held;
    } finally {
      server.mode = "forward";
      server.held = [];
    }
    const paid = held.find((h) => h.type === "invoice.paid")!;
    for (const h of held) expect((await postWebhook(h.body, h.signature)).status).toBe(200);
    const mails = (await mailsTo(u.email)).length;
    const rowBefore = await currentSubscription({ userId: u.id });
    // The same event again, freshly signed (as Stripe signs each retry).
    const replay = await postWebhook(paid.body, sign(paid.body));
    expect(await replay.json()).toMatchObject({ received: true, outcome: "duplicate" });
    expect((await mailsTo(u.email)).length).toBe(mails);
    expect(await currentSubscription({ userId: u.id })).toEqual(rowBefore);
    expect((await db.select().from(billingEvent).where(eq(billingEvent.stripeEventId, paid.id))).length).toBe(1);
  });
});

describe("the subscription's life", () => {
  it("ends in the right state when subscription.updated arrives before created", async () => {
    const u = await signUp({ name: "Ivo Penhale" });
    server.mode = "hold";
    let held: typeof server.held;
    try {
      await buyPlus(u);
      const subId = (JSON.parse(server.held[0]!.body) as { data: { object: { id: string } } }).data.object.id;
      // Nothing is stored yet (the events are held), so the change goes to Stripe directly.
      await stripe().subscriptions.update(subId, { cancel_at_period_end: true });
      held = [...server.held];
    } finally {
      server.mode = "forward";
      server.held = [];
    }
    expect(await currentSubscription({ userId: u.id })).toBeNull();
    const updated = held.find((h) => h.type === "customer.subscription.updated")!;
    const created = held.find((h) => h.type === "customer.subscription.created")!;
    expect((await postWebhook(updated.body, updated.signature)).status).toBe(200);
    expect((await postWebhook(created.body, created.signature)).status).toBe(200);
    expect(await currentSubscription({ userId: u.id })).toMatchObject({ status: "active", cancelAtPeriodEnd: true });

    // An older description of the subscription never overwrites a newer one.
    const row = (await currentSubscription({ userId: u.id }))!;
    const wrote = await storeSubscription({ sub: { ...row, cancelAtPeriodEnd: false, describedAt: new Date(row.describedAt.getTime() - 60_000) } });
    expect(wrote).toBe(false);
    expect((await currentSubscription({ userId: u.id }))!.cancelAtPeriodEnd).toBe(true);
  });

  it("keeps Plus through a failed renewal, mails about it, and recovers when the invoice is paid", async () => {
    const u = await signUp({ name: "Nell Ashgrove" });
    await buyPlus(u);
    const sub = (await currentSubscription({ userId: u.id }))!;
    await setFailNextRenewal(sub.stripeSubscriptionId, true);
    await advanceToRenewal(sub.stripeSubscriptionId);
    expect(await currentSubscription({ userId: u.id })).toMatchObject({ status: "past_due" });
    expect(await planOf({ userId: u.id })).toBe("plus");
    expect((await mailsTo(u.email)).some((m) => m.subject === "Your Fourpatch Plus payment did not go through")).toBe(true);
    const open = (await invoicesOf({ userId: u.id })).find((i) => i.status === "open")!;
    expect(open.url).toBeTruthy();
    const invoiceId = open.id;
    expect(await payInvoice(invoiceId, card(TEST_CARDS.declined))).toMatchObject({ ok: false, message: "Your card was declined." });
    expect((await payInvoice(invoiceId, card(TEST_CARDS.success))).ok).toBe(true);
    expect(await currentSubscription({ userId: u.id })).toMatchObject({ status: "active" });
    expect((await mailsTo(u.email)).filter((m) => m.subject.startsWith("Your Fourpatch Plus receipt"))).toHaveLength(2);
  });

  it("cancels at period end, resumes, and falls back to Free at the end without losing settings", async () => {
    const u = await signUp({ name: "Rook Halloran" });
    await buyPlus(u);
    await db.update(driverProfile).set({ emailReminders: true }).where(eq(driverProfile.userId, u.id));
    await setCancelAtPeriodEnd({ userId: u.id, cancel: true });
    expect(await currentSubscription({ userId: u.id })).toMatchObject({ cancelAtPeriodEnd: true, status: "active" });
    await setCancelAtPeriodEnd({ userId: u.id, cancel: false });
    expect(await currentSubscription({ userId: u.id })).toMatchObject({ cancelAtPeriodEnd: false });
    await setCancelAtPeriodEnd({ userId: u.id, cancel: true });
    const sub = (await currentSubscription({ userId: u.id }))!;
    expect(await planOf({ userId: u.id })).toBe("plus");
    // Without any event, the stored period end alone ends Plus.
    expect(await planOf({ userId: u.id, now: new Date(sub.currentPeriodEnd!.getTime() + 1000) })).toBe("free");
    await advanceToRenewal(sub.stripeSubscriptionId);
    expect(await currentSubscription({ userId: u.id })).toMatchObject({ status: "canceled" });
    expect(await planOf({ userId: u.id })).toBe("free");
    const [profile] = await db.select().from(driverProfile).where(eq(driverProfile.userId, u.id));
    expect(profile!.emailReminders).toBe(true);
  });

  it("switches monthly to yearly: a new yearly period starting now, billed less the unused month", async () => {
    const u = await signUp({ name: "Edda Marlowe" });
    await buyPlus(u, "month");
    await switchInterval({ userId: u.id, interval: "year" });
    const sub = (await currentSubscription({ userId: u.id }))!;
    expect(sub).toMatchObject({ interval: "year", status: "active" });
    const prices = await plusPrices();
    const invoices = await invoicesOf({ userId: u.id });
    expect(invoices).toHaveLength(2);
    // Bought seconds ago, so almost the whole month is credited.
    expect(invoices[0]!.amount).toBeGreaterThanOrEqual(prices.year.amount - prices.month.amount);
    expect(invoices[0]!.amount).toBeLessThan(prices.year.amount - prices.month.amount + 5);
  });
});

describe("deleting a paying account", () => {
  it("ends the subscription in Stripe before the account goes", async () => {
    const u = await signUp({ name: "Fen Wardle" });
    await buyPlus(u);
    const subId = (await currentSubscription({ userId: u.id }))!.stripeSubscriptionId;
    const res = await accountDELETE(request("/api/account", { method: "DELETE", as: u, body: { confirm: "DELETE", password: "correct-horse-battery" } }), { params: Promise.resolve({}) });
    expect(res.status).toBe(200);
    expect((await stripe().subscriptions.retrieve(subId)).status).toBe("canceled");
    expect(await db.select().from(billingSubscription).where(eq(billingSubscription.userId, u.id))).toHaveLength(0);
  });
});

describe("entitlements in the route handlers", () => {
  it("answers 402 with an upgrade link when a Free driver turns on a Plus feature, and keeps stored choices after a lapse", async () => {
    const u = await signUp({ name: "Carys Tolland" });
    const form = { jurisdiction: "EU", timezone: "UTC", kinds: ["age-watch", "age-replace", "depth-limit"], alarmLeadDays: [], emailLeadDays: "14", autumnSwap: "10-15", springSwap: "04-15", rotationIntervalKm: "10000", customDepthMm: "" };
    const res = await settingsPUT(request("/api/reminders/settings", { method: "PUT", as: u, body: { ...form, emailReminders: true } }), { params: Promise.resolve({}) });
    expect(res.status).toBe(402);
    const json = (await res.json()) as { error: { code: string; upgradeUrl?: string } };
    expect(json.error.code).toBe("payment_required");
    expect(json.error.upgradeUrl).toMatch(/\/account\/billing$/);
    const alarms = await settingsPUT(request("/api/reminders/settings", { method: "PUT", as: u, body: { ...form, alarmLeadDays: ["7"], emailReminders: false } }), { params: Promise.resolve({}) });
    expect(alarms.status).toBe(402);
    const ok = await settingsPUT(request("/api/reminders/settings", { method: "PUT", as: u, body: { ...form, emailReminders: false } }), { params: Promise.resolve({}) });
    expect(ok.status).toBe(200);

    await buyPlus(u);
    const on = await settingsPUT(request("/api/reminders/settings", { method: "PUT", as: u, body: { ...form, alarmLeadDays: ["7"], emailReminders: true } }), { params: Promise.resolve({}) });
    expect(on.status).toBe(200);
    expect(await on.json()).toMatchObject({ plan: "plus", emailActive: true });
    // Plus ends; saving the unchanged form is still allowed and keeps the choices for a return.
    await db.update(billingSubscription).set({ currentPeriodEnd: new Date(Date.now() - 1000) }).where(eq(billingSubscription.userId, u.id));
    const after = await settingsPUT(request("/api/reminders/settings", { method: "PUT", as: u, body: { ...form, alarmLeadDays: ["7"], emailReminders: true } }), { params: Promise.resolve({}) });
    expect(after.status).toBe(200);
    expect(await after.json()).toMatchObject({ plan: "free", emailReminders: true, emailActive: false });
  });
});

describe("the fake's own guards", () => {
  it("refuses a request without the app's fake key in Stripe's error shape", async () => {
    const url = new URL(server.base);
    const other = new Stripe("sk_test_someone_else", { host: url.hostname, port: Number(url.port), protocol: "http", maxNetworkRetries: 0 });
    await expect(other.prices.list({ limit: 1 })).rejects.toMatchObject({ type: "StripeAuthenticationError", statusCode: 401 });
    const right = new Stripe(fakeStripeKey(), { host: url.hostname, port: Number(url.port), protocol: "http", maxNetworkRetries: 0 });
    await expect(right.subscriptions.retrieve("sub_missing")).rejects.toMatchObject({ type: "StripeInvalidRequestError", statusCode: 404, code: "resource_missing" });
  });

  it("does not exist when a real Stripe key is configured", async () => {
    process.env.STRIPE_SECRET_KEY = "sk_test_real_looking";
    resetEnvForTests();
    try {
      const res = await fetch(`${server.base}/v1/prices`, { headers: { authorization: `Bearer ${fakeStripeKey()}` } });
      expect(res.status).toBe(404);
    } finally {
      delete process.env.STRIPE_SECRET_KEY;
      resetEnvForTests();
    }
    expect((await db.execute(sql`select 1`)).rows.length).toBe(1);
  });
});
