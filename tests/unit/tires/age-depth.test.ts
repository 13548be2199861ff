import { describe, expect, it } from "vitest";
import {
  AGE_THRESHOLDS,
  ageCondition,
  CAUTION,
  DEPTH_LIMITS,
  depthCondition,
  depthLimit,
  easterSunday,
  MM_PER_THIRTY_SECOND,
  mmToThirtySeconds,
  thirtySecondsToMm,
  tireAge,
  tireDepth,
  worseCondition,
} from "@/lib/tires";

describe("tire age", () => {
  it("calendar age in years, months and days from the manufacture week", () => {
    expect(tireAge("2018-11-11", { today: "2025-06-01" })).toMatchObject({ ok: true, years: 6, months: 6, days: 21 });
    expect(tireAge("2020-01-31", { today: "2020-03-01" })).toMatchObject({ ok: true, years: 0, months: 1, days: 1 });
    expect(tireAge("2024-02-29", { today: "2025-02-28" })).toMatchObject({ ok: true, years: 1, months: 0, days: 0, totalDays: 365 });
    expect(tireAge("2025-06-01", { today: "2025-06-01" })).toMatchObject({ ok: true, years: 0, months: 0, days: 0, totalDays: 0 });
  });

  it("refuses bad dates and a today before manufacture", () => {
    expect(tireAge("2018-02-30", { today: "2025-06-01" })).toMatchObject({ ok: false, code: "bad-date" });
    expect(tireAge("2018-01-01", { today: "soon" })).toMatchObject({ ok: false, code: "bad-today" });
    expect(tireAge("2026-01-01", { today: "2025-06-01" })).toMatchObject({ ok: false, code: "before-manufacture" });
  });
});

describe("age condition — common practice [practice] (trade-facts §3)", () => {
  it("[practice] summer/all-season/all-weather: watch from 5 years, replace at 10", () => {
    for (const kind of ["summer", "all-season", "all-weather"] as const) {
      expect(AGE_THRESHOLDS[kind]).toMatchObject({ watchYears: 5, replaceYears: 10 });
    }
  });

  it("[practice] winter tires: keep about 4–5 years, replace past 6", () => {
    expect(AGE_THRESHOLDS.winter.watchYears).toBeGreaterThanOrEqual(4);
    expect(AGE_THRESHOLDS.winter.watchYears).toBeLessThanOrEqual(5);
    expect(AGE_THRESHOLDS.winter.replaceYears).toBe(6);
  });

  const start = "2015-01-04";
  it.each([
    ["2019-12-31", "good", { level: "watch", date: "2020-01-04" }],
    ["2020-01-04", "watch", { level: "plan", date: "2024-07-04" }],
    ["2024-07-04", "plan", { level: "replace", date: "2025-01-04" }],
    ["2025-01-04", "replace", null],
  ] as const)("[practice 5/10 years, plan lead 6 months] summer tire from %s is %s", (today, level, next) => {
    const r = ageCondition({ manufactureWeekStart: start, kind: "summer", today });
    expect(r).toMatchObject({ ok: true, level, watchFrom: "2020-01-04", planFrom: "2024-07-04", replaceFrom: "2025-01-04", next });
    expect(r.ok && r.caution).toBe(CAUTION);
  });

  it("[practice] a winter tire is replaced at 6 years, watched from 4", () => {
    const r = ageCondition({ manufactureWeekStart: start, kind: "winter", today: "2021-01-04" });
    expect(r).toMatchObject({ ok: true, level: "replace", watchFrom: "2019-01-04", replaceFrom: "2021-01-04" });
  });

  it("per-set overrides and the lead time are parameters", () => {
    const r = ageCondition({
      manufactureWeekStart: start,
      kind: "summer",
      today: "2020-06-01",
      overrides: { watchYears: 4, replaceYears: 6, planLeadMonths: 12, },
    });
    expect(r).toMatchObject({ ok: true, level: "plan", watchFrom: "2019-01-04", planFrom: "2020-01-04", replaceFrom: "2021-01-04" });
    // A lead longer than the watch window starts "plan" no earlier than "watch".
    const r2 = ageCondition({ manufactureWeekStart: start, kind: "summer", today: "2016-01-01", overrides: { planLeadMonths: 100 } });
    expect(r2).toMatchObject({ ok: true, level: "good", planFrom: "2020-01-04" });
    expect(
      ageCondition({ manufactureWeekStart: start, kind: "summer", today: "2020-06-01", overrides: { watchYears: undefined } }),
    ).toMatchObject({ ok: true, thresholds: { watchYears: 5 } });
  });

  it("[sec: trade-facts §1] a decade-ambiguous (3-digit) code is always replace", () => {
    const r = ageCondition({ manufactureWeekStart: "1991-01-20", kind: "summer", today: "1993-01-01", precision: "decade-ambiguous" });
    expect(r).toMatchObject({ ok: true, level: "replace", next: null });
  });

  it("refuses bad kinds, thresholds and dates", () => {
    expect(ageCondition({ manufactureWeekStart: start, kind: "racing" as never, today: "2020-01-01" })).toMatchObject({ ok: false, code: "bad-kind" });
    expect(
      ageCondition({ manufactureWeekStart: start, kind: "summer", today: "2020-01-01", overrides: { watchYears: 12 } }),
    ).toMatchObject({ ok: false, code: "bad-threshold" });
    expect(
      ageCondition({ manufactureWeekStart: start, kind: "summer", today: "2020-01-01", overrides: { replaceYears: Number.NaN } }),
    ).toMatchObject({ ok: false, code: "bad-threshold" });
    expect(ageCondition({ manufactureWeekStart: "x", kind: "summer", today: "2020-01-01" })).toMatchObject({ ok: false, code: "bad-date" });
    // Values that are not kinds but would index an object: found by the no-throw property.
    for (const kind of ["constructor", "__proto__", Object.create(null)]) {
      expect(ageCondition({ manufactureWeekStart: start, kind, today: "2020-01-01" })).toMatchObject({ ok: false, code: "bad-kind" });
    }
  });

  it("worseCondition takes the more severe", () => {
    expect(worseCondition("good", "plan")).toBe("plan");
    expect(worseCondition("replace", "watch")).toBe("replace");
  });
});

