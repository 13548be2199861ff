import "server-only";
// Applying Stripe's webhook events. The event tells which subscription
// changed; its state is fetched again through the SDK, so events that arrive
// late, twice or out of order all end in Stripe's current state. The event id
// is recorded in the same transaction as the change: a replay changes nothing
// and sends no second e-mail.
import type Stripe from "stripe";
import { db } from "@/db";
import { recordEvent, rememberCustomer, storeSubscription, userOfCustomer } from "@/db/queries/billing";
import PlusPaymentFailedEmail from "@/emails/plus-payment-failed";
import PlusReceiptEmail from "@/emails/plus-receipt";
import { sendEmail } from "@/lib/email/send";
import { oneClickUnsubscribeUrl, unsubscribeUrl } from "@/lib/email/unsubscribe";
import { appUrl } from "@/lib/env";
import { and, eq } from "drizzle-orm";
import { driverProfile, emailOptOut, user } from "@/db/schema";
import { formatter, prefsFrom } from "@/lib/format";
import { formatMoney } from "./config";
import { refreshSubscription, toStoredSubscription } from "./service";

export const HANDLED_EVENTS = [
  "checkout.session.completed",
  "customer.subscription.created",
  "customer.subscription.updated",
  "customer.subscription.deleted",
  "invoice.paid",
  "invoice.payment_failed",
] as const;

export type WebhookOutcome = "applied" | "duplicate" | "ignored";

function subscriptionIdOf(event: Stripe.Event): string | null {
  const o = event.data.object as unknown as Record<string, unknown>;
  switch (event.type) {
    case "checkout.session.completed":
      return typeof o.subscription === "string" ? o.subscription : ((o.subscription as { id?: string } | null)?.id ?? null);
    case "customer.subscription.created":
    case "customer.subscription.updated":
    case "customer.subscription.deleted":
      return String(o.id);
    case "invoice.paid":
    case "invoice.payment_failed": {
      const s = (event.data.object as Stripe.Invoice).parent?.subscription_details?.subscription;
      return typeof s === "string" ? s : (s?.id ?? null);
    }
    default:
      return null;
  }
}

export async function applyEvent(event: Stripe.Event): Promise<WebhookOutcome> {
  if (!(HANDLED_EVENTS as readonly string[]).includes(event.type)) {
    // Recorded so the dashboard's retries stop; nothing else to do.
    await db.transaction(async (tx) => void (await recordEvent({ tx, id: event.id, type: event.type })));
    return "ignored";
  }
  const subscriptionId = subscriptionIdOf(event);
  // A completed checkout names the driver itself (client_reference_id): remember the customer before anything else.
  let referenceUser: string | null = null;
  if (event.type === "checkout.session.completed") {
    const s = event.data.object as Stripe.Checkout.Session;
    const customer = typeof s.customer === "string" ? s.customer : (s.customer?.id ?? null);
    referenceUser = s.client_reference_id ?? null;
    if (referenceUser && customer) {
      const [u] = await db.select({ id: user.id }).from(user).where(eq(user.id, referenceUser)).limit(1);
      if (u) await rememberCustomer({ userId: u.id, stripeCustomerId: customer });
      else referenceUser = null;
    }
  }
  // A subscription Stripe does not know (another account's event, a deleted test object) is recorded and ignored;
  // any other failure throws, so the route answers 503 and Stripe retries later.
  const fetched = subscriptionId
    ? await refreshSubscription({ subscriptionId, userId: referenceUser ?? undefined }).catch((err: { statusCode?: number; code?: string }) => {
        if (err?.statusCode === 404 && err.code === "resource_missing") return null;
        throw err;
      })
    : null;
  let ownerId: string | null = null;
  if (fetched?.owner) {
    // Only a driver whose customer we created may receive the subscription.
    const customerId = typeof fetched.sub.customer === "string" ? fetched.sub.customer : fetched.sub.customer.id;
    const mapped = await userOfCustomer({ stripeCustomerId: customerId });
    ownerId = mapped === fetched.owner ? mapped : null;
  }

  const recorded = await db.transaction(async (tx) => {
    if (!(await recordEvent({ tx, id: event.id, type: event.type }))) return false;
    if (fetched && ownerId) await storeSubscription({ tx, sub: toStoredSubscription(fetched.sub, { userId: ownerId, describedAt: fetched.describedAt }) });
    return true;
  });
  if (!recorded) return "duplicate";
  if (ownerId && (event.type === "invoice.paid" || event.type === "invoice.payment_failed")) {
    await mailAboutInvoice({ userId: ownerId, invoice: event.data.object as Stripe.Invoice, failed: event.type === "invoice.payment_failed" }).catch((err) =>
      console.error("billing e-mail failed:", err),
    );
  }
  return fetched && ownerId ? "applied" : "ignored";
}


async function mailAboutInvoice({ userId, invoice, failed }: { userId: string; invoice: Stripe.Invoice; failed: boolean }) {
  const [u] = await db
    .select({ name: user.name, email: user.email, timezone: driverProfile.timezone })
    .from(user)
    .leftJoin(driverProfile, eq(driverProfile.userId, user.id))
    .where(eq(user.id, userId))
    .limit(1);
  if (!u) return;
  // Dates in the driver's own stored zone: a webhook has no viewer.
  const { dateOf } = formatter(prefsFrom({ timeZone: u.timezone }));
  const day = (sec: number) => dateOf(sec * 1000);
  const billingUrl = `${appUrl()}/account/billing`;
  const key = `stripe-${invoice.id}-${failed ? "failed" : "paid"}-${failed ? invoice.attempt_count : "receipt"}`;
  if (failed) {
    await sendEmail({
      to: u.email,
      subject: "Your Fourpatch Plus payment did not go through",
      kind: "plus-payment-failed",
      react: PlusPaymentFailedEmail({ name: u.name, amount: formatMoney(invoice.amount_due, invoice.currency), billingUrl }),
      idempotencyKey: key,
    });
    return;
  }
  const [opted] = await db
    .select({ kind: emailOptOut.kind })
    .from(emailOptOut)
    .where(and(eq(emailOptOut.userId, userId), eq(emailOptOut.kind, "plus-receipt")))
    .limit(1);
  if (opted) return;
  const line = invoice.lines?.data?.[0];
  const period = line?.period ? `${day(line.period.start)} – ${day(line.period.end)}` : day(invoice.created);
  await sendEmail({
    to: u.email,
    subject: `Your Fourpatch Plus receipt ${invoice.number ?? ""}`.trim(),
    kind: "plus-receipt",
    react: PlusReceiptEmail({
      name: u.name,
      amount: formatMoney(invoice.amount_paid, invoice.currency),
      period,
      receiptNumber: invoice.receipt_number ?? invoice.number ?? invoice.id ?? "",
      accountUrl: billingUrl,
      unsubscribeUrl: unsubscribeUrl({ userId, kind: "plus-receipt" }),
    }),
    unsubscribeUrl: oneClickUnsubscribeUrl({ userId, kind: "plus-receipt" }),
    idempotencyKey: key,
  });
}
