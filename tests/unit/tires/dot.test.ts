import { addDays, addWeeks, differenceInCalendarDays, format, getDay, nextSunday, startOfYear } from "date-fns";
import { describe, expect, it } from "vitest";
import { decodeDotCode, dotWeekOf, dotWeeksInYear, dotWeekStart, formatDotDateCode } from "@/lib/tires";

const today = "2025-06-01";

function ok<T extends { ok: boolean }>(r: T): Extract<T, { ok: true }> {
  if (!r.ok) throw new Error(`expected ok, got ${JSON.stringify(r)}`);
  return r as Extract<T, { ok: true }>;
}

describe("DOT date code, 49 CFR 574.5 week rule", () => {
  it("[sec, quoting eCFR 574.5(b)(3)] the regulation's example: 0109 = Sun 4 Jan – Sat 10 Jan 2009", () => {
    const r = ok(decodeDotCode("0109", { today }));
    expect(r).toMatchObject({ week: 1, year: 2009, weekStart: "2009-01-04", weekEnd: "2009-01-10", precision: "week" });
  });

  it.each([
    // trade-facts §1, computed from the 574.5 rule [sec]
    ["0722", "2022-02-13", "2022-02-19"],
    ["2523", "2023-06-18", "2023-06-24"],
    ["5323", "2023-12-31", "2024-01-06"],
    ["0124", "2024-01-07", "2024-01-13"],
    ["5224", "2024-12-29", "2025-01-04"],
  ])("[sec: trade-facts §1 week examples] %s = %s to %s", (code, start, end) => {
    const r = ok(decodeDotCode(code, { today }));
    expect([r.weekStart, r.weekEnd]).toEqual([start, end]);
  });

  it("[sec: trade-facts §1] 1–6 Jan 2024 belong to week 53 of 2023", () => {
    expect(dotWeekOf("2024-01-01")).toEqual({ week: 53, year: 2023 });
    expect(dotWeekOf("2024-01-06")).toEqual({ week: 53, year: 2023 });
    expect(dotWeekOf("2024-01-07")).toEqual({ week: 1, year: 2024 });
    expect(dotWeekOf("not a date")).toBeNull();
  });

  it("[sec: trade-facts §1] 53-week years 2000–2040 are exactly 2000, 2006, 2012, 2017, 2023, 2028, 2034 (and 2040)", () => {
    const long: number[] = [];
    for (let y = 2000; y <= 2040; y++) if (dotWeeksInYear(y) === 53) long.push(y);
    // 2040 is past the list in trade-facts; 1 Jan 2040 is a Sunday, so it also has 53 Sundays.
    expect(long).toEqual([2000, 2006, 2012, 2017, 2023, 2028, 2034, 2040]);
  });

  it("[sec: trade-facts §1] 5324 does not exist: a week-53 code in a 52-week year is invalid", () => {
    const r = decodeDotCode("5324", { today });
    expect(r).toMatchObject({ ok: false, code: "week-out-of-range" });
    expect(!r.ok && r.error).toMatch(/does not exist in 2024: that year has 52 weeks/);
  });

  it("[sec: trade-facts §1] invalid codes each get their own reason", () => {
    const cases: [string, string][] = [
      ["0018", "week-zero"],
      ["5418", "week-out-of-range"],
      ["4O18", "letters-in-date"],
      ["DOT U2LL LMLR 45I8", "letters-in-date"],
      ["451", "week-out-of-range"], // week 45 fine; see next line for week 54 in a 3-digit code
      ["12345", "wrong-length"],
      ["DOT U2 LL 4518 9999 00", "wrong-length"],
      ["", "empty"],
      ["DOT", "empty"],
      ["45#8", "bad-characters"],
      ["U24518", "wrong-length"],
      ["ABCDEFG", "wrong-length"],
    ];
    expect(decodeDotCode("451", { today }).ok).toBe(true);
    expect(decodeDotCode("541", { today })).toMatchObject({ ok: false, code: "week-out-of-range" });
    for (const [input, code] of cases.filter(([i]) => i !== "451")) {
      const r = decodeDotCode(input, { today });
      expect(r, input).toMatchObject({ ok: false, code });
      expect(!r.ok && r.error.length, input).toBeGreaterThan(20);
    }
  });

  it("[sec: trade-facts §1] a week that starts after today is refused, the current week is accepted", () => {
    // 2225 = week 22 of 2025, starting Sun 1 Jun 2025.
    expect(ok(decodeDotCode("2225", { today: "2025-06-01" })).weekStart).toBe("2025-06-01");
    expect(decodeDotCode("2225", { today: "2025-05-31" })).toMatchObject({ ok: false, code: "future-week" });
    expect(decodeDotCode("0199", { today })).toMatchObject({ ok: false, code: "future-week" });
  });

  it("refuses a missing or malformed today and non-text input", () => {
    expect(decodeDotCode("0109", { today: "2025-13-01" })).toMatchObject({ ok: false, code: "bad-today" });
    expect(decodeDotCode(4518 as unknown as string, { today })).toMatchObject({ ok: false, code: "not-text" });
    expect(decodeDotCode("0109", undefined as unknown as { today: string })).toMatchObject({ ok: false, code: "bad-today" });
  });

  it("[sec: trade-facts §1] 3-digit pre-2000 codes are decade-ambiguous", () => {
    const r = ok(decodeDotCode("031", { today }));
    expect(r.precision).toBe("decade-ambiguous");
    expect(r.yearCandidates).toEqual([1981, 1991]);
    expect(r.week).toBe(3);
    // Week 53 exists in 1989 (1 Jan 1989 was a Sunday) but not in 1999: only one candidate remains.
    expect(ok(decodeDotCode("539", { today })).yearCandidates).toEqual([1989]);
  });

  it("[pub: 80 FR 19553 layout, sec: details] reads full TINs in any case and spacing, with the plant code", () => {
    const old = ok(decodeDotCode("DOT U2LL LMLR 4518", { today }));
    expect(old).toMatchObject({ layout: "pre-2015", plantCode: "U2", manufacturerCode: "LLLMLR", week: 45, year: 2018 });
    expect(old.weekStart).toBe("2018-11-11");
    const lower = ok(decodeDotCode("  dot u2ll-lmlr   4518 ", { today }));
    expect(lower.normalized).toBe("U2LLLMLR4518");
    // 2015 layout: 3-symbol plant code + 6-symbol manufacturer's code + 4-digit date = 13 symbols.
    const neu = ok(decodeDotCode("DOT 7AB CDEFHJ 0722", { today }));
    expect(neu).toMatchObject({ layout: "2015", plantCode: "7AB", manufacturerCode: "CDEFHJ", weekStart: "2022-02-13" });
    const noPrefix = ok(decodeDotCode("7ABCDEFHJ0722", { today }));
    expect(noPrefix.plantCode).toBe("7AB");
    const bare = ok(decodeDotCode("dot 4518", { today }));
    expect(bare.layout).toBe("date-code-only");
    expect(bare.plantCode).toBeUndefined();
    // An old TIN with a 3-digit date code.
    const pre2000 = ok(decodeDotCode("DOT AB CD EF 031", { today }));
    expect(pre2000).toMatchObject({ precision: "decade-ambiguous", plantCode: "AB" });
  });

  it("formatDotDateCode writes week and two-digit year", () => {
    expect(formatDotDateCode(1, 2009)).toBe("0109");
    expect(formatDotDateCode(53, 2023)).toBe("5323");
  });
});