describe("tread depth: conversions by the exact inch [pub: international inch, 1 in = 25.4 mm]", () => {
  it("[pub] 1/32 in = 0.79375 mm, 2/32 = 1.5875 mm, 4/32 = 3.175 mm", () => {
    expect(MM_PER_THIRTY_SECOND).toBe(0.79375);
    expect(thirtySecondsToMm(2)).toBe(1.5875);
    expect(thirtySecondsToMm(4)).toBe(3.175);
    expect(mmToThirtySeconds(3.175)).toBe(4);
    expect(mmToThirtySeconds(25.4)).toBe(32);
  });

  it("a tire's depth is its shallowest groove", () => {
    expect(tireDepth({ innerMm: 5.1, centreMm: 6, outerMm: 5.8 })).toMatchObject({ ok: true, depthMm: 5.1, groove: "inner" });
    expect(tireDepth([7, 6.5, null, 8])).toMatchObject({ ok: true, depthMm: 6.5, groove: 1 });
    expect(tireDepth({ centreMm: 4 })).toMatchObject({ ok: true, depthMm: 4, groove: "centre" });
    expect(tireDepth({ innerMm: -1, centreMm: Number.NaN })).toMatchObject({ ok: false, code: "no-reading" });
    expect(tireDepth(null as never)).toMatchObject({ ok: false, code: "no-reading" });
  });
});

