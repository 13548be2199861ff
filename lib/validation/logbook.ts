// The logbook's request schemas, shared by the route handlers and the forms
// (through the zod resolver). Forms send numbers as strings and values in
// the driver's units; `to*` helpers below turn a parsed request into the
// stored units (mm, km, kPa, cents).
import { z } from "zod";
import { COIN_RESULTS, decodeDotCode, isIsoDate, parseTireSize, validateVin, type CoinResult } from "@/lib/tires";
import { depthToMm, distanceToKm, pressureToKpa, type DepthUnit, type PressureUnit } from "@/lib/units";
import { decimalFromText, isSingleLine } from "./text";

const blank = (v: unknown) => (v === "" || v === null || (typeof v === "string" && v.trim() === "") ? undefined : v);

/** Optional trimmed text; an empty field counts as absent. */
const optText = (max: number) =>
  z.preprocess(
    (v) => (typeof v === "string" ? blank(v.trim()) : blank(v)),
    z.string().max(max, `Use at most ${max} characters.`).optional(),
  );

/** Optional number typed into a form field (a string) or sent as a number. */
const optNumber = (min: number, max: number, what: string) =>
  z.preprocess(
    (v) => {
      const b = blank(v);
      if (typeof b === "string") return decimalFromText(b);
      return b;
    },
    z
      .number({ error: `${what} must be a number.` })
      .refine(Number.isFinite, `${what} must be a number.`)
      .min(min, `${what} must be at least ${min}.`)
      .max(max, `${what} must be at most ${max}.`)
      .optional(),
  );

const bool = z.preprocess((v) => v === true || v === "true" || v === "on" || v === "1" || v === "yes", z.boolean());

export const isoDate = z.string().refine(isIsoDate, "Enter a date as YYYY-MM-DD.");
const optDate = z.preprocess(blank, isoDate.optional());
export const id = z.string().uuid("This reference is not valid.");

// Labels and lists the browser shows live in ./labels (no zod), so pages that
// only show them do not ship the validation library.
export { todayIso, SET_KIND_VALUES, SET_KIND_LABELS, POSITIONS, POSITION_LABELS, SERVICE_KINDS, SERVICE_KIND_LABELS, type PositionValue } from "./labels";
import { POSITIONS, SERVICE_KINDS, SET_KIND_VALUES, todayIso } from "./labels";

const depthUnit = z.enum(["mm", "32nds"]).default("mm");
const distanceUnit = z.enum(["km", "mi"]).default("km");
const pressureUnit = z.enum(["kpa", "psi", "bar"]).default("kpa");

/** Depth is refused outside 0–20 mm whatever unit it was typed in. */
export const MAX_DEPTH_MM = 20;
const depthMessage = (unit: DepthUnit) =>
  unit === "32nds"
    ? "Tread depth must be between 0 and 25/32 in (0–20 mm). Check the reading."
    : "Tread depth must be between 0 and 20 mm. Check the reading.";

const tireSizeText = z
  .string({ error: "Type the tire size, for example 205/55 R16 91V." })
  .trim()
  .min(1, "Type the tire size, for example 205/55 R16 91V.")
  .superRefine((v, ctx) => {
    const p = parseTireSize(v);
    if (!p.ok) ctx.addIssue({ code: "custom", message: p.error });
  });
const optSize = z.preprocess(
  (v) => (typeof v === "string" ? blank(v.trim()) : blank(v)),
  tireSizeText.optional(),
);

// ---------------------------------------------------------------- vehicles

export const vehicleSchema = z
  .object({
    nickname: z.string({ error: "Give the vehicle a name you will recognise." }).trim().min(1, "Give the vehicle a name you will recognise.").max(60, "Use at most 60 characters.").refine(isSingleLine, "Keep the name on one line."),
    make: z.string({ error: "Type the make." }).trim().min(1, "Type the make.").max(60, "Use at most 60 characters."),
    model: z.string({ error: "Type the model." }).trim().min(1, "Type the model.").max(60, "Use at most 60 characters."),
    year: optNumber(1950, new Date().getFullYear() + 1, "The year"),
    vin: optText(20),
    plate: optText(20),
    placardFrontSize: optSize,
    placardRearSize: optSize,
    placardFrontPressure: optNumber(0.5, 1000, "The front pressure"),
    placardRearPressure: optNumber(0.5, 1000, "The rear pressure"),
    pressureUnit,
    odometerUnit: distanceUnit,
  })
  .superRefine((v, ctx) => {
    if (v.vin) {
      const r = validateVin(v.vin);
      // A VIN is optional and only warned about, except when it cannot be a VIN at all.
      if (!r.ok) ctx.addIssue({ code: "custom", path: ["vin"], message: r.error });
    }
    if (v.year !== undefined && !Number.isInteger(v.year)) ctx.addIssue({ code: "custom", path: ["year"], message: "The year is a whole number, like 2019." });
    for (const key of ["placardFrontPressure", "placardRearPressure"] as const) {
      const p = v[key];
      if (p === undefined) continue;
      const kpa = pressureToKpa(p, v.pressureUnit);
      if (kpa < 100 || kpa > 700) ctx.addIssue({ code: "custom", path: [key], message: "That pressure is outside what a car tire takes (about 100–700 kPa, 15–100 psi, 1–7 bar)." });
    }
  });
