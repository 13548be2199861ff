// What a driver shares and hands on: co-keepers of a vehicle (a household
// member who reads and writes its logbook), the hand-on of a vehicle to its
// next owner, and the frozen copy a seller may keep.
import { sql } from "drizzle-orm";
import { boolean, index, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { vehicle } from "./logbook";

const tz = (name: string) => timestamp(name, { withTimezone: true });

export const keeperState = pgEnum("keeper_state", ["invited", "active", "ended"]);

export const vehicleKeeper = pgTable(
  "vehicle_keeper",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    // Lower-cased address the invitation went to; only that account can accept.
    email: text("email").notNull(),
    // Set on acceptance.
    userId: text("user_id").references(() => user.id, { onDelete: "cascade" }),
    invitedByUserId: text("invited_by_user_id").references(() => user.id, { onDelete: "set null" }),
    // SHA-256 of the invitation link's secret.
    tokenHash: text("token_hash").notNull().unique(),
    state: keeperState("state").notNull().default("invited"),
    expiresAt: tz("expires_at").notNull(),
    acceptedAt: tz("accepted_at"),
    endedAt: tz("ended_at"),
    endedByUserId: text("ended_by_user_id").references(() => user.id, { onDelete: "set null" }),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [
    index("vehicle_keeper_vehicle_idx").on(t.vehicleId),
    index("vehicle_keeper_user_idx").on(t.userId, t.state),
    // Account deletion sets these to null: indexed so it does not scan the table.
    index("vehicle_keeper_invited_by_idx").on(t.invitedByUserId),
    index("vehicle_keeper_ended_by_idx").on(t.endedByUserId),
    // One live arrangement per person and vehicle.
    uniqueIndex("vehicle_keeper_active_uq").on(t.vehicleId, t.userId).where(sql`state = 'active'`),
  ],
);

export const handOnState = pgEnum("hand_on_state", ["open", "accepted", "cancelled"]);

export const vehicleHandOn = pgTable(
  "vehicle_hand_on",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    fromUserId: text("from_user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    // Set when the link was sent to an address: only that account can accept.
    toEmail: text("to_email"),
    tokenHash: text("token_hash").notNull().unique(),
    includeReceipts: boolean("include_receipts").notNull().default(false),
    keepSnapshot: boolean("keep_snapshot").notNull().default(true),
    state: handOnState("state").notNull().default("open"),
    expiresAt: tz("expires_at").notNull(),
    acceptedByUserId: text("accepted_by_user_id").references(() => user.id, { onDelete: "set null" }),
    acceptedAt: tz("accepted_at"),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [
    index("vehicle_hand_on_vehicle_idx").on(t.vehicleId),
    index("vehicle_hand_on_from_idx").on(t.fromUserId),
    index("vehicle_hand_on_accepted_by_idx").on(t.acceptedByUserId),
  ],
);

/** A read-only copy of a vehicle's logbook a seller kept when handing it on. */
export const vehicleSnapshot = pgTable(
  "vehicle_snapshot",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: text("owner_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    handedOnAt: tz("handed_on_at").notNull(),
    data: jsonb("data").notNull(),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [index("vehicle_snapshot_owner_idx").on(t.ownerId)],
);

/** Every operator action; rows are only ever inserted (a trigger refuses changes). */
export const operatorAudit = pgTable(
  "operator_audit",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    actorUserId: text("actor_user_id").notNull(),
    actorEmail: text("actor_email").notNull(),
    action: text("action").notNull(),
    targetKind: text("target_kind").notNull(),
    targetId: text("target_id").notNull(),
    targetLabel: text("target_label"),
    detail: text("detail"),
    at: tz("at").notNull().defaultNow(),
  },
  (t) => [index("operator_audit_at_idx").on(t.at)],
);

export type VehicleKeeper = typeof vehicleKeeper.$inferSelect;
export type VehicleHandOn = typeof vehicleHandOn.$inferSelect;
