import { describe, expect, it } from "vitest";
import {
  axlePattern,
  AXLE_DIFFERENCE_THRESHOLD_MM,
  distancePerDay,
  leastSquares,
  projectWear,
  UNEVEN_WEAR_THRESHOLD_MM,
  wearPattern,
} from "@/lib/tires";

const today = "2025-06-01";

describe("wear projection", () => {
  // A tire losing exactly 0.1 mm per 1,000 km, driven 50 km a day from 2024-01-01.
  const day = (n: number) => new Date(Date.UTC(2024, 0, 1 + n)).toISOString().slice(0, 10);
  const linear = [0, 100, 200, 300].map((n) => ({ date: day(n), odometerKm: 20_000 + 50 * n, depthMm: 8 - 0.0001 * 50 * n }));

  it("least squares on exact data: rate, projected odometer and date follow from the line", () => {
    const r = projectWear(linear, { limitMm: 3, today });
    if (!r.ok) throw new Error(r.error);
    expect(r.method).toBe("least-squares");
    expect(r.wearMmPer1000Km).toBeCloseTo(0.1, 9);
    expect(r.kmPerDay).toBeCloseTo(50, 9);
    // 8 mm → 3 mm at 0.1 mm/1,000 km = 50,000 km from 20,000 km.
    expect(r.projectedOdometerKm).toBeCloseTo(70_000, 3);
    // At day 300 the odometer reads 35,000 km: 35,000 km left at 50 km/day = 700 days later, day 1000.
    expect(r.projectedDate).toBe(day(1000));
    expect(r.confidence).toMatchObject({ level: "high", points: 4 });
    expect(r.confidence.rSquared).toBeCloseTo(1, 12);
    expect(r.measurementNoise).toBe(false);
    expect(r.estimatedToday.odometerKm).toBeGreaterThan(35_000);
  });

  it("unsorted input gives the same result as sorted input", () => {
    const shuffled = [linear[2], linear[0], linear[3], linear[1]];
    expect(projectWear(shuffled, { limitMm: 3, today })).toEqual(projectWear(linear, { limitMm: 3, today }));
  });

  it("takes a distance per day computed once for the vehicle instead of re-reading the history", () => {
    // The same line, but the vehicle's rate is given as 100 km a day: 35,000 km left take 350 days from day 300.
    const r = projectWear(linear, { limitMm: 3, today, kmPerDay: 100, odometerHistory: [{ date: day(0), odometerKm: 0 }] });
    if (!r.ok) throw new Error(r.error);
    expect(r.kmPerDay).toBe(100);
    expect(r.projectedDate).toBe(day(650));
    // The vehicle's rate computed by distancePerDay and handed in gives what the history gives when it holds the same points.
    const history = linear.map((x) => ({ date: x.date, odometerKm: x.odometerKm }));
    const once = distancePerDay(history);
    const given = projectWear(linear, { limitMm: 3, today, kmPerDay: once.kmPerDay });
    const computed = projectWear(linear, { limitMm: 3, today });
    expect(given.ok && computed.ok && given.projectedDate === computed.projectedDate).toBe(true);
    // Not a number: ignored, the history decides.
    const ignored = projectWear(linear, { limitMm: 3, today, kmPerDay: Number.NaN });
    expect(ignored.ok && ignored.kmPerDay).toBeCloseTo(50, 9);
  });

  it("uses the odometer history for distance per day", () => {
    const two = linear.slice(0, 2);
    const history = [
      { date: day(0), odometerKm: 20_000 },
      { date: day(200), odometerKm: 40_000 }, // 100 km a day
    ];
    const r = projectWear(two, { limitMm: 3, today, odometerHistory: history });
    expect(r.ok && r.kmPerDay).toBeGreaterThan(50);
    expect(r.ok && r.confidence.level).toBe("low"); // two points always fit a line exactly
  });

  it("[sec: technical inspection body, trade-facts §6] one reading → typical rate of 1 mm per 10,000 km, labelled", () => {
    const r = projectWear([{ date: "2025-01-01", odometerKm: 30_000, depthMm: 7 }], {
      limitMm: 3,
      today,
      odometerHistory: [
        { date: "2024-01-01", odometerKm: 18_000 },
        { date: "2025-01-01", odometerKm: 30_000 },
      ],
    });
    expect(r).toMatchObject({ ok: true, method: "typical-rate", wearMmPer1000Km: 0.1, projectedOdometerKm: 70_000 });
    expect(r.ok && r.confidence.level).toBe("low");
    expect(r.ok && r.notes.join(" ")).toMatch(/typical rate/);
  });

  it("equal odometers: no division by zero, typical rate", () => {
    const r = projectWear(
      [
        { date: "2025-01-01", odometerKm: 30_000, depthMm: 7 },
        { date: "2025-01-02", odometerKm: 30_000, depthMm: 6.8 },
      ],
      { limitMm: 3, today },
    );
    expect(r).toMatchObject({ ok: true, method: "typical-rate", kmPerDay: 0, projectedDate: null });
    expect(r.ok && r.lastReading.depthMm).toBe(6.8);
  });

  it("rising depth is flagged as measurement noise and never postpones the forecast", () => {
    const r = projectWear(
      [
        { date: "2024-06-01", odometerKm: 10_000, depthMm: 6 },
        { date: "2025-01-01", odometerKm: 20_000, depthMm: 7 },
      ],
      { limitMm: 3, today },
    );
    expect(r).toMatchObject({ ok: true, measurementNoise: true, method: "typical-rate" });
    expect(r.ok && r.projectedOdometerKm).toBeCloseTo(60_000, 6);
  });

  it("a car that is not driven: odometer projected, no date, no crash", () => {
    const r = projectWear(linear, {
      limitMm: 3,
      today,
      odometerHistory: [],
    });
    expect(r.ok).toBe(true);
    const parked = projectWear(
      [
        { date: "2024-01-01", odometerKm: 5_000, depthMm: 7 },
        { date: "2024-06-01", odometerKm: 5_000, depthMm: 7 },
      ],
      { limitMm: 3, today },
    );
    expect(parked).toMatchObject({ ok: true, projectedDate: null, kmPerDay: 0 });
    expect(parked.ok && parked.notes.join(" ")).toMatch(/no driving/);
  });

  it("already at the limit: the date is the last reading, never earlier", () => {
    const r = projectWear(
      [
        { date: "2024-01-01", odometerKm: 10_000, depthMm: 4 },
        { date: "2025-01-01", odometerKm: 25_000, depthMm: 2.5 },
      ],
      { limitMm: 3, today },
    );
    expect(r).toMatchObject({ ok: true, alreadyAtLimit: true, projectedDate: "2025-01-01", projectedOdometerKm: 25_000 });
  });

  it("drops unusable readings and refuses when nothing is left", () => {
    const r = projectWear(
      [
        { date: "2025-13-01", odometerKm: 1, depthMm: 7 },
        { date: "2030-01-01", odometerKm: 99_000, depthMm: 1 }, // after today
        { date: "2025-01-01", odometerKm: Number.NaN, depthMm: 7 },
        { date: "2025-01-01", odometerKm: 1000, depthMm: 7 },
      ],
      { limitMm: 3, today },
    );
    expect(r).toMatchObject({ ok: true, confidence: { points: 1 } });
    expect(projectWear([], { limitMm: 3, today })).toMatchObject({ ok: false, code: "no-readings" });
    expect(projectWear(null as never, { limitMm: 3, today })).toMatchObject({ ok: false, code: "no-readings" });
    expect(projectWear(linear, { limitMm: 0, today })).toMatchObject({ ok: false, code: "bad-limit" });
    expect(projectWear(linear, { limitMm: 3, today: "" })).toMatchObject({ ok: false, code: "bad-today" });
  });

  it("confidence falls with scatter", () => {
    const scattered = [
      { date: "2024-01-01", odometerKm: 10_000, depthMm: 8 },
      { date: "2024-04-01", odometerKm: 14_000, depthMm: 6.5 },
      { date: "2024-07-01", odometerKm: 18_000, depthMm: 7.6 },
      { date: "2024-10-01", odometerKm: 22_000, depthMm: 6.0 },
    ];
    const r = projectWear(scattered, { limitMm: 3, today });
    expect(r.ok && r.confidence.rSquared).toBeLessThan(0.9);
    expect(r.ok && r.confidence.level).not.toBe("high");
  });

  it("helpers: least squares needs varying x; distance per day ignores bad entries and treats a falling odometer as not driven", () => {
    expect(leastSquares([{ x: 1, y: 1 }])).toBeNull();
    expect(leastSquares([{ x: 1, y: 1 }, { x: 1, y: 2 }])).toBeNull();
    expect(leastSquares([{ x: 0, y: 1 }, { x: 2, y: 1 }])).toMatchObject({ slope: 0, rSquared: 1 });
    expect(distancePerDay([{ date: "2025-01-01", odometerKm: 100 }, { date: "bad", odometerKm: 5 }, { date: "2025-01-11", odometerKm: 600 }])).toEqual({
      kmPerDay: 50,
      points: 2,
      method: "least-squares",
    });
    expect(distancePerDay([{ date: "2025-01-01", odometerKm: 900 }, { date: "2025-01-11", odometerKm: 600 }]).kmPerDay).toBe(0);
    expect(distancePerDay(undefined as never)).toEqual({ kmPerDay: 0, points: 0, method: "none" });
  });
});

