// The driver's logbook: vehicles, odometer history, tire sets, tires, tread
// checks with their per-tire readings, service entries and attachments.
// Distances are stored in km and depths in mm; units are a display choice.
import {
  boolean,
  date,
  doublePrecision,
  index,
  integer,
  pgEnum,
  pgTable,
  smallint,
  bigint,
  check,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { organization, user } from "./auth";

const tz = (name: string) => timestamp(name, { withTimezone: true });

export const odometerUnit = pgEnum("odometer_unit", ["km", "mi"]);
export const setKind = pgEnum("set_kind", ["summer", "all_season", "all_weather", "winter"]);
export const setState = pgEnum("set_state", ["mounted", "stored", "retired"]);
export const tirePosition = pgEnum("tire_position", ["front_left", "front_right", "rear_left", "rear_right", "spare"]);
export const measuredBy = pgEnum("measured_by", ["driver", "shop"]);
export const measureMethod = pgEnum("measure_method", ["gauge", "coin"]);
export const serviceKind = pgEnum("service_kind", [
  "fitting",
  "seasonal_swap",
  "rotation",
  "balancing",
  "alignment",
  "puncture_repair",
  "inspection",
]);
export const attachmentKind = pgEnum("attachment_kind", ["receipt", "photo", "document"]);

export const vehicle = pgTable(
  "vehicle",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: text("owner_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    nickname: text("nickname").notNull(),
    make: text("make").notNull(),
    model: text("model").notNull(),
    year: integer("year"),
    vin: text("vin"),
    plate: text("plate"),
    placardFrontSize: text("placard_front_size"),
    placardRearSize: text("placard_rear_size"),
    placardFrontKpa: doublePrecision("placard_front_kpa"),
    placardRearKpa: doublePrecision("placard_rear_kpa"),
    odometerUnit: odometerUnit("odometer_unit").notNull().default("km"),
    createdAt: tz("created_at").notNull().defaultNow(),
    updatedAt: tz("updated_at").notNull().defaultNow(),
  },
  (t) => [index("vehicle_owner_id_idx").on(t.ownerId)],
);

export const odometerReading = pgTable(
  "odometer_reading",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    readOn: date("read_on").notNull(),
    odometerKm: doublePrecision("odometer_km").notNull(),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [index("odometer_reading_vehicle_idx").on(t.vehicleId, t.readOn)],
);

export const tireSet = pgTable(
  "tire_set",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    label: text("label"),
    kind: setKind("kind").notNull(),
    size: text("size").notNull(),
    loadIndex: integer("load_index"),
    speedSymbol: text("speed_symbol"),
    purchasedOn: date("purchased_on"),
    priceCents: integer("price_cents"),
    currency: text("currency").notNull().default("EUR"),
    seller: text("seller"),
    state: setState("state").notNull().default("mounted"),
    storageLocation: text("storage_location"),
    // Per-set overrides of the defaults of the computation core.
    depthLimitMm: doublePrecision("depth_limit_mm"),
    ageReplaceYears: doublePrecision("age_replace_years"),
    ageWatchYears: doublePrecision("age_watch_years"),
    fittedByShopId: text("fitted_by_shop_id").references(() => organization.id, { onDelete: "set null" }),
    createdAt: tz("created_at").notNull().defaultNow(),
    updatedAt: tz("updated_at").notNull().defaultNow(),
  },
  (t) => [
    index("tire_set_vehicle_idx").on(t.vehicleId),
    index("tire_set_state_idx").on(t.vehicleId, t.state),
    index("tire_set_fitted_by_shop_idx").on(t.fittedByShopId),
  ],
);

export const tire = pgTable(
  "tire",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    setId: uuid("set_id")
      .notNull()
      .references(() => tireSet.id, { onDelete: "cascade" }),
    position: tirePosition("position").notNull(),
    // The code exactly as the driver typed it, and what it decoded to.
    dotCode: text("dot_code"),
    dotWeek: integer("dot_week"),
    dotYear: integer("dot_year"),
    dotWeekStart: date("dot_week_start"),
    dotPrecision: text("dot_precision"),
    newDepthMm: doublePrecision("new_depth_mm"),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [index("tire_set_id_idx").on(t.setId)],
);

export const serviceEntry = pgTable(
  "service_entry",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    setId: uuid("set_id").references(() => tireSet.id, { onDelete: "set null" }),
    kind: serviceKind("kind").notNull(),
    performedOn: date("performed_on").notNull(),
    odometerKm: doublePrecision("odometer_km"),
    costCents: integer("cost_cents"),
    notes: text("notes"),
    shopId: text("shop_id").references(() => organization.id, { onDelete: "set null" }),
    authorUserId: text("author_user_id").references(() => user.id, { onDelete: "set null" }),
    passId: uuid("pass_id"),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [
    index("service_entry_vehicle_idx").on(t.vehicleId, t.performedOn),
    index("service_entry_shop_idx").on(t.shopId),
    index("service_entry_set_idx").on(t.setId),
    index("service_entry_pass_idx").on(t.passId),
    index("service_entry_author_idx").on(t.authorUserId),
  ],
);

