import "server-only";
// What the app stores about Stripe: the customer of each driver, their
// subscriptions as Stripe last described them, and the webhook events
// already applied. The plan of a driver is derived from here, nowhere else.
import { desc, eq, lte, sql } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { billingCustomer, billingEvent, billingSubscription } from "@/db/schema";
import { planFromSubscription, planFromSubscriptions } from "@/lib/billing/entitlement";
import type { Plan } from "@/lib/plan";

type Exec = typeof db | Transaction;

export type SubscriptionRow = typeof billingSubscription.$inferSelect;

export async function customerOf({ userId }: { userId: string }): Promise<string | null> {
  const [row] = await db.select({ id: billingCustomer.stripeCustomerId }).from(billingCustomer).where(eq(billingCustomer.userId, userId)).limit(1);
  return row?.id ?? null;
}

/** Remembers the driver's customer; the first one stored wins and is returned. */
export async function rememberCustomer({ userId, stripeCustomerId, tx = db }: { userId: string; stripeCustomerId: string; tx?: Exec }): Promise<string> {
  await tx.insert(billingCustomer).values({ userId, stripeCustomerId }).onConflictDoNothing();
  const [row] = await tx.select({ id: billingCustomer.stripeCustomerId }).from(billingCustomer).where(eq(billingCustomer.userId, userId)).limit(1);
  return row!.id;
}

export async function userOfCustomer({ stripeCustomerId, tx = db }: { stripeCustomerId: string; tx?: Exec }): Promise<string | null> {
  const [row] = await tx.select({ userId: billingCustomer.userId }).from(billingCustomer).where(eq(billingCustomer.stripeCustomerId, stripeCustomerId)).limit(1);
  return row?.userId ?? null;
}

/** Records an event id; false when it was recorded before (a replay). Call inside the transaction of the event's effect. */
export async function recordEvent({ tx, id, type }: { tx: Exec; id: string; type: string }): Promise<boolean> {
  const rows = await tx.insert(billingEvent).values({ stripeEventId: id, type }).onConflictDoNothing().returning({ id: billingEvent.stripeEventId });
  return rows.length === 1;
}

export async function eventSeen({ id }: { id: string }): Promise<boolean> {
  const [row] = await db.select({ id: billingEvent.stripeEventId }).from(billingEvent).where(eq(billingEvent.stripeEventId, id)).limit(1);
  return !!row;
}

export type SubscriptionInput = Omit<SubscriptionRow, "updatedAt">;

/**
 * Stores Stripe's description of a subscription unless a newer description
 * is already stored: events that arrive late or out of order cannot move the
 * subscription back. Returns whether it was written.
 */
export async function storeSubscription({ tx = db, sub }: { tx?: Exec; sub: SubscriptionInput }): Promise<boolean> {
  const { stripeSubscriptionId, ...rest } = sub;
  const rows = await tx
    .insert(billingSubscription)
    .values({ ...sub, updatedAt: new Date() })
    .onConflictDoUpdate({
      target: billingSubscription.stripeSubscriptionId,
      set: { ...rest, updatedAt: new Date() },
      setWhere: lte(billingSubscription.describedAt, sub.describedAt),
    })
    .returning({ id: billingSubscription.stripeSubscriptionId });
  void stripeSubscriptionId;
  return rows.length === 1;
}

export async function subscriptionsOf({ userId, tx = db }: { userId: string; tx?: Exec }): Promise<SubscriptionRow[]> {
  return tx.select().from(billingSubscription).where(eq(billingSubscription.userId, userId)).orderBy(desc(billingSubscription.describedAt));
}

/** The subscription the billing page is about: the one giving Plus, else the most recent. */
export async function currentSubscription({ userId, now = new Date() }: { userId: string; now?: Date }): Promise<SubscriptionRow | null> {
  const subs = await subscriptionsOf({ userId });
  return subs.find((s) => planFromSubscription(s, now) === "plus") ?? subs[0] ?? null;
}

export async function planOf({ userId, now = new Date(), tx = db }: { userId: string; now?: Date; tx?: Exec }): Promise<Plan> {
  const subs = await tx
    .select({ status: billingSubscription.status, currentPeriodEnd: billingSubscription.currentPeriodEnd })
    .from(billingSubscription)
    .where(eq(billingSubscription.userId, userId));
  return planFromSubscriptions(subs, now);
}

/** SQL twin of lib/billing/entitlement.ts for lists (operator area, the reminder run's driver list). */
export function plusSql(userIdColumn: unknown) {
  return sql<boolean>`exists (select 1 from ${billingSubscription} where ${billingSubscription.userId} = ${userIdColumn} and ${billingSubscription.status} in ('active', 'trialing', 'past_due') and ${billingSubscription.currentPeriodEnd} > now())`;
}

