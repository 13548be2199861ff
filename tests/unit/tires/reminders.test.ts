import { describe, expect, it } from "vitest";
import { CAUTION, computeReminders, reminderId, seasonalSwapDate, type LogbookInput, type ReminderItem } from "@/lib/tires";

const today = "2025-06-01";

// Invented data: a household car nicknamed "Pebble" with a mounted summer set and a stored winter set.
function logbook(): LogbookInput {
  return {
    vehicles: [
      {
        id: "veh-1",
        nickname: "Pebble",
        odometerHistory: [
          { date: "2024-06-01", odometerKm: 40_000 },
          { date: "2025-06-01", odometerKm: 51_000 }, // about 30 km a day
        ],
        sets: [
          {
            id: "set-summer",
            name: "Summer set",
            kind: "summer",
            state: "mounted",
            mountedAt: { date: "2025-04-15", odometerKm: 49_000 },
            tires: [
              {
                id: "t1",
                position: "front-left",
                dotCode: "DOT U2LL LMLR 0722", // week of 13 Feb 2022
                readings: [
                  { date: "2024-06-01", odometerKm: 40_000, innerMm: 6.2, centreMm: 6.5, outerMm: 6.4 },
                  { date: "2024-12-01", odometerKm: 45_500, innerMm: 5.6, centreMm: 6.0, outerMm: 5.9 },
                  { date: "2025-05-20", odometerKm: 50_600, innerMm: 5.1, centreMm: 5.5, outerMm: 5.4 },
                ],
              },
              { id: "t2", position: "front-right", dotCode: "4518" }, // oldest: week of 11 Nov 2018
              { id: "t3", position: "rear-left", dotCode: "bad code!" },
            ],
          },
          {
            id: "set-winter",
            kind: "winter",
            state: "stored",
            tires: [{ id: "w1", position: "front-left", manufactureWeekStart: "2021-10-10" }],
          },
          { id: "set-old", kind: "summer", state: "retired", tires: [{ id: "o1", position: "spare", dotCode: "031" }] },
        ],
      },
    ],
  };
}

const byId = (items: ReminderItem[], id: string) => items.find((i) => i.id === id);

describe("computeReminders", () => {
  const r = computeReminders(logbook(), {}, { today });
  if (!r.ok) throw new Error(r.error);
  const items = r.items;

  it("[practice: 5/10 years from the oldest tire] age watch and age replace for the summer set", () => {
    const watch = byId(items, reminderId("veh-1", "set-summer", "age-watch"));
    const replace = byId(items, reminderId("veh-1", "set-summer", "age-replace"));
    expect(watch).toMatchObject({ kind: "age-watch", date: "2023-11-11", severity: "watch", overdue: true, setId: "set-summer" });
    expect(replace).toMatchObject({ kind: "age-replace", date: "2028-11-11", severity: "info", overdue: false });
    expect(replace?.subject).toMatch(/Summer set on Pebble/);
  });

  it("[practice: winter 4/6 years] the stored winter set's age dates", () => {
    expect(byId(items, "veh-1/set-winter/age-watch")).toMatchObject({ date: "2025-10-10", severity: "watch", overdue: false });
    expect(byId(items, "veh-1/set-winter/age-replace")).toMatchObject({ date: "2027-10-10" });
  });

  it("[sec: road-safety bodies' 3 mm for summer tires] projected depth limit for the mounted set", () => {
    const depth = byId(items, "veh-1/set-summer/depth-limit");
    expect(depth).toMatchObject({ kind: "depth-limit", overdue: false });
    // About 0.1 mm per 1,000 km: 5.1 → 3 mm takes roughly 20,000 km, about two years at 30 km a day.
    expect(depth!.date > "2026-06-01" && depth!.date < "2028-01-01").toBe(true);
    expect(depth!.explanation).toMatch(/3 mm limit/);
  });

  it("[sec: trade-facts §6, rotation every 8,000–13,000 km] rotation due 10,000 km after fitting", () => {
    const rot = byId(items, "veh-1/set-summer/rotation-due");
    expect(rot?.subject).toMatch(/59,000 km/);
    // 8,000 km left on 1 Jun 2025 at about 30 km/day: early 2026.
    expect(rot!.date > "2026-01-01" && rot!.date < "2026-04-01").toBe(true);
  });

  it("seasonal swap: the stored winter set is fitted on the next autumn date", () => {
    expect(byId(items, "veh-1/set-winter/seasonal-swap")).toMatchObject({ date: "2025-10-15", severity: "info" });
  });

  it("retired sets give nothing; bad DOT codes are reported, not guessed", () => {
    expect(items.some((i) => i.setId === "set-old")).toBe(false);
    expect(r.skipped).toContainEqual(expect.objectContaining({ tireId: "t3", reason: expect.stringMatching(/DOT code/) }));
  });

  it("every item carries a plain explanation with the caution, and items are sorted by date", () => {
    for (const i of items) {
      expect(i.explanation.endsWith(CAUTION)).toBe(true);
      expect(i.vehicleId).toBe("veh-1");
    }
    expect(items.map((i) => i.date)).toEqual([...items.map((i) => i.date)].sort());
  });

  it("writes dates in the explanation as '11 Nov 2018', never as ISO dates", () => {
    // The week's first day itself is checked against date-fns in dot.test.ts; here only how it is written.
    const age = items.find((i) => i.kind === "age-watch" || i.kind === "age-replace");
    expect(age?.explanation).toMatch(/made in the week of \d{1,2} [A-Z][a-z]{2} 20\d\d\./);
    for (const i of items) expect(i.explanation).not.toMatch(/\d{4}-\d\d-\d\d/);
  });

  it("ids do not change when the dates move", () => {
    const later = computeReminders(logbook(), { rotationIntervalKm: 8_000, autumnSwap: "11-01" }, { today: "2025-07-01" });
    if (!later.ok) throw new Error(later.error);
    const ids = (xs: ReminderItem[]) => xs.map((i) => i.id).sort();
    expect(ids(later.items)).toEqual(ids(items));
    expect(byId(later.items, "veh-1/set-winter/seasonal-swap")?.date).toBe("2025-11-01");
  });
});

