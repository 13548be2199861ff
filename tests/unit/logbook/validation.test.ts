// The request schemas the forms and the API share.
import { describe, expect, it } from "vitest";
import { addDays, dotWeekOf, formatDotDateCode } from "@/lib/tires";
import { fieldErrors } from "@/lib/validation/fields";
import { serviceEntrySchema, setPurchaseSchema, todayIso, toStoredReadings, treadCheckSchema, vehicleSchema } from "@/lib/validation/logbook";

const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, "0")}`;
const code = (daysAgo: number) => {
  const w = dotWeekOf(addDays(todayIso(), -daysAgo))!;
  return formatDotDateCode(w.week, w.year);
};

describe("vehicle", () => {
  it("coerces numbers typed as strings and treats empty fields as absent", () => {
    const v = vehicleSchema.parse({ nickname: " Blue ", make: "Velora", model: "Tessel", year: "2019", vin: "", placardFrontPressure: "2,4", pressureUnit: "bar" });
    expect(v).toMatchObject({ nickname: "Blue", year: 2019, vin: undefined, placardFrontPressure: 2.4, odometerUnit: "km" });
  });
  it("names each bad field", () => {
    const r = vehicleSchema.safeParse({ nickname: "", make: "V", model: "T", year: "20x9", placardFrontSize: "big", placardFrontPressure: "900", pressureUnit: "psi" });
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(fieldErrors(r.error)).sort()).toEqual(["nickname", "placardFrontSize", "year"]);
    // The pressure's range depends on its unit, so it is judged once the fields themselves parse.
    const p = vehicleSchema.safeParse({ nickname: "B", make: "V", model: "T", placardFrontPressure: "900", pressureUnit: "psi" });
    expect(p.success).toBe(false);
    if (!p.success) expect(fieldErrors(p.error).placardFrontPressure[0]).toMatch(/100–700 kPa/);
    expect(vehicleSchema.safeParse({ nickname: "B", make: "V", model: "T", placardFrontPressure: "35", pressureUnit: "psi" }).success).toBe(true);
  });
});

describe("purchase", () => {
  const base = { kind: "summer", size: "205/55 R16 91V", tires: [{ position: "front_left", dotCode: `DOT 3QXY ABC ${code(30)}` }] };
  it("accepts a DOT code of last month and refuses one from next year", () => {
    expect(setPurchaseSchema.safeParse(base).success).toBe(true);
    const w = dotWeekOf(addDays(todayIso(), 400))!;
    const r = setPurchaseSchema.safeParse({ ...base, tires: [{ position: "front_left", dotCode: formatDotDateCode(w.week, w.year) }] });
    expect(r.success).toBe(false);
    if (!r.success) expect(fieldErrors(r.error)["tires.0.dotCode"]).toBeDefined();
  });
  it("refuses two tires in one position, a depth over 20 mm, and storage without a place", () => {
    const r = setPurchaseSchema.safeParse({
      ...base,
      mountNow: "no",
      depthUnit: "32nds",
      tires: [
        { position: "front_left", newDepth: "26" },
        { position: "front_left" },
      ],
    });
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(fieldErrors(r.error)).sort()).toEqual(["storageLocation", "tires.0.newDepth", "tires.1.position"]);
  });
});

describe("tread check", () => {
  it("refuses depth outside 0–20 mm per groove, and a check dated tomorrow", () => {
    const r = treadCheckSchema.safeParse({ setId: uuid(1), checkedOn: addDays(todayIso(), 1), readings: [{ tireId: uuid(2), inner: "-0.5", centre: "20.1", outer: "20" }] });
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(fieldErrors(r.error)).sort()).toEqual(["checkedOn", "readings.0.centre", "readings.0.inner"]);
  });
  it("stores gauge readings in mm and coin readings as approximate", () => {
    const gauge = treadCheckSchema.parse({ setId: uuid(1), depthUnit: "32nds", readings: [{ tireId: uuid(2), inner: "8", centre: "" }] });
    expect(toStoredReadings(gauge, () => 0)[0]).toMatchObject({ innerMm: 6.35, centreMm: null, approximate: false });
    const coin = treadCheckSchema.parse({ setId: uuid(1), method: "coin", readings: [{ tireId: uuid(2), coin: "between" }] });
    expect(toStoredReadings(coin, () => 1.5875)[0]).toMatchObject({ centreMm: 1.5875, innerMm: null, approximate: true });
  });
  it("service entries check their tread checks with the same rules", () => {
    const r = serviceEntrySchema.safeParse({ kind: "rotation", checks: [{ setId: uuid(1), readings: [{ tireId: uuid(2), centre: "30" }] }] });
    expect(r.success).toBe(false);
    if (!r.success) expect(Object.keys(fieldErrors(r.error))).toEqual(["checks.0.readings.0.centre"]);
  });
});
