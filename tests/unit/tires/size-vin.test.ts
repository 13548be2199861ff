import { describe, expect, it } from "vitest";
import {
  checkFit,
  formatTireSize,
  LOAD_INDEX_KG,
  loadIndexKg,
  overallDiameter,
  parseTireSize,
  SPEED_SYMBOLS,
  speedSymbolKmh,
  validateVin,
  vinCheckDigit,
} from "@/lib/tires";

const ARRETE = "French Arrêté of 24 Oct 1994, annex II (= ETRTO / UN R30)";

describe(`load index → kg [pub: ${ARRETE}]`, () => {
  // Spot values copied by hand from the published table; the tests never read the reference CSV.
  const rows: [number, number][] = [
    [0, 45], [1, 46.2], [3, 48.7], [7, 54.5], [12, 63], [19, 77.5], [25, 92.5], [29, 103],
    [36, 125], [41, 145], [53, 206], [58, 236], [60, 250], [62, 265], [70, 335], [75, 387],
    [79, 437], [84, 500], [88, 560], [91, 615], [94, 670], [95, 690], [99, 775], [100, 800],
    [109, 1030], [115, 1215], [120, 1400], [121, 1450], [133, 2060], [141, 2575], [147, 3075],
    [155, 3875], [163, 4875], [169, 5800], [179, 7750], [188, 10000], [189, 10300], [195, 12150], [200, 14000],
  ];
  it.each(rows)(`[pub: ${ARRETE}] LI %i = %d kg`, (li, kg) => {
    expect(loadIndexKg(li)).toEqual({ ok: true, loadIndex: li, kg });
  });

  it("[sec: secondary load-index tables; a copy of the published table reads 240] LI 59 = 243 kg", () => {
    expect(loadIndexKg(59)).toMatchObject({ kg: 243 });
  });

  it("the table covers 0–200 and rises strictly", () => {
    expect(LOAD_INDEX_KG).toHaveLength(201);
    for (let i = 1; i <= 200; i++) expect(LOAD_INDEX_KG[i], String(i)).toBeGreaterThan(LOAD_INDEX_KG[i - 1]);
  });

  it("accepts a numeric string, refuses the rest", () => {
    expect(loadIndexKg(" 94 ")).toMatchObject({ ok: true, kg: 670 });
    for (const bad of [-1, 201, 94.5, "9a", null, Number.NaN]) expect(loadIndexKg(bad)).toMatchObject({ ok: false, code: "bad-load-index" });
  });
});

describe("speed symbols", () => {
  const published: [string, number][] = [
    ["F", 80], ["G", 90], ["J", 100], ["K", 110], ["L", 120], ["M", 130], ["N", 140], ["P", 150],
    ["Q", 160], ["R", 170], ["S", 180], ["T", 190], ["U", 200], ["H", 210], ["V", 240],
  ];
  it.each(published)(`[pub: ${ARRETE}] %s = %i km/h`, (sym, kmh) => {
    expect(speedSymbolKmh(sym)).toMatchObject({ ok: true, kmh, tag: "pub" });
  });
  it.each([["W", 270, false], ["Y", 300, false], ["(Y)", 300, true]] as const)("[memory] %s = %i km/h", (sym, kmh, orAbove) => {
    expect(speedSymbolKmh(sym)).toMatchObject({ ok: true, kmh, orAbove, tag: "memory" });
  });
  it("knows exactly these symbols, any case", () => {
    expect(SPEED_SYMBOLS).toHaveLength(published.length + 3);
    expect(speedSymbolKmh(" v ")).toMatchObject({ ok: true, kmh: 240 });
    expect(speedSymbolKmh("Z")).toMatchObject({ ok: false, code: "bad-speed-symbol" });
    expect(speedSymbolKmh(7)).toMatchObject({ ok: false });
  });
});

