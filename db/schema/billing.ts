// The Plus plan: what the app knows from Stripe (the customer of each
// driver, their subscription as the last webhook or fetch left it, the ids of
// the events already applied), and, in tables of its own, the state of the
// local fake of the Stripe API (never used with a real key).
import { boolean, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex } from "drizzle-orm/pg-core";
import { user } from "./auth";

const tz = (name: string) => timestamp(name, { withTimezone: true });

/** One Stripe customer per driver, created once and remembered. */
export const billingCustomer = pgTable("billing_customer", {
  userId: text("user_id")
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  stripeCustomerId: text("stripe_customer_id").notNull().unique(),
  createdAt: tz("created_at").notNull().defaultNow(),
});

/**
 * The driver's subscription as Stripe last described it. Entitlements are
 * derived from `status` and `currentPeriodEnd` (lib/billing/entitlement.ts).
 */
export const billingSubscription = pgTable(
  "billing_subscription",
  {
    stripeSubscriptionId: text("stripe_subscription_id").primaryKey(),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    stripeCustomerId: text("stripe_customer_id").notNull(),
    status: text("status").notNull(),
    priceId: text("price_id"),
    interval: text("interval"),
    amount: integer("amount"),
    currency: text("currency"),
    cancelAtPeriodEnd: boolean("cancel_at_period_end").notNull().default(false),
    currentPeriodEnd: tz("current_period_end"),
    endedAt: tz("ended_at"),
    // When Stripe said this (the event's `created`, or the fetch time): an older description never overwrites a newer one.
    describedAt: tz("described_at").notNull(),
    updatedAt: tz("updated_at").notNull().defaultNow(),
  },
  (t) => [index("billing_subscription_user_idx").on(t.userId)],
);

/** Each webhook event applied, written in the same transaction as its effect: a replay changes nothing. */
export const billingEvent = pgTable("billing_event", {
  stripeEventId: text("stripe_event_id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: tz("received_at").notNull().defaultNow(),
});

/** The local Stripe fake's objects (customers, prices, sessions, subscriptions, invoices, events) in Stripe's JSON shapes. */
export const fakeStripeObject = pgTable(
  "fake_stripe_object",
  {
    id: text("id").primaryKey(),
    objectType: text("object_type").notNull(),
    customerId: text("customer_id"),
    data: jsonb("data").$type<Record<string, unknown>>().notNull(),
    // The fake's own switches (e.g. "the next renewal fails"), kept out of Stripe's shapes.
    fakeFlags: jsonb("fake_flags").$type<Record<string, unknown>>().notNull().default({}),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [index("fake_stripe_object_type_idx").on(t.objectType, t.createdAt), index("fake_stripe_object_customer_idx").on(t.customerId)],
);

/** The fake's memory of Idempotency-Key headers: a repeated key gets the first answer. */
export const fakeStripeIdempotency = pgTable(
  "fake_stripe_idempotency",
  {
    key: text("key").notNull(),
    apiKey: text("api_key").notNull(),
    status: integer("status").notNull(),
    body: jsonb("body").notNull(),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [uniqueIndex("fake_stripe_idempotency_uq").on(t.apiKey, t.key)],
);
