/**
 * Vehicle identification number by 49 CFR 565: check digit (position 9) and
 * model year (position 10, with the position-7 rule for light vehicles).
 */
import { fail, type Result } from "./result";

const TRANSLITERATION: Record<string, number> = {
  A: 1, B: 2, C: 3, D: 4, E: 5, F: 6, G: 7, H: 8,
  J: 1, K: 2, L: 3, M: 4, N: 5, P: 7, R: 9,
  S: 2, T: 3, U: 4, V: 5, W: 6, X: 7, Y: 8, Z: 9,
};
const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];
/** Model-year codes in order; the cycle repeats every 30 years from 1980. */
const YEAR_CODES = "ABCDEFGHJKLMNPRSTVWXY123456789";

function value(ch: string): number {
  return /\d/.test(ch) ? Number(ch) : TRANSLITERATION[ch];
}

/** The check digit 49 CFR 565 expects for a 17-character VIN ("X" for 10). */
export function vinCheckDigit(vin: string): { expected: string; sum: number } {
  let sum = 0;
  for (let i = 0; i < 17; i++) sum += value(vin[i]) * WEIGHTS[i];
  const r = sum % 11;
  return { expected: r === 10 ? "X" : String(r), sum };
}

export type VinOk = {
  vin: string;
  /** North American VINs (first symbol 1–5) must carry the check digit. */
  northAmerican: boolean;
  checkDigit: "valid" | "invalid" | "not-expected";
  expectedCheckDigit: string;
  /** Model year by the position-7 rule; null when position 10 is not a year code. */
  modelYear: number | null;
  modelYearCandidates: number[];
  warnings: string[];
};

export type VinErrorCode = "not-text" | "wrong-length" | "forbidden-letter" | "bad-characters";

export function validateVin(input: unknown): Result<VinOk, VinErrorCode> {
  if (typeof input !== "string") return fail("not-text", "Type the VIN as 17 letters and digits.");
  const vin = input.toUpperCase().replace(/[\s-]+/g, "");
  if (vin.length !== 17) {
    return fail("wrong-length", `A VIN has 17 letters and digits; this one has ${vin.length}. Check it against the registration document.`);
  }
  if (/[IOQ]/.test(vin)) {
    return fail("forbidden-letter", "The letters I, O and Q never appear in a VIN; they are probably the digits 1 and 0.");
  }
  if (!/^[A-HJ-NPR-Z0-9]{17}$/.test(vin)) {
    return fail("bad-characters", "A VIN holds only letters and digits. Check it against the registration document.");
  }
  const warnings: string[] = [];
  const northAmerican = /^[1-5]/.test(vin);
  const { expected } = vinCheckDigit(vin);
  let checkDigit: VinOk["checkDigit"];
  if (vin[8] === expected) checkDigit = "valid";
  else if (northAmerican) {
    checkDigit = "invalid";
    warnings.push("The check digit (9th symbol) does not match: one symbol is probably mistyped.");
  } else {
    checkDigit = "not-expected";
    warnings.push("Vehicles built for markets outside North America often have no check digit, so it was not checked.");
  }

  const idx = YEAR_CODES.indexOf(vin[9]);
  let modelYearCandidates: number[] = [];
  let modelYear: number | null = null;
  if (idx < 0) {
    warnings.push("The 10th symbol is not a model-year code, so the model year is unknown.");
  } else {
    modelYearCandidates = [1980 + idx, 2010 + idx];
    // 73 FR 23367 (2008): for light vehicles a letter in position 7 means 2010–2039, a digit 1980–2009.
    modelYear = /[A-Z]/.test(vin[6]) ? 2010 + idx : 1980 + idx;
    if (!northAmerican) {
      warnings.push("Outside North America the 10th symbol is not always the model year; check the year on the registration document.");
    }
  }
  return { ok: true, vin, northAmerican, checkDigit, expectedCheckDigit: expected, modelYear, modelYearCandidates, warnings };
}