describe("tire sizes [pub: owner's manual tire sections; forms per trade-facts §4]", () => {
  const sz = (s: string) => {
    const r = parseTireSize(s);
    if (!r.ok) throw new Error(`${s}: ${r.error}`);
    return r.size;
  };

  it("metric 215/65R15 96H", () => {
    expect(sz("215/65R15 96H")).toEqual({
      system: "metric", prefix: null, widthMm: 215, aspectRatio: 65, construction: "R", zr: false, rimIn: 15,
      commercial: false, loadIndex: 96, dualLoadIndex: null, speedSymbol: "H", reinforced: false,
    });
  });
  it("P-metric P215/65R15 95H", () => {
    expect(sz("P215/65R15 95H")).toMatchObject({ prefix: "P", loadIndex: 95, speedSymbol: "H" });
  });
  it("light truck LT235/85R16 120/116Q with a dual load index", () => {
    expect(sz("LT235/85R16 120/116Q")).toMatchObject({ prefix: "LT", loadIndex: 120, dualLoadIndex: 116, speedSymbol: "Q" });
  });
  it("temporary spare T145/80D18 103M, diagonal construction", () => {
    expect(sz("T145/80D18 103M")).toMatchObject({ prefix: "T", construction: "D", rimIn: 18, loadIndex: 103, speedSymbol: "M" });
  });
  it("flotation 31x10.5R15 LT", () => {
    expect(sz("31x10.5R15 LT")).toMatchObject({ system: "flotation", overallDiameterIn: 31, sectionWidthIn: 10.5, rimIn: 15, lightTruck: true });
    expect(sz("31X10.50R15LT 109Q")).toMatchObject({ sectionWidthIn: 10.5, loadIndex: 109, speedSymbol: "Q" });
  });
  it("ZR, XL, (Y), C, lower case and odd spacing", () => {
    expect(sz("225/45ZR17 94W XL")).toMatchObject({ zr: true, construction: "R", speedSymbol: "W", reinforced: true });
    expect(sz("  225 / 45 zr 17   94w  xl")).toEqual(sz("225/45ZR17 94W XL"));
    expect(sz("275/35ZR19 (100Y)")).toMatchObject({ loadIndex: 100, speedSymbol: "(Y)" });
    expect(sz("215/65R16C 109/107T")).toMatchObject({ commercial: true, loadIndex: 109, dualLoadIndex: 107 });
    expect(sz("225/45R17 extra load 91V")).toMatchObject({ reinforced: true, loadIndex: 91 });
    expect(sz("225/45R17")).toMatchObject({ loadIndex: null, speedSymbol: null });
  });
  it("refuses what it cannot read, with a sentence", () => {
    for (const bad of ["", "hello", "225/45R17 94", "225/45R17 (94V)", "225/45R17 94V (", "225/45R17 94Z", "225/45R17 250V", "995/45R17", "225/45R17 LT"]) {
      const r = parseTireSize(bad);
      if (bad === "225/45R17 94") {
        expect(r.ok).toBe(true); // a load index without a speed symbol is readable
        continue;
      }
      expect(r.ok, bad).toBe(false);
      expect(!r.ok && r.error.length).toBeGreaterThan(20);
    }
    expect(parseTireSize(42)).toMatchObject({ ok: false, code: "not-text" });
    expect(parseTireSize("60x10R15")).toMatchObject({ ok: false, code: "out-of-range" });
    expect(parseTireSize("225/45R17 94Z")).toMatchObject({ code: "bad-speed-symbol" });
    expect(parseTireSize("225/45R17 250V")).toMatchObject({ code: "bad-load-index" });
  });
  it("formats canonically", () => {
    expect(formatTireSize(sz("lt235/85r16 120/116q"))).toBe("LT235/85R16 120/116Q");
    expect(formatTireSize(sz("31x10.50r15lt"))).toBe("31x10.5R15 LT");
    expect(formatTireSize(sz("275/35zr19 (100y) xl"))).toBe("275/35ZR19 (100Y) XL");
  });

  it("[computed from the definition, trade-facts §4] 225/45R17 → 634.3 mm, 24.97 in, about 502 revolutions per km", () => {
    const d = overallDiameter("225/45R17");
    expect(d.ok && d.mm).toBeCloseTo(634.3, 6);
    expect(d.ok && d.in).toBeCloseTo(24.97, 2);
    expect(d.ok && Math.round(d.revolutionsPerKm)).toBe(502);
    expect(d.ok && d.circumferenceMm).toBeCloseTo(Math.PI * 634.3, 6);
    // Flotation sizes state the diameter: 31 in = 787.4 mm by the exact inch.
    expect(overallDiameter("31x10.5R15 LT")).toMatchObject({ mm: 787.4 });
    expect(overallDiameter("nonsense")).toMatchObject({ ok: false, code: "bad-size" });
    expect(overallDiameter({ system: "other" } as never)).toMatchObject({ ok: false });
  });
});