describe("seasonal swap dates (dates computed by hand from the chosen month-days)", () => {
  it("a winter set still in storage after the autumn date is overdue since that date", () => {
    expect(seasonalSwapDate(false, "10-15", "04-15", "2026-12-01")).toEqual({ date: "2026-10-15", overdue: true });
    // January: the autumn date of the previous year is still the latest change.
    expect(seasonalSwapDate(false, "10-15", "04-15", "2027-01-20")).toEqual({ date: "2026-10-15", overdue: true });
    expect(seasonalSwapDate(false, "10-15", "04-15", "2026-10-15")).toEqual({ date: "2026-10-15", overdue: false });
  });

  it("a winter set still mounted after the spring date is overdue since that date", () => {
    expect(seasonalSwapDate(true, "10-15", "04-15", "2026-06-10")).toEqual({ date: "2026-04-15", overdue: true });
  });

  it("in the right season the next change date is given", () => {
    expect(seasonalSwapDate(false, "10-15", "04-15", "2026-07-01")).toEqual({ date: "2026-10-15", overdue: false });
    expect(seasonalSwapDate(true, "10-15", "04-15", "2026-12-01")).toEqual({ date: "2027-04-15", overdue: false });
    expect(seasonalSwapDate(true, "10-15", "04-15", "2027-02-01")).toEqual({ date: "2027-04-15", overdue: false });
  });
});