export const treadCheck = pgTable(
  "tread_check",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    setId: uuid("set_id")
      .notNull()
      .references(() => tireSet.id, { onDelete: "cascade" }),
    checkedOn: date("checked_on").notNull(),
    odometerKm: doublePrecision("odometer_km"),
    measuredBy: measuredBy("measured_by").notNull().default("driver"),
    method: measureMethod("method").notNull().default("gauge"),
    shopId: text("shop_id").references(() => organization.id, { onDelete: "set null" }),
    authorUserId: text("author_user_id").references(() => user.id, { onDelete: "set null" }),
    serviceEntryId: uuid("service_entry_id").references(() => serviceEntry.id, { onDelete: "set null" }),
    passId: uuid("pass_id"),
    notes: text("notes"),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [
    index("tread_check_vehicle_idx").on(t.vehicleId, t.checkedOn),
    index("tread_check_set_idx").on(t.setId),
    index("tread_check_pass_idx").on(t.passId),
    index("tread_check_service_entry_idx").on(t.serviceEntryId),
    index("tread_check_shop_idx").on(t.shopId),
    index("tread_check_author_idx").on(t.authorUserId),
  ],
);

export const treadReading = pgTable(
  "tread_reading",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    checkId: uuid("check_id")
      .notNull()
      .references(() => treadCheck.id, { onDelete: "cascade" }),
    tireId: uuid("tire_id")
      .notNull()
      .references(() => tire.id, { onDelete: "cascade" }),
    innerMm: doublePrecision("inner_mm"),
    centreMm: doublePrecision("centre_mm"),
    outerMm: doublePrecision("outer_mm"),
    pressureKpa: doublePrecision("pressure_kpa"),
    // A coin reading is only a bracket, never a measurement.
    approximate: boolean("approximate").notNull().default(false),
  },
  (t) => [index("tread_reading_check_idx").on(t.checkId), index("tread_reading_tire_idx").on(t.tireId)],
);

export const attachment = pgTable(
  "attachment",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: text("owner_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicle.id, { onDelete: "cascade" }),
    setId: uuid("set_id").references(() => tireSet.id, { onDelete: "cascade" }),
    serviceEntryId: uuid("service_entry_id").references(() => serviceEntry.id, { onDelete: "cascade" }),
    kind: attachmentKind("kind").notNull(),
    fileName: text("file_name").notNull(),
    storedName: text("stored_name").notNull().unique(),
    mimeType: text("mime_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    uploadedByUserId: text("uploaded_by_user_id").references(() => user.id, { onDelete: "set null" }),
    createdAt: tz("created_at").notNull().defaultNow(),
  },
  (t) => [
    index("attachment_vehicle_idx").on(t.vehicleId),
    index("attachment_set_idx").on(t.setId),
    index("attachment_service_idx").on(t.serviceEntryId),
    index("attachment_owner_idx").on(t.ownerId),
    index("attachment_uploaded_by_idx").on(t.uploadedByUserId),
  ],
);

export type Vehicle = typeof vehicle.$inferSelect;
export type TireSet = typeof tireSet.$inferSelect;
export type Tire = typeof tire.$inferSelect;
export type TreadCheck = typeof treadCheck.$inferSelect;
export type TreadReading = typeof treadReading.$inferSelect;
export type ServiceEntry = typeof serviceEntry.$inferSelect;
export type Attachment = typeof attachment.$inferSelect;


/**
 * When a vehicle's logbook last changed, as a number that only grows (the
 * next value of logbook_revision_seq): set by database triggers (migration
 * 0012) on every insert, update or delete of the vehicle
 * and of its sets, tires, checks, readings, service entries, attachments,
 * odometer readings and access-log rows, whoever writes them. A vehicle
 * without a row has not changed since the triggers came. Read answers are
 * kept in memory under this number (db/revision.ts) and served again while
 * it stands.
 */
export const logbookRevision = pgTable("logbook_revision", {
  vehicleId: uuid("vehicle_id")
    .primaryKey()
    .references(() => vehicle.id, { onDelete: "cascade" }),
  revision: bigint("revision", { mode: "number" }).notNull().default(0),
});

/**
 * One number for what many logbooks show but no vehicle owns: people's and
 * shops' names, drivers' settings. Set by triggers like logbookRevision.
 */
export const sharedRevision = pgTable(
  "shared_revision",
  {
    id: smallint("id").primaryKey().default(1),
    revision: bigint("revision", { mode: "number" }).notNull().default(0),
  },
  (t) => [check("shared_revision_one_row", sql`${t.id} = 1`)],
);
