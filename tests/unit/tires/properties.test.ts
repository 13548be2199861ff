import fc from "fast-check";
import { describe, expect, it } from "vitest";
import * as core from "@/lib/tires";
import {
  decodeDotCode,
  dotWeeksInYear,
  formatDotDateCode,
  formatTireSize,
  mmToThirtySeconds,
  parseTireSize,
  projectWear,
  SPEED_SYMBOLS,
  thirtySecondsToMm,
  type TireSize,
} from "@/lib/tires";

const isoDate = fc
  .date({ min: new Date(Date.UTC(1995, 0, 1)), max: new Date(Date.UTC(2045, 11, 31)), noInvalidDate: true })
  .map((d) => d.toISOString().slice(0, 10));

describe("property: no function throws on arbitrary input", () => {
  const anything = fc.oneof(fc.string(), fc.string({ unit: "grapheme" }), fc.double(), fc.integer(), fc.constant(null), fc.constant(undefined), fc.anything());
  it("string and number inputs give values, never exceptions", () => {
    fc.assert(
      fc.property(anything, anything, isoDate, (a, b, today) => {
        const u = a as never;
        decodeDotCode(u, { today });
        core.tireAge(u, { today });
        core.ageCondition({ manufactureWeekStart: u, kind: b as never, today });
        core.tireDepth(u);
        core.depthLimit({ jurisdiction: u, season: b as never, date: today, customMm: b as never });
        core.depthCondition({ depthMm: u, limitMm: b as never });
        core.mmToThirtySeconds(u);
        core.parseTireSize(u);
        core.overallDiameter(u);
        core.checkFit(u, b as never);
        core.loadIndexKg(u);
        core.speedSymbolKmh(u);
        core.validateVin(u);
        core.wearPattern({ innerMm: u, centreMm: b as never, outerMm: u });
        core.axlePattern({ tires: [{ position: "front-left", centreMm: u }, { position: "rear-left", centreMm: b as never }] });
        core.projectWear([{ date: u, odometerKm: b as never, depthMm: u }], { limitMm: b as never, today });
        core.computeReminders({ vehicles: [{ id: "v", sets: [{ id: "s", kind: "summer", state: "mounted", tires: [{ id: "t", position: "front-left", dotCode: u }] }] }] }, {}, { today });
      }),
      { numRuns: 500 },
    );
  });
  it("TIN-like strings never throw and either decode within the rule or explain why not", () => {
    fc.assert(
      fc.property(fc.stringMatching(/^([Dd][Oo][Tt] ?)?[A-Za-z0-9 ]{0,16}$/), (s) => {
        const r = decodeDotCode(s, { today: "2030-01-01" });
        if (r.ok) {
          expect(r.week).toBeGreaterThanOrEqual(1);
          expect(r.week).toBeLessThanOrEqual(53);
          expect(r.weekStart <= "2030-01-01").toBe(true);
        } else expect(r.error.length).toBeGreaterThan(20);
      }),
    );
  });
});

describe("property: mm ↔ 32nds round trip by the exact inch [pub: 1 in = 25.4 mm]", () => {
  it("round trips within floating-point error", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 40, noNaN: true }), (mm) => {
        expect(thirtySecondsToMm(mmToThirtySeconds(mm))).toBeCloseTo(mm, 10);
      }),
    );
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 32 }), (n) => {
        expect(mmToThirtySeconds(thirtySecondsToMm(n))).toBeCloseTo(n, 10);
      }),
    );
  });
});