export type VehicleInput = z.output<typeof vehicleSchema>;
export type VehicleForm = z.input<typeof vehicleSchema>;

export const vehicleUpdateSchema = vehicleSchema;

export function toVehicleRow(v: VehicleInput) {
  return {
    nickname: v.nickname,
    make: v.make,
    model: v.model,
    year: v.year ?? null,
    vin: v.vin ? v.vin.toUpperCase().replace(/[\s-]+/g, "") : null,
    plate: v.plate ?? null,
    placardFrontSize: v.placardFrontSize ?? null,
    placardRearSize: v.placardRearSize ?? null,
    placardFrontKpa: v.placardFrontPressure !== undefined ? pressureToKpa(v.placardFrontPressure, v.pressureUnit) : null,
    placardRearKpa: v.placardRearPressure !== undefined ? pressureToKpa(v.placardRearPressure, v.pressureUnit) : null,
    odometerUnit: v.odometerUnit,
  };
}

// ---------------------------------------------------------------- sets

const tireEntry = z.object({
  position: z.enum(POSITIONS, { error: "Choose the tire's position." }),
  dotCode: optText(20),
  newDepth: optNumber(0, 40, "The depth when new"),
});

export const setPurchaseSchema = z
  .object({
    label: optText(60),
    kind: z.enum(SET_KIND_VALUES, { error: "Choose the kind of set." }),
    size: tireSizeText,
    purchasedOn: optDate,
    price: optNumber(0, 100_000, "The price"),
    currency: z.preprocess(blank, z.string().regex(/^[A-Z]{3}$/, "Use a three-letter currency code, like EUR.").default("EUR")),
    seller: optText(80),
    depthUnit,
    odometer: optNumber(0, 3_000_000, "The odometer"),
    odometerUnit: distanceUnit,
    confirmLowerOdometer: bool.default(false),
    /** Whether the new set goes on the car now, or into storage. */
    mountNow: bool.default(true),
    storageLocation: optText(120),
    /** What becomes of the set that is on the car now, if the new one replaces it. */
    replacedFate: z.preprocess(blank, z.enum(["stored", "retired"], { error: "Choose whether the old set is stored or retired." }).optional()),
    replacedStorage: optText(120),
    tires: z.array(tireEntry).min(1, "Add at least one tire.").max(5, "A set has at most five tires (four and a spare)."),
  })
  .superRefine((v, ctx) => {
    const today = todayIso();
    if (v.purchasedOn && v.purchasedOn > today) ctx.addIssue({ code: "custom", path: ["purchasedOn"], message: "The purchase date is in the future." });
    const seen = new Set<string>();
    v.tires.forEach((t, i) => {
      if (seen.has(t.position)) ctx.addIssue({ code: "custom", path: ["tires", i, "position"], message: "Two tires have the same position." });
      seen.add(t.position);
      if (t.dotCode) {
        const d = decodeDotCode(t.dotCode, { today });
        if (!d.ok) ctx.addIssue({ code: "custom", path: ["tires", i, "dotCode"], message: d.error });
      }
      if (t.newDepth !== undefined && depthToMm(t.newDepth, v.depthUnit) > MAX_DEPTH_MM) {
        ctx.addIssue({ code: "custom", path: ["tires", i, "newDepth"], message: depthMessage(v.depthUnit) });
      }
    });
    if (!v.mountNow && !v.storageLocation) {
      ctx.addIssue({ code: "custom", path: ["storageLocation"], message: "Say where the new set is stored." });
    }
    if (v.replacedFate === "stored" && !v.replacedStorage) {
      ctx.addIssue({ code: "custom", path: ["replacedStorage"], message: "Say where the old set is stored." });
    }
  });