describe("computeReminders: other cases", () => {
  it("a mounted winter set points at the spring swap; a 3-digit code means replace now", () => {
    const r = computeReminders(
      {
        vehicles: [
          {
            id: "v2",
            sets: [
              {
                id: "w",
                kind: "winter",
                state: "mounted",
                lastRotation: { date: "2025-01-01", odometerKm: 1_000 },
                tires: [
                  { id: "a", position: "front-left", dotCode: "0124" },
                  { id: "b", position: "front-right", dotCode: "031" },
                  { id: "c", position: "rear-left", dotCode: "0109" },
                ],
              },
            ],
          },
        ],
      },
      { springSwap: "04-01" },
      { today: "2025-02-01" },
    );
    if (!r.ok) throw new Error(r.error);
    expect(byId(r.items, "v2/w/seasonal-swap")).toMatchObject({ date: "2025-04-01" });
    expect(byId(r.items, "v2/w/seasonal-swap")?.subject).toMatch(/winter set on your vehicle: time to take/);
    const replace = byId(r.items, "v2/w/age-replace");
    expect(replace).toMatchObject({ severity: "replace", overdue: true });
    expect(replace?.explanation).toMatch(/3-digit date code/);
    expect(byId(r.items, "v2/w/age-watch")).toBeUndefined();
    // No odometer history: no rotation date, reported as skipped.
    expect(r.skipped.some((s) => /no driving/.test(s.reason))).toBe(true);
  });

  it("[pub: Traficom] a winter-used set in Finland is held to 3 mm even when computed in summer; per-set limits win", () => {
    const mk = (depthLimitMm?: number): LogbookInput => ({
      vehicles: [
        {
          id: "v3",
          odometerHistory: [
            { date: "2025-01-01", odometerKm: 10_000 },
            { date: "2025-06-01", odometerKm: 15_000 },
          ],
          sets: [
            {
              id: "aw",
              kind: "all-weather",
              state: "mounted",
              depthLimitMm,
              tires: [{ id: "x", position: "rear-right", readings: [{ date: "2025-06-01", odometerKm: 15_000, centreMm: 5 }] }],
            },
          ],
        },
      ],
    });
    const fi = computeReminders(mk(), { jurisdiction: "FI" }, { today: "2025-06-01" });
    expect(fi.ok && byId(fi.items, "v3/aw/depth-limit")?.subject).toMatch(/3 mm/);
    const own = computeReminders(mk(4.5), { jurisdiction: "FI" }, { today: "2025-06-01" });
    expect(own.ok && byId(own.items, "v3/aw/depth-limit")?.subject).toMatch(/4.5 mm/);
    expect(own.ok && byId(own.items, "v3/aw/depth-limit")?.explanation).toMatch(/typical wear rate/);
    const custom = computeReminders(mk(), { jurisdiction: "custom" }, { today: "2025-06-01" });
    expect(custom.ok && custom.skipped.some((s) => /own depth limit/.test(s.reason))).toBe(true);
  });

  it("[sec: road-safety bodies' 3 mm] a tread already at the limit is due from its reading, even with no driving data", () => {
    const mk = (jurisdiction: "practice" | "UK") =>
      computeReminders(
        {
          vehicles: [
            {
              id: "v4",
              sets: [
                {
                  id: "s",
                  kind: "summer",
                  state: "mounted",
                  tires: [{ id: "x", position: "front-left", readings: [{ date: "2025-05-01", odometerKm: 9_000, innerMm: 2.4, centreMm: 3.5 }] }],
                },
              ],
            },
          ],
        },
        { jurisdiction },
        { today: "2025-06-01" },
      );
    const due = mk("practice");
    expect(due.ok && byId(due.items, "v4/s/depth-limit")).toMatchObject({ date: "2025-05-01", severity: "replace", overdue: true });
    // [pub: Highway Code annex 6] 2.4 mm is above the UK's 1.6 mm; with no driving data no date can be projected.
    const uk = mk("UK");
    expect(uk.ok && byId(uk.items, "v4/s/depth-limit")).toBeUndefined();
  });

  it("refuses bad settings, a bad today and a bad logbook; skips unknown set kinds", () => {
    expect(computeReminders({ vehicles: [] }, {}, { today: "x" })).toMatchObject({ ok: false, code: "bad-today" });
    expect(computeReminders({ vehicles: [] }, { autumnSwap: "02-30" }, { today })).toMatchObject({ ok: false, code: "bad-settings" });
    expect(computeReminders({ vehicles: [] }, { rotationIntervalKm: 0 }, { today })).toMatchObject({ ok: false, code: "bad-settings" });
    expect(computeReminders({ vehicles: [] }, { jurisdiction: "XX" as never }, { today })).toMatchObject({ ok: false, code: "bad-settings" });
    expect(computeReminders(null as never, {}, { today })).toMatchObject({ ok: false, code: "bad-logbook" });
    const odd = computeReminders({ vehicles: [{ id: "v", sets: [{ id: "s", kind: "racing" as never, state: "stored", tires: [] }] }] }, {}, { today });
    expect(odd).toMatchObject({ ok: true, items: [] });
    expect(odd.ok && odd.skipped[0].reason).toMatch(/kind/);
  });

  it("ids are URL-safe even for odd ids", () => {
    expect(reminderId("a/b", "c d", "rotation-due")).toBe("a%2Fb/c%20d/rotation-due");
  });
});
