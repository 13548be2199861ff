// The export document: everything a driver's logbook holds, as one JSON
// file inside the export zip. These zod schemas are the one definition of
// the format: the import validates with them, and the JSON Schema in
// docs/fourpatch-export.schema.json is generated from them
// (`npm run export:schema`). Ids are references inside the document only;
// an import gives every row a new id.
import { z } from "zod";

export const EXPORT_FORMAT = "fourpatch-logbook-export";
/** Version 1 was the JSON-only download; version 2 is the zip with files and CSVs. */
export const EXPORT_VERSION = 2;
export const DOCUMENT_NAME = "fourpatch-export.json";

const ref = z.string().min(1).max(64);
const text = (max: number) => z.string().max(max);
const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "a date as YYYY-MM-DD");
const instant = z.iso.datetime({ offset: true });
const num = z.number().finite();
const maybe = <T extends z.ZodType>(s: T) => s.nullable();

export const exportVehicle = z.strictObject({
  id: ref,
  nickname: text(120),
  make: text(120),
  model: text(120),
  year: maybe(z.int().min(1880).max(2200)),
  vin: maybe(text(32)),
  plate: maybe(text(32)),
  placardFrontSize: maybe(text(60)),
  placardRearSize: maybe(text(60)),
  placardFrontKpa: maybe(num),
  placardRearKpa: maybe(num),
  odometerUnit: z.enum(["km", "mi"]),
  createdAt: instant,
  updatedAt: instant,
});

export const exportOdometerReading = z.strictObject({ id: ref, vehicleId: ref, readOn: day, odometerKm: num, createdAt: instant });

export const exportSet = z.strictObject({
  id: ref,
  vehicleId: ref,
  label: maybe(text(120)),
  kind: z.enum(["summer", "all_season", "all_weather", "winter"]),
  size: text(60),
  loadIndex: maybe(z.int().min(0).max(300)),
  speedSymbol: maybe(text(4)),
  purchasedOn: maybe(day),
  priceCents: maybe(z.int().min(0)),
  currency: text(3),
  seller: maybe(text(200)),
  state: z.enum(["mounted", "stored", "retired"]),
  storageLocation: maybe(text(200)),
  depthLimitMm: maybe(num),
  ageReplaceYears: maybe(num),
  ageWatchYears: maybe(num),
  fittedByShop: maybe(z.strictObject({ id: ref, name: text(200) })),
  createdAt: instant,
  updatedAt: instant,
});

export const exportTire = z.strictObject({
  id: ref,
  setId: ref,
  position: z.enum(["front_left", "front_right", "rear_left", "rear_right", "spare"]),
  dotCode: maybe(text(40)),
  dotWeek: maybe(z.int().min(1).max(53)),
  dotYear: maybe(z.int().min(1950).max(2200)),
  dotWeekStart: maybe(day),
  dotPrecision: maybe(text(20)),
  newDepthMm: maybe(num),
  createdAt: instant,
});

/** Who wrote a row: the exporting account, a shop (with the technician's name), or someone else by name only. */
export const exportAuthor = z.strictObject({
  by: z.enum(["account", "shop", "other"]),
  name: maybe(text(200)),
  shop: maybe(z.strictObject({ id: ref, name: text(200) })),
});

export const exportTreadCheck = z.strictObject({
  id: ref,
  vehicleId: ref,
  setId: ref,
  checkedOn: day,
  odometerKm: maybe(num),
  measuredBy: z.enum(["driver", "shop"]),
  method: z.enum(["gauge", "coin"]),
  author: exportAuthor,
  serviceEntryId: maybe(ref),
  notes: maybe(text(2000)),
  createdAt: instant,
});

export const exportTreadReading = z.strictObject({
  id: ref,
  checkId: ref,
  tireId: ref,
  innerMm: maybe(num),
  centreMm: maybe(num),
  outerMm: maybe(num),
  pressureKpa: maybe(num),
  approximate: z.boolean(),
});

export const exportServiceEntry = z.strictObject({
  id: ref,
  vehicleId: ref,
  setId: maybe(ref),
  kind: z.enum(["fitting", "seasonal_swap", "rotation", "balancing", "alignment", "puncture_repair", "inspection"]),
  performedOn: day,
  odometerKm: maybe(num),
  costCents: maybe(z.int().min(0)),
  notes: maybe(text(2000)),
  author: exportAuthor,
  createdAt: instant,
});

export const exportAttachment = z.strictObject({
  id: ref,
  vehicleId: ref,
  setId: maybe(ref),
  serviceEntryId: maybe(ref),
  kind: z.enum(["receipt", "photo", "document"]),
  fileName: text(255),
  mimeType: z.enum(["image/jpeg", "image/png", "image/webp", "application/pdf"]),
  sizeBytes: z.int().min(1),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  /** Where the file is inside the zip. */
  path: z.string().regex(/^files\/[A-Za-z0-9._-]{1,200}$/),
  createdAt: instant,
});

export const exportProfile = z.strictObject({
  units: z.enum(["metric", "imperial"]),
  pressureUnit: z.enum(["kpa", "psi", "bar"]),
  timezone: text(64),
  jurisdiction: text(16),
  reminderSettings: z.record(z.string(), z.unknown()),
  emailReminders: z.boolean(),
});

/** What the account gave shops (a record only: an import never gives a shop access). */
export const exportPass = z.strictObject({
  id: ref,
  // A shop closed since keeps its name on the pass, without an id.
  shop: z.strictObject({ id: maybe(ref), name: text(200) }),
  scope: z.enum(["view", "view_add"]),
  startsAt: instant,
  endsAt: instant,
  revokedAt: maybe(instant),
  note: maybe(text(1000)),
  vehicleIds: z.array(ref),
});

export const exportAccessLogEntry = z.strictObject({
  passId: ref,
  vehicleId: ref,
  shopName: text(200),
  actorName: text(200),
  action: text(100),
  detail: maybe(text(2000)),
  at: instant,
});

export const exportDocument = z.strictObject({
  format: z.literal(EXPORT_FORMAT),
  version: z.literal(EXPORT_VERSION),
  exportedAt: instant,
  account: z.strictObject({ id: ref, name: text(200), email: text(254) }),
  profile: maybe(exportProfile),
  vehicles: z.array(exportVehicle),
  odometerReadings: z.array(exportOdometerReading),
  sets: z.array(exportSet),
  tires: z.array(exportTire),
  treadChecks: z.array(exportTreadCheck),
  treadReadings: z.array(exportTreadReading),
  serviceEntries: z.array(exportServiceEntry),
  attachments: z.array(exportAttachment),
  shopPasses: z.array(exportPass),
  accessLog: z.array(exportAccessLogEntry),
});

export type ExportDocument = z.output<typeof exportDocument>;

/** The JSON Schema of the document, as committed in docs/. */
export function exportJsonSchema() {
  return {
    ...z.toJSONSchema(exportDocument, { target: "draft-2020-12" }),
    $id: "urn:fourpatch:logbook-export:2",
    title: "Fourpatch logbook export, version 2",
    description: "The fourpatch-export.json file inside a Fourpatch export zip. Ids are references inside the document.",
  };
}