export type SetPurchaseInput = z.output<typeof setPurchaseSchema>;
export type SetPurchaseForm = z.input<typeof setPurchaseSchema>;

export const setUpdateSchema = z.object({
  label: optText(60),
  seller: optText(80),
  storageLocation: optText(120),
  retire: bool.default(false),
  /** A per-set depth limit in mm replacing the jurisdiction's (empty: the default). */
  depthLimitMm: optNumber(0.5, MAX_DEPTH_MM, "The depth limit"),
  ageWatchYears: optNumber(1, 20, "The inspection age"),
  ageReplaceYears: optNumber(1, 20, "The replacement age"),
}).superRefine((v, ctx) => {
  if (v.ageWatchYears !== undefined && v.ageReplaceYears !== undefined && v.ageWatchYears > v.ageReplaceYears) {
    ctx.addIssue({ code: "custom", path: ["ageWatchYears"], message: "The inspection age must come before the replacement age." });
  }
});
export type SetUpdateInput = z.output<typeof setUpdateSchema>;

/** Correcting one tire: its DOT code (read later from the sidewall) and its position. */
export const tireUpdateSchema = z
  .object({
    dotCode: optText(20),
    position: z.enum(POSITIONS, { error: "Choose the tire's position." }),
  })
  .superRefine((v, ctx) => {
    if (!v.dotCode) return;
    const d = decodeDotCode(v.dotCode, { today: todayIso() });
    if (!d.ok) ctx.addIssue({ code: "custom", path: ["dotCode"], message: d.error });
  });
export type TireUpdateInput = z.output<typeof tireUpdateSchema>;

export const swapSchema = z.object({
  /** The set that goes on the car. */
  setId: id,
  /** Where the set coming off is kept. */
  storageLocation: z.string({ error: "Say where the set coming off is kept." }).trim().min(1, "Say where the set coming off is kept.").max(120),
  date: optDate,
  odometer: optNumber(0, 3_000_000, "The odometer"),
  odometerUnit: distanceUnit,
  confirmLowerOdometer: bool.default(false),
});
export type SwapInput = z.output<typeof swapSchema>;

// ---------------------------------------------------------------- tread checks

const readingEntry = z.object({
  tireId: id,
  inner: optNumber(-1000, 1000, "The inner depth"),
  centre: optNumber(-1000, 1000, "The centre depth"),
  outer: optNumber(-1000, 1000, "The outer depth"),
  coin: z.preprocess(blank, z.enum(COIN_RESULTS as [CoinResult, ...CoinResult[]], { error: "Choose what the coin showed." }).optional()),
  pressure: optNumber(0, 1000, "The pressure"),
});

const treadCheckObject = z.object({
  setId: id,
  checkedOn: optDate,
  odometer: optNumber(0, 3_000_000, "The odometer"),
  odometerUnit: distanceUnit,
  confirmLowerOdometer: bool.default(false),
  /** The driver confirmed a reading deeper than new or than the last one. */
  confirmUnusualDepth: bool.default(false),
  method: z.enum(["gauge", "coin"]).default("gauge"),
  depthUnit,
  pressureUnit,
  notes: optText(500),
  readings: z.array(readingEntry).min(1, "Record at least one tire.").max(5),
});

type CheckShape = z.output<typeof treadCheckObject>;

function refineCheck(v: CheckShape, ctx: z.RefinementCtx, prefix: (string | number)[] = []) {
  if (v.checkedOn && v.checkedOn > todayIso()) ctx.addIssue({ code: "custom", path: [...prefix, "checkedOn"], message: "The check date is in the future." });
  const seen = new Set<string>();
  v.readings.forEach((r, i) => {
    const at = (field: string) => [...prefix, "readings", i, field];
    if (seen.has(r.tireId)) ctx.addIssue({ code: "custom", path: at("tireId"), message: "This tire is listed twice." });
    seen.add(r.tireId);
    if (v.method === "coin") {
      if (!r.coin) ctx.addIssue({ code: "custom", path: at("coin"), message: "Choose what the coin showed in this tire's groove." });
    } else {
      const grooves = (["inner", "centre", "outer"] as const).filter((g) => r[g] !== undefined);
      if (grooves.length === 0) ctx.addIssue({ code: "custom", path: at("centre"), message: "Enter at least one groove's depth for this tire." });
      for (const g of grooves) {
        const mm = depthToMm(r[g] as number, v.depthUnit);
        if (mm < 0 || mm > MAX_DEPTH_MM) ctx.addIssue({ code: "custom", path: at(g), message: depthMessage(v.depthUnit) });
      }
    }
    if (r.pressure !== undefined) {
      const kpa = pressureToKpa(r.pressure, v.pressureUnit);
      if (kpa < 50 || kpa > 700) ctx.addIssue({ code: "custom", path: at("pressure"), message: "That pressure is outside what a car tire takes (about 50–700 kPa, 7–100 psi, 0.5–7 bar)." });
    }
  });
}