describe("property: parse(format(x)) = x", () => {
  const service = fc.record({
    loadIndex: fc.option(fc.integer({ min: 0, max: 200 }), { nil: null }),
    dualLoadIndex: fc.option(fc.integer({ min: 0, max: 200 }), { nil: null }),
    speedSymbol: fc.option(fc.constantFrom(...SPEED_SYMBOLS.map((s) => s.symbol)), { nil: null }),
    reinforced: fc.boolean(),
  });
  const metric = fc
    .record({
      prefix: fc.constantFrom(null, "P", "LT", "T", "ST"),
      widthMm: fc.integer({ min: 10, max: 45 }).map((n) => n * 10 + 5),
      aspectRatio: fc.integer({ min: 4, max: 19 }).map((n) => n * 5),
      construction: fc.constantFrom("R", "D", "B"),
      zr: fc.boolean(),
      rimIn: fc.oneof(fc.integer({ min: 10, max: 30 }), fc.constantFrom(16.5, 17.5)),
      commercial: fc.boolean(),
    })
    .map((m) => ({ ...m, construction: m.zr ? "R" : m.construction }));
  const flotation = fc.record({
    overallDiameterIn: fc.integer({ min: 26, max: 44 }),
    sectionWidthIn: fc.constantFrom(8.5, 9.5, 10.5, 11, 12.5, 13.5),
    construction: fc.constantFrom("R", "D", "B"),
    rimIn: fc.integer({ min: 15, max: 24 }),
    lightTruck: fc.boolean(),
  });
  // The dual index only exists beside a single index, and "(Y)" needs one to sit in the parentheses.
  const tidy = <T extends { loadIndex: number | null; dualLoadIndex: number | null; speedSymbol: string | null }>(x: T): T => ({
    ...x,
    dualLoadIndex: x.loadIndex === null ? null : x.dualLoadIndex,
    speedSymbol: x.speedSymbol === "(Y)" && x.loadIndex === null ? "Y" : x.speedSymbol,
  });
  const sizes: fc.Arbitrary<TireSize> = fc.oneof(
    fc.tuple(metric, service).map(([m, s]) => tidy({ system: "metric" as const, ...m, ...s }) as TireSize),
    fc.tuple(flotation, service).map(([f, s]) => tidy({ system: "flotation" as const, ...f, ...s }) as TireSize),
  );

  it("for tire sizes", () => {
    fc.assert(
      fc.property(sizes, (size) => {
        const text = formatTireSize(size);
        const back = parseTireSize(text);
        expect(back, text).toEqual({ ok: true, size });
      }),
      { numRuns: 1000 },
    );
  });

  it("for DOT date codes (week and year back from the written code) [sec: 574.5 week rule]", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2000, max: 2099 }), fc.integer({ min: 1, max: 53 }), (year, w) => {
        const week = Math.min(w, dotWeeksInYear(year));
        const r = decodeDotCode(formatDotDateCode(week, year), { today: "2101-01-01" });
        expect(r).toMatchObject({ ok: true, week, year });
      }),
    );
  });
});

describe("property: a projection never predicts a date before the last reading", () => {
  const reading = fc.record({
    date: isoDate,
    odometerKm: fc.oneof(fc.integer({ min: 0, max: 300_000 }), fc.constant(50_000)),
    depthMm: fc.double({ min: 0, max: 12, noNaN: true }),
  });
  it("for arbitrary, unsorted, noisy readings and odometer histories", () => {
    fc.assert(
      fc.property(
        fc.array(reading, { minLength: 1, maxLength: 8 }),
        fc.array(fc.record({ date: isoDate, odometerKm: fc.integer({ min: 0, max: 300_000 }) }), { maxLength: 6 }),
        fc.double({ min: 0.5, max: 8, noNaN: true }),
        (readings, odometerHistory, limitMm) => {
          const today = "2046-01-01";
          const r = projectWear(readings, { limitMm, today, odometerHistory });
          expect(r.ok).toBe(true);
          if (!r.ok || r.projectedDate === null) return;
          const lastDate = readings.map((x) => x.date).sort().at(-1)!;
          expect(r.projectedDate >= lastDate).toBe(true);
          expect(Number.isFinite(r.projectedOdometerKm)).toBe(true);
          expect(r.projectedDate).toMatch(/^\d{4}-\d{2}-\d{2}$/);
        },
      ),
      { numRuns: 1000 },
    );
  });
});