describe("replacement fit against the placard [practice: LI and speed at least the placard's, diameter ±3 %]", () => {
  it("passes a same-diameter upgrade", () => {
    expect(checkFit("235/45R17 97W", "225/45R17 94V")).toMatchObject({ ok: true, status: "pass" });
  });
  it("fails a lower load index and a lower speed symbol", () => {
    const r = checkFit("225/45R17 91H", "225/45R17 94V");
    expect(r).toMatchObject({ ok: true, status: "fail" });
    expect(r.ok && r.checks.filter((c) => c.status === "fail").map((c) => c.aspect)).toEqual(["load", "speed"]);
  });
  it("a lower speed symbol on a winter tire is a warning, not a failure", () => {
    expect(checkFit("225/45R17 94H", "225/45R17 94V", { winter: true })).toMatchObject({ status: "warn" });
  });
  it("diameter: +2.8 % passes, +4 % fails", () => {
    // 245/45R17 = 652.3 mm vs 634.3 mm for 225/45R17: +2.84 %.
    const near = checkFit("245/45R17 96V", "225/45R17 94V");
    expect(near).toMatchObject({ status: "pass" });
    expect(near.ok && near.diameterChangePct).toBeCloseTo((652.3 / 634.3 - 1) * 100, 6);
    const far = checkFit("245/50R17 99V", "225/45R17 94V");
    expect(far.ok && far.checks.find((c) => c.aspect === "diameter")?.status).toBe("fail");
  });
  it("warns on missing ratings, another rim size, a temporary spare, light-truck vs passenger", () => {
    expect(checkFit("225/45R17", "225/45R17 94V")).toMatchObject({ status: "warn" });
    const rim = checkFit("225/40R18 94V", "225/45R17 94V");
    expect(rim.ok && rim.checks.some((c) => c.aspect === "rim" && c.status === "warn")).toBe(true);
    expect(checkFit("T145/80D18 103M", "T145/80D18 103M")).toMatchObject({ status: "warn" });
    expect(checkFit("LT225/75R16 115/112Q", "225/75R16 104Q")).toMatchObject({ status: "warn" });
    expect(checkFit("275/35ZR19 (100Y)", "275/35ZR19 100Y")).toMatchObject({ status: "pass" });
    expect(checkFit("275/35ZR19 100Y", "275/35ZR19 (100Y)")).toMatchObject({ status: "fail" });
  });
  it("refuses unreadable sizes", () => {
    expect(checkFit("x", "225/45R17 94V")).toMatchObject({ ok: false, code: "bad-replacement" });
    expect(checkFit("225/45R17 94V", "x")).toMatchObject({ ok: false, code: "bad-placard" });
  });
});

describe("VIN, 49 CFR 565", () => {
  it("[pub: 49 CFR 565 sample] 1G4AH59H?5G118341: sum 411, check digit 4, model year 2005", () => {
    expect(vinCheckDigit("1G4AH59H05G118341")).toEqual({ expected: "4", sum: 411 });
    expect(validateVin("1G4AH59H45G118341")).toMatchObject({ ok: true, checkDigit: "valid", modelYear: 2005, northAmerican: true });
  });
  it("[pub: NHTSA guide for new manufacturers] 1J9RP1A36A1644345: sum 314, check 6, 2010 by the position-7 rule", () => {
    expect(vinCheckDigit("1J9RP1A36A1644345")).toEqual({ expected: "6", sum: 314 });
    // [sec: 73 FR 23367] a letter in position 7 puts code A in 2010, not 1980.
    expect(validateVin("1j9rp1a3-6a16 44345")).toMatchObject({ ok: true, vin: "1J9RP1A36A1644345", checkDigit: "valid", modelYear: 2010, modelYearCandidates: [1980, 2010] });
  });
  it("[memory: a widely quoted example] 1M8GDM9AXKP042788 has check digit X; digit in position 7 → 1989", () => {
    expect(validateVin("1M8GDM9AXKP042788")).toMatchObject({ ok: true, checkDigit: "valid", expectedCheckDigit: "X", modelYear: 1989 });
  });
  it("[pub] a wrong check digit on a North American VIN is invalid, with a warning", () => {
    const r = validateVin("1G4AH59H55G118341");
    expect(r).toMatchObject({ ok: true, checkDigit: "invalid", expectedCheckDigit: "4" });
    expect(r.ok && r.warnings.length).toBe(1);
  });
  it("[pub] non-North-American VINs are warned about, never rejected", () => {
    const r = validateVin("WZZZZZ9ZZBA000001");
    expect(r).toMatchObject({ ok: true, northAmerican: false });
    // Position 9 is "Z", which no check digit can be.
    expect(r.ok && r.checkDigit).toBe("not-expected");
    expect(r.ok && r.warnings.join(" ")).toMatch(/outside North America/);
  });
  it("[pub] I, O and Q never appear; 17 characters; position 10 must be a year code", () => {
    expect(validateVin("1G4AH59H45G11834I")).toMatchObject({ ok: false, code: "forbidden-letter" });
    expect(validateVin("1G4AH59H45G11834")).toMatchObject({ ok: false, code: "wrong-length" });
    expect(validateVin("1G4AH59H45G11834*")).toMatchObject({ ok: false, code: "bad-characters" });
    expect(validateVin(null)).toMatchObject({ ok: false, code: "not-text" });
    const noYear = validateVin("1G4AH59H4UG118341");
    expect(noYear).toMatchObject({ ok: true, modelYear: null, modelYearCandidates: [] });
  });
});