export const treadCheckSchema = treadCheckObject.superRefine((v, ctx) => refineCheck(v, ctx));
export type TreadCheckRequest = z.output<typeof treadCheckSchema>;
export type TreadCheckForm = z.input<typeof treadCheckSchema>;

export type StoredReading = {
  tireId: string;
  innerMm: number | null;
  centreMm: number | null;
  outerMm: number | null;
  pressureKpa: number | null;
  approximate: boolean;
};

/** A parsed check in stored units. Coin readings become their bracket's lower edge, marked approximate. */
export function toStoredReadings(v: TreadCheckRequest, coinToMm: (c: CoinResult) => number): StoredReading[] {
  return v.readings.map((r) => {
    const pressureKpa = r.pressure !== undefined ? pressureToKpa(r.pressure, v.pressureUnit as PressureUnit) : null;
    if (v.method === "coin") {
      const mm = coinToMm(r.coin as CoinResult);
      return { tireId: r.tireId, innerMm: null, centreMm: mm, outerMm: null, pressureKpa, approximate: true };
    }
    const mm = (x: number | undefined) => (x === undefined ? null : depthToMm(x, v.depthUnit));
    return { tireId: r.tireId, innerMm: mm(r.inner), centreMm: mm(r.centre), outerMm: mm(r.outer), pressureKpa, approximate: false };
  });
}

export const odometerKmOf = (v: { odometer?: number; odometerUnit: "km" | "mi" }) =>
  v.odometer === undefined ? null : distanceToKm(v.odometer, v.odometerUnit);

// ---------------------------------------------------------------- service entries

const serviceEntryObject = z.object({
  kind: z.enum(SERVICE_KINDS, { error: "Choose the kind of work." }),
  setId: z.preprocess(blank, id.optional()),
  performedOn: optDate,
  odometer: optNumber(0, 3_000_000, "The odometer"),
  odometerUnit: distanceUnit,
  confirmLowerOdometer: bool.default(false),
  cost: optNumber(0, 100_000, "The cost"),
  notes: optText(1000),
  /** Tread checks taken during the work, saved with it. */
  checks: z.array(treadCheckObject.omit({ odometer: true, odometerUnit: true, confirmLowerOdometer: true, checkedOn: true })).max(3).default([]),
});

export const serviceEntrySchema = serviceEntryObject.superRefine((v, ctx) => {
  if (v.performedOn && v.performedOn > todayIso()) ctx.addIssue({ code: "custom", path: ["performedOn"], message: "The date is in the future." });
  v.checks.forEach((c, i) =>
    refineCheck({ ...c, odometerUnit: v.odometerUnit, confirmLowerOdometer: v.confirmLowerOdometer } as CheckShape, ctx, ["checks", i]),
  );
});
export type ServiceEntryInput = z.output<typeof serviceEntrySchema>;

/** Changing an entry: the same fields and rules; the checks taken with it are changed as checks. */
export const serviceEntryUpdateSchema = serviceEntryObject.omit({ checks: true }).superRefine((v, ctx) => {
  if (v.performedOn && v.performedOn > todayIso()) ctx.addIssue({ code: "custom", path: ["performedOn"], message: "The date is in the future." });
});
export type ServiceEntryUpdateInput = z.output<typeof serviceEntryUpdateSchema>;

// ---------------------------------------------------------------- attachments

export { ATTACHMENT_MAX_BYTES, ATTACHMENT_TYPES } from "./labels";
export const attachmentMetaSchema = z.object({
  kind: z.enum(["receipt", "photo", "document"]).default("receipt"),
  setId: z.preprocess(blank, id.optional()),
  serviceEntryId: z.preprocess(blank, id.optional()),
});

// ---------------------------------------------------------------- account

export const unitsSchema = z.object({
  units: z.enum(["metric", "imperial"], { error: "Choose metric or imperial." }),
  pressureUnit: z.enum(["kpa", "psi", "bar"], { error: "Choose a pressure unit." }),
});
export type UnitsInput = z.output<typeof unitsSchema>;