describe("depth limit table", () => {
  const at = (jurisdiction: Parameters<typeof depthLimit>[0]["jurisdiction"], season: "summer" | "winter", date: string) =>
    depthLimit({ jurisdiction, season, date });

  it("every row names its source and tag and carries the caution", () => {
    for (const row of DEPTH_LIMITS) {
      expect(row.source.length, row.id).toBeGreaterThan(5);
      expect(["pub", "sec", "practice", "memory"]).toContain(row.tag);
      expect(row.caution).toBe(CAUTION);
    }
  });

  it("[sec: Council Directive 89/459/EEC] EU 1.6 mm", () => {
    expect(at("EU", "summer", "2025-06-01")).toMatchObject({ ok: true, minMm: 1.6, legal: true, tag: "sec" });
  });
  it("[pub: Highway Code annex 6, C&U Regs 1986 reg. 27] UK 1.6 mm", () => {
    expect(at("UK", "winter", "2025-01-10")).toMatchObject({ ok: true, minMm: 1.6, tag: "pub" });
  });
  it("[pub: FMVSS 109/119 wear bars, NHTSA interpretation] US 2/32 in", () => {
    const r = at("US", "summer", "2025-06-01");
    expect(r).toMatchObject({ ok: true, minMm: 1.5875, tag: "pub" });
    expect(r.ok && r.minThirtySeconds).toBeCloseTo(2, 12);
  });
  it("[sec] Germany keeps 1.6 mm all year", () => {
    expect(at("DE", "winter", "2025-01-10")).toMatchObject({ ok: true, minMm: 1.6 });
  });

  it("[pub: Traficom] Finland 3 mm from 1 Nov to 31 Mar, EU minimum outside", () => {
    expect(at("FI", "winter", "2024-11-01")).toMatchObject({ minMm: 3, tag: "pub" });
    expect(at("FI", "winter", "2025-03-31")).toMatchObject({ minMm: 3 });
    expect(at("FI", "winter", "2025-04-01")).toMatchObject({ minMm: 1.6 });
    expect(at("FI", "summer", "2024-10-31")).toMatchObject({ minMm: 1.6 });
  });
  it("[pub/sec] Norway 3 mm from 1 Nov to the Monday after Easter Monday; north 16 Oct – 30 Apr", () => {
    // Easter 2025 is 20 April, so the period ends Monday 28 April 2025.
    expect(easterSunday(2025)).toBe("2025-04-20");
    expect(easterSunday(2024)).toBe("2024-03-31");
    expect(at("NO", "winter", "2025-04-28")).toMatchObject({ minMm: 3 });
    expect(at("NO", "winter", "2025-04-29")).toMatchObject({ minMm: 1.6 });
    expect(at("NO", "winter", "2024-10-31")).toMatchObject({ minMm: 1.6 });
    expect(at("NO-north", "winter", "2024-10-16")).toMatchObject({ minMm: 3, tag: "sec" });
    expect(at("NO-north", "winter", "2025-05-01")).toMatchObject({ minMm: 1.6 });
  });
  it("[sec] Sweden 3 mm from 1 Dec to 31 Mar", () => {
    expect(at("SE", "summer", "2024-11-30")).toMatchObject({ minMm: 1.6 });
    expect(at("SE", "summer", "2024-12-01")).toMatchObject({ minMm: 3 });
  });
  it("[sec] Austria 4 mm from 1 Nov to 15 Apr", () => {
    expect(at("AT", "winter", "2025-04-15")).toMatchObject({ minMm: 4 });
    expect(at("AT", "winter", "2025-04-16")).toMatchObject({ minMm: 1.6 });
  });
  it("[sec: road-safety bodies; practice: about 3 mm for snow tires] practice 3 mm summer, 4 mm winter", () => {
    expect(at("practice", "summer", "2025-06-01")).toMatchObject({ minMm: 3, legal: false });
    expect(at("practice", "winter", "2025-06-01")).toMatchObject({ minMm: 4, legal: false });
    // [practice] below about 3 mm a snow tire is no longer a safe winter tire: the winter row is stricter.
    const winter = DEPTH_LIMITS.find((r) => r.id === "practice-winter-4");
    expect(winter?.minMm).toBeGreaterThan(3);
  });
  it("custom limit, and refusals", () => {
    expect(depthLimit({ jurisdiction: "custom", season: "summer", date: "2025-06-01", customMm: 2.5 })).toMatchObject({
      ok: true,
      minMm: 2.5,
      tag: "custom",
      row: null,
    });
    expect(depthLimit({ jurisdiction: "custom", season: "summer", date: "2025-06-01" })).toMatchObject({ ok: false, code: "bad-custom" });
    expect(depthLimit({ jurisdiction: "XX" as never, season: "summer", date: "2025-06-01" })).toMatchObject({ ok: false, code: "bad-jurisdiction" });
    expect(depthLimit({ jurisdiction: "EU", season: "spring" as never, date: "2025-06-01" })).toMatchObject({ ok: false, code: "bad-season" });
    expect(depthLimit({ jurisdiction: "EU", season: "summer", date: "2025-6-1" })).toMatchObject({ ok: false, code: "bad-date" });
  });
});

describe("depth condition with named margins", () => {
  it.each([
    [6.0, "good"],
    [5.0, "watch"],
    [4.0, "plan"],
    [3.0, "replace"],
    [2.2, "replace"],
  ] as const)("%s mm against a 3 mm limit is %s (plan at +1 mm, watch at +2 mm)", (depthMm, level) => {
    const r = depthCondition({ depthMm, limitMm: 3 });
    expect(r).toMatchObject({ ok: true, level, planBelowMm: 4, watchBelowMm: 5 });
    expect(r.ok && r.caution).toBe(CAUTION);
  });
  it("margins are parameters and are checked", () => {
    expect(depthCondition({ depthMm: 4.5, limitMm: 1.6, planMarginMm: 3, watchMarginMm: 4 })).toMatchObject({ level: "plan" });
    expect(depthCondition({ depthMm: 4.5, limitMm: 1.6, planMarginMm: 3, watchMarginMm: 2 })).toMatchObject({ ok: false, code: "bad-margin" });
    expect(depthCondition({ depthMm: Number.NaN, limitMm: 1.6 })).toMatchObject({ ok: false, code: "bad-depth" });
    expect(depthCondition({ depthMm: 3, limitMm: 0 })).toMatchObject({ ok: false, code: "bad-limit" });
  });
});
