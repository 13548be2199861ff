// Shops (better-auth organizations) and the passes drivers give them.
import { sql } from "drizzle-orm";
import { index, integer, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { organization, user } from "./auth";
import { vehicle } from "./logbook";

const tz = (name: string) => timestamp(name, { withTimezone: true });

export const passScope = pgEnum("pass_scope", ["view", "view_add"]);

export const shopProfile = pgTable(
  "shop_profile",
  {
    shopId: text("shop_id")
      .primaryKey()
      .references(() => organization.id, { onDelete: "cascade" }),
    town: text("town").notNull(),
    address: text("address"),
    phone: text("phone"),
    email: text("email"),
    about: text("about"),
    createdAt: tz("created_at").notNull().defaultNow(),
    updatedAt: tz("updated_at").notNull().defaultNow(),
  },
  (t) => [index("shop_profile_town_idx").on(t.town)],
);

export const shopPass = pgTable(
  "shop_pass",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    driverId: text("driver_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    // A shop that closes leaves the driver's pass history in place (no
    // cascade): the id is cleared and the name kept on the row.
    shopId: text("shop_id").references(() => organization.id, { onDelete: "set null" }),
    shopName: text("shop_name"),
    scope: passScope("scope").notNull(),
    startsAt: tz("starts_at").notNull(),
    endsAt: tz("ends_at").notNull(),
    revokedAt: tz("revoked_at"),
    note: text("note"),
    // Set once the "pass ended" e-mail went out, so it goes out once.
    endNoticeSentAt: tz("end_notice_sent_at"),
    createdAt: tz("created_at").notNull().defaultNow(),
    // When the pass stopped or will stop: its end, or its revocation if
    // earlier. Stored (and indexed with the shop) so the shop's "still
    // visible" filter is an index range, not a computation over every pass.
    endedAt: tz("ended_at")
      .notNull()
      .generatedAlwaysAs(sql`least(ends_at, coalesce(revoked_at, ends_at))`),
  },
  (t) => [
    index("shop_pass_driver_idx").on(t.driverId, t.createdAt),
    index("shop_pass_shop_idx").on(t.shopId, t.endsAt),
    index("shop_pass_shop_ended_idx").on(t.shopId, t.endedAt),
    // The daily "pass ended" notices look only at passes without one.
    index("shop_pass_notice_due_idx").on(t.endedAt).where(sql`end_notice_sent_at is null`),
  ],
);

export const shopPassVehicle = pgTable(
  "shop_pass_vehicle",
  {
    passId: uuid("pass_id")
      .notNull()
      .references(() => shopPass.id, { onDelete: "cascade" }),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
  },
  (t) => [primaryKey({ columns: [t.passId, t.vehicleId] }), index("shop_pass_vehicle_vehicle_idx").on(t.vehicleId)],
);

/**
 * Every read and write under a pass, shown to the driver. A write is a row of
 * its own; reads are counted into one row per pass, vehicle, person and
 * action per visit window (`visitStart`, see ACCESS_VISIT_MS), so a
 * technician paging through a logbook does not add a row per request.
 */
export const accessLog = pgTable(
  "access_log",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    passId: uuid("pass_id")
      .notNull()
      .references(() => shopPass.id, { onDelete: "cascade" }),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    // The driver's access log outlives the shop, with the shop's name.
    shopId: text("shop_id").references(() => organization.id, { onDelete: "set null" }),
    shopName: text("shop_name"),
    actorUserId: text("actor_user_id").references(() => user.id, { onDelete: "set null" }),
    actorName: text("actor_name").notNull(),
    action: text("action").notNull(),
    detail: text("detail"),
    at: tz("at").notNull().defaultNow(),
    // Reads only: the start of the visit window, how many reads it holds and the last one.
    visitStart: tz("visit_start"),
    count: integer("count").notNull().default(1),
    lastAt: tz("last_at"),
  },
  (t) => [
    index("access_log_vehicle_idx").on(t.vehicleId, t.at),
    index("access_log_pass_idx").on(t.passId, t.at),
    index("access_log_shop_idx").on(t.shopId),
    index("access_log_actor_idx").on(t.actorUserId),
    // NULLs are distinct: writes (no visit_start) never collide.
    uniqueIndex("access_log_visit_uq").on(t.passId, t.vehicleId, t.actorUserId, t.action, t.visitStart),
  ],
);

export type ShopPass = typeof shopPass.$inferSelect;
