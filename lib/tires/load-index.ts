/**
 * Load index and speed symbol tables of the service description
 * ("94V": load index 94, speed symbol V).
 */
import { fail, type Result } from "./result";

/**
 * Maximum load per tire in kg for load indices 0–200 [pub]: French Arrêté of
 * 24 October 1994, annex II, which reproduces the ETRTO / UN Regulation No. 30
 * table. Proofreading against a copy of that table found one row off the
 * table's geometric series: index 59 reads 240 kg there, but the series
 * (58 = 236, 60 = 250, steps of about 2.9 %) and secondary tables give
 * 243 kg [sec], which is used here.
 */
export const LOAD_INDEX_KG: readonly number[] = [
  45, 46.2, 47.5, 48.7, 50, 51.5, 53, 54.5, 56, 58, // 0–9
  60, 61.5, 63, 65, 67, 69, 71, 73, 75, 77.5, // 10–19
  80, 82.5, 85, 87.5, 90, 92.5, 95, 97.5, 100, 103, // 20–29
  106, 109, 112, 115, 118, 121, 125, 128, 132, 136, // 30–39
  140, 145, 150, 155, 160, 165, 170, 175, 180, 185, // 40–49
  190, 195, 200, 206, 212, 218, 224, 230, 236, 243, // 50–59
  250, 257, 265, 272, 280, 290, 300, 307, 315, 325, // 60–69
  335, 345, 355, 365, 375, 387, 400, 412, 425, 437, // 70–79
  450, 462, 475, 487, 500, 515, 530, 545, 560, 580, // 80–89
  600, 615, 630, 650, 670, 690, 710, 730, 750, 775, // 90–99
  800, 825, 850, 875, 900, 925, 950, 975, 1000, 1030, // 100–109
  1060, 1090, 1120, 1150, 1180, 1215, 1250, 1285, 1320, 1360, // 110–119
  1400, 1450, 1500, 1550, 1600, 1650, 1700, 1750, 1800, 1850, // 120–129
  1900, 1950, 2000, 2060, 2120, 2180, 2240, 2300, 2360, 2430, // 130–139
  2500, 2575, 2650, 2725, 2800, 2900, 3000, 3075, 3150, 3250, // 140–149
  3350, 3450, 3550, 3650, 3750, 3875, 4000, 4125, 4250, 4375, // 150–159
  4500, 4625, 4750, 4875, 5000, 5150, 5300, 5450, 5600, 5800, // 160–169
  6000, 6150, 6300, 6500, 6700, 6900, 7100, 7300, 7500, 7750, // 170–179
  8000, 8250, 8500, 8750, 9000, 9250, 9500, 9750, 10000, 10300, // 180–189
  10600, 10900, 11200, 11500, 11800, 12150, 12500, 12850, 13200, 13600, // 190–199
  14000, // 200–200
];

export function loadIndexKg(loadIndex: unknown): Result<{ loadIndex: number; kg: number }, "bad-load-index"> {
  const li = typeof loadIndex === "string" && /^\s*\d{1,3}\s*$/.test(loadIndex) ? Number(loadIndex) : loadIndex;
  if (typeof li !== "number" || !Number.isInteger(li) || li < 0 || li >= LOAD_INDEX_KG.length) {
    return fail("bad-load-index", "A load index is a whole number from 0 to 200, printed after the size (94 in 225/45R17 94V).");
  }
  return { ok: true, loadIndex: li, kg: LOAD_INDEX_KG[li] };
}

export type SpeedSymbolRow = { symbol: string; kmh: number; orAbove: boolean; tag: "pub" | "memory"; source: string };

const ANNEX = "French Arrêté of 24 October 1994, annex II (ETRTO / UN Regulation No. 30)";
const pub = (symbol: string, kmh: number): SpeedSymbolRow => ({ symbol, kmh, orAbove: false, tag: "pub", source: ANNEX });

/**
 * Speed symbols F to V are from the published annex [pub]; W, Y and "(Y)"
 * are recalled, not verified against a source [memory] (trade-facts §4).
 */
export const SPEED_SYMBOLS: readonly SpeedSymbolRow[] = [
  pub("F", 80),
  pub("G", 90),
  pub("J", 100),
  pub("K", 110),
  pub("L", 120),
  pub("M", 130),
  pub("N", 140),
  pub("P", 150),
  pub("Q", 160),
  pub("R", 170),
  pub("S", 180),
  pub("T", 190),
  pub("U", 200),
  pub("H", 210),
  pub("V", 240),
  { symbol: "W", kmh: 270, orAbove: false, tag: "memory", source: "recalled, not verified" },
  { symbol: "Y", kmh: 300, orAbove: false, tag: "memory", source: "recalled, not verified" },
  { symbol: "(Y)", kmh: 300, orAbove: true, tag: "memory", source: "recalled, not verified" },
];

export function speedSymbolKmh(symbol: unknown): Result<SpeedSymbolRow, "bad-speed-symbol"> {
  const s = typeof symbol === "string" ? symbol.trim().toUpperCase().replace(/\s+/g, "") : "";
  const row = SPEED_SYMBOLS.find((r) => r.symbol === s);
  if (!row) {
    return fail("bad-speed-symbol", "That is not a speed symbol this app knows. It is the letter after the load index (V in 94V).");
  }
  return { ok: true, ...row };
}