describe("wear patterns [pub: TM 9-2610-200-14 §2-18; thresholds practice]", () => {
  it("threshold constants are named and modest [practice]", () => {
    expect(UNEVEN_WEAR_THRESHOLD_MM).toBe(1);
    expect(AXLE_DIFFERENCE_THRESHOLD_MM).toBe(1.5);
  });
  it.each([
    [{ innerMm: 5, centreMm: 6.5, outerMm: 5.2 }, "under-inflation"],
    [{ innerMm: 6.5, centreMm: 5, outerMm: 6.4 }, "over-inflation"],
    [{ innerMm: 4, centreMm: 5.8, outerMm: 6.2 }, "inner-shoulder"],
    [{ innerMm: 6.2, centreMm: 5.8, outerMm: 4 }, "outer-shoulder"],
    [{ innerMm: 6, centreMm: 6.4, outerMm: 5.8 }, "even"],
  ] as const)("[pub: TM 9-2610-200-14 §2-18] %o → %s", (tire, pattern) => {
    const r = wearPattern(tire);
    expect(r).toMatchObject({ ok: true, pattern });
    expect(r.ok && r.source).toMatch(/TM 9-2610-200-14/);
  });
  it("needs all three grooves; threshold is a parameter", () => {
    expect(wearPattern({ innerMm: 5, centreMm: 6 })).toMatchObject({ ok: false, code: "too-few-grooves" });
    expect(wearPattern({ innerMm: 5.9, centreMm: 6.2, outerMm: 6.4 })).toMatchObject({ pattern: "even" });
    expect(wearPattern({ innerMm: 5.9, centreMm: 6.2, outerMm: 6.4 }, { thresholdMm: 0.3 })).toMatchObject({ pattern: "inner-shoulder" });
  });

  it("front/rear difference → rotation advice; alignment and inflation notes", () => {
    const r = axlePattern({
      tires: [
        { position: "front-left", innerMm: 3.5, centreMm: 5, outerMm: 5.2 },
        { position: "front-right", innerMm: 3.6, centreMm: 5.1, outerMm: 5.0 },
        { position: "rear-left", innerMm: 7, centreMm: 7, outerMm: 7 },
        { position: "rear-right", innerMm: 5.5, centreMm: 7, outerMm: 5.6 },
        { position: "spare", innerMm: 8, centreMm: 8, outerMm: 8 },
      ],
    });
    if (!r.ok) throw new Error(r.error);
    expect(r.frontAverageMm).toBeCloseTo(3.55, 9);
    expect(r.rearAverageMm).toBeCloseTo(6.25, 9);
    expect(r.rotate).toBe(true);
    expect(r.tires).toHaveLength(4);
    expect(r.advice.join(" ")).toMatch(/front tires are 2.7 mm shallower/);
    expect(r.advice.join(" ")).toMatch(/alignment/);
    expect(r.advice.join(" ")).toMatch(/pressures/);
  });
  it("even axles: no rotation; one axle missing is refused", () => {
    const even = axlePattern({ tires: [{ position: "front-left", centreMm: 6 }, { position: "rear-right", centreMm: 5.8 }] });
    expect(even).toMatchObject({ ok: true, rotate: false, advice: [] });
    const rearWorn = axlePattern({ tires: [{ position: "front-left", centreMm: 7 }, { position: "rear-left", centreMm: 5 }] });
    expect(rearWorn.ok && rearWorn.advice[0]).toMatch(/rear tires/);
    expect(axlePattern({ tires: [{ position: "front-left", centreMm: 6 }, { position: "rear-left" }] })).toMatchObject({ ok: false, code: "need-both-axles" });
    expect(axlePattern(null as never)).toMatchObject({ ok: false });
  });
});
