// Per-driver preferences (the plan comes from the stored subscription, db/schema/billing.ts), reminder feed tokens, deliveries, and the
// local e-mail fake's outbox.
import { boolean, date, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";

const tz = (name: string) => timestamp(name, { withTimezone: true });

export const unitSystem = pgEnum("unit_system", ["metric", "imperial"]);
export const pressureUnit = pgEnum("pressure_unit", ["kpa", "psi", "bar"]);

export const driverProfile = pgTable("driver_profile", {
  userId: text("user_id")
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  units: unitSystem("units").notNull().default("metric"),
  pressureUnit: pressureUnit("pressure_unit").notNull().default("kpa"),
  timezone: text("timezone").notNull().default("UTC"),
  // A `Jurisdiction` of lib/tires (e.g. "EU", "US", "FI"): picks the depth limit.
  jurisdiction: text("jurisdiction").notNull().default("EU"),
  // Reminder settings, validated by lib/validation/reminders.ts.
  reminderSettings: jsonb("reminder_settings").notNull().default({}),
  emailReminders: boolean("email_reminders").notNull().default(false),
  createdAt: tz("created_at").notNull().defaultNow(),
  updatedAt: tz("updated_at").notNull().defaultNow(),
});

export const reminderFeed = pgTable(
  "reminder_feed",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    // SHA-256 of the secret token; the token itself is never stored.
    tokenHash: text("token_hash").notNull().unique(),
    createdAt: tz("created_at").notNull().defaultNow(),
    revokedAt: tz("revoked_at"),
    // Written at most once per FEED_FETCH_STAMP_MS, not on every calendar poll.
    lastFetchedAt: tz("last_fetched_at"),
    // A hash of what the feed last served and when that content changed:
    // the ETag and Last-Modified of the feed, written only when it changes.
    contentTag: text("content_tag"),
    contentChangedAt: tz("content_changed_at"),
  },
  (t) => [index("reminder_feed_user_idx").on(t.userId)],
);

/** One row per reminder sent: the unique key makes retries harmless. */
export const reminderDelivery = pgTable(
  "reminder_delivery",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    reminderId: text("reminder_id").notNull(),
    dueOn: date("due_on").notNull(),
    channel: text("channel").notNull().default("email"),
    // pending → sent, or cancelled when the reminder no longer applies.
    status: text("status").notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    providerMessageId: text("provider_message_id"),
    // A run claims a pending row by stamping it; a claim older than the
    // retry window is taken over by the next run (a crashed run loses nothing).
    claimedAt: tz("claimed_at"),
    claimId: text("claim_id"),
    lastError: text("last_error"),
    createdAt: tz("created_at").notNull().defaultNow(),
    sentAt: tz("sent_at"),
  },
  (t) => [
    uniqueIndex("reminder_delivery_uq").on(t.userId, t.reminderId, t.dueOn, t.channel),
    index("reminder_delivery_pending_idx").on(t.status, t.claimedAt),
  ],
);

/** Per-kind e-mail opt-outs, reachable from a link without signing in. */
export const emailOptOut = pgTable(
  "email_opt_out",
  {
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    kind: text("kind").notNull(),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [uniqueIndex("email_opt_out_uq").on(t.userId, t.kind)],
);

/** The local e-mail fake keeps every message here (never used with a real key). */
export const fakeOutbox = pgTable(
  "fake_outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    fromAddress: text("from_address").notNull(),
    toAddresses: jsonb("to_addresses").$type<string[]>().notNull(),
    subject: text("subject").notNull(),
    html: text("html"),
    text: text("text"),
    tags: jsonb("tags").$type<{ name: string; value: string }[]>(),
    headers: jsonb("headers").$type<Record<string, string>>(),
    // The Idempotency-Key the SDK sent: a retry with the same key is the same message.
    idempotencyKey: text("idempotency_key").unique(),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [index("fake_outbox_created_idx").on(t.createdAt)],
);

export type DriverProfile = typeof driverProfile.$inferSelect;