describe("independent cross-check of every week code 2000–2040 with date-fns [sec: 574.5(b)(3) rule]", () => {
  // Built only from date-fns: week 01 starts on the first Sunday on or after 1 January.
  function firstSundayFns(year: number): Date {
    const jan1 = startOfYear(new Date(year, 0, 1));
    return getDay(jan1) === 0 ? jan1 : nextSunday(jan1);
  }

  it("matches week starts, week ends and week counts for every code", () => {
    let checked = 0;
    for (let year = 2000; year <= 2040; year++) {
      const first = firstSundayFns(year);
      const weeks = differenceInCalendarDays(firstSundayFns(year + 1), first) / 7;
      expect(dotWeeksInYear(year), String(year)).toBe(weeks);
      for (let week = 1; week <= 54; week++) {
        const code = formatDotDateCode(week, year);
        const r = decodeDotCode(code, { today: "2041-12-31" });
        if (week > weeks) {
          expect(r, code).toMatchObject({ ok: false, code: "week-out-of-range" });
          continue;
        }
        const start = addWeeks(first, week - 1);
        expect(getDay(start)).toBe(0); // a Sunday
        const got = ok(r);
        expect(got.weekStart, code).toBe(format(start, "yyyy-MM-dd"));
        expect(got.weekEnd, code).toBe(format(addDays(start, 6), "yyyy-MM-dd"));
        expect(dotWeekStart(week, year)).toBe(got.weekStart);
        checked++;
      }
    }
    // 41 years × 52 weeks + 8 long years (2000…2040) = 2140 codes.
    expect(checked).toBe(41 * 52 + 8);
  });
});
