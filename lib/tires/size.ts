/**
 * Tire size designations: parsing, a canonical written form, overall
 * diameter and a fit check of a replacement against the vehicle placard.
 */
import { loadIndexKg, speedSymbolKmh } from "./load-index";
import { CAUTION, fail, type Result } from "./result";

export type Construction = "R" | "D" | "B";
export type MetricPrefix = "P" | "LT" | "T" | "ST";

type ServiceDescription = {
  loadIndex: number | null;
  /** Second index of a dual rating (116 in 120/116Q), for twin wheels. */
  dualLoadIndex: number | null;
  speedSymbol: string | null;
  /** XL / extra load / reinforced. */
  reinforced: boolean;
};

export type MetricTireSize = {
  system: "metric";
  /** P = US passenger, LT = light truck, T = temporary spare, ST = trailer; null = ETRTO metric. */
  prefix: MetricPrefix | null;
  widthMm: number;
  aspectRatio: number;
  construction: Construction;
  /** "ZR" in the size: radial for speeds over 240 km/h. */
  zr: boolean;
  rimIn: number;
  /** "C" after the rim (commercial, e.g. 215/65R16C). */
  commercial: boolean;
} & ServiceDescription;

export type FlotationTireSize = {
  system: "flotation";
  overallDiameterIn: number;
  sectionWidthIn: number;
  construction: Construction;
  rimIn: number;
  lightTruck: boolean;
} & ServiceDescription;

export type TireSize = MetricTireSize | FlotationTireSize;

export type SizeErrorCode = "not-text" | "unreadable" | "out-of-range" | "bad-load-index" | "bad-speed-symbol";

const UNREADABLE =
  "That tire size could not be read. Type it as on the sidewall, for example 225/45R17 94V, P215/65R15 95H or 31x10.5R15 LT.";

const METRIC_HEAD = /^(P|LT|T|ST)?(\d{3})\/(\d{2})(ZR|R|D|B|-)(\d{2}(?:\.5)?)/;
const FLOTATION_HEAD = /^(\d{2}(?:\.\d{1,2})?)X(\d{1,2}(?:\.\d{1,2})?)(R|D|B|-)(\d{2}(?:\.5)?)/;
const SERVICE = /^(\()?(?:(\d{1,3})(?:\/(\d{1,3}))?)?([A-Z])?(\))?$/;

export function parseTireSize(input: unknown): Result<{ size: TireSize }, SizeErrorCode> {
  if (typeof input !== "string") return fail("not-text", UNREADABLE);
  // Spaces carry no meaning in a size ("225 / 45 R 17"); the rim always has two digits, which keeps the load index apart.
  const s = input.toUpperCase().replace(/\s+/g, "");
  const metric = METRIC_HEAD.exec(s);
  const flotation = metric ? null : FLOTATION_HEAD.exec(s);
  const head = metric ?? flotation;
  if (!head) return fail("unreadable", UNREADABLE);

  let tail = s.slice(head[0].length);
  let commercial = false;
  if (metric && tail.startsWith("C")) {
    commercial = true;
    tail = tail.slice(1);
  }
  let reinforced = false;
  for (const mark of ["EXTRALOAD", "REINFORCED", "XL"]) {
    if (tail.includes(mark)) {
      reinforced = true;
      tail = tail.replace(mark, "");
    }
  }
  let lightTruck = false;
  if (flotation && tail.includes("LT")) {
    lightTruck = true;
    tail = tail.replace("LT", "");
  }
  const service = SERVICE.exec(tail);
  if (!service || Boolean(service[1]) !== Boolean(service[5])) return fail("unreadable", UNREADABLE);

  const loadIndex = service[2] === undefined ? null : Number(service[2]);
  const dualLoadIndex = service[3] === undefined ? null : Number(service[3]);
  for (const li of [loadIndex, dualLoadIndex]) {
    if (li !== null && !loadIndexKg(li).ok) {
      return fail("bad-load-index", `The load index ${li} is outside the table (0 to 200). Check the number after the size.`);
    }
  }
  let speedSymbol: string | null = service[4] ?? null;
  // Parentheses round the service description, as in (99Y), mark a tire rated above 300 km/h.
  if (service[1] && speedSymbol === "Y") speedSymbol = "(Y)";
  else if (service[1]) return fail("unreadable", UNREADABLE);
  if (speedSymbol !== null && !speedSymbolKmh(speedSymbol).ok) {
    return fail("bad-speed-symbol", `The speed symbol ${speedSymbol} is not one this app knows. Check the letter after the load index.`);
  }

  const construction = (head[metric ? 4 : 3] === "-" ? "D" : head[metric ? 4 : 3].replace("ZR", "R")) as Construction;
  const rimIn = Number(head[metric ? 5 : 4]);
  const sd: ServiceDescription = { loadIndex, dualLoadIndex, speedSymbol, reinforced };
  if (metric) {
    const size: MetricTireSize = {
      system: "metric",
      prefix: (metric[1] ?? null) as MetricPrefix | null,
      widthMm: Number(metric[2]),
      aspectRatio: Number(metric[3]),
      construction,
      zr: metric[4] === "ZR",
      rimIn,
      commercial,
      ...sd,
    };
    if (size.widthMm < 100 || size.widthMm > 455 || size.aspectRatio < 20 || size.aspectRatio > 95 || rimIn < 10 || rimIn > 30) {
      return fail("out-of-range", "Those size numbers are outside what passenger and light-truck tires use. Check the size on the sidewall.");
    }
    return { ok: true, size };
  }
  const f = flotation as RegExpExecArray;
  const size: FlotationTireSize = {
    system: "flotation",
    overallDiameterIn: Number(f[1]),
    sectionWidthIn: Number(f[2]),
    construction,
    rimIn,
    lightTruck,
    ...sd,
  };
  if (size.overallDiameterIn < 20 || size.overallDiameterIn > 50 || size.sectionWidthIn < 5 || size.sectionWidthIn > 20 || rimIn < 10 || rimIn > 30 || size.sectionWidthIn >= size.overallDiameterIn) {
    return fail("out-of-range", "Those size numbers are outside what light-truck flotation tires use. Check the size on the sidewall.");
  }
  return { ok: true, size };
}

/** The canonical written form; parseTireSize(formatTireSize(x)) gives x back. */
export function formatTireSize(size: TireSize): string {
  const head =
    size.system === "metric"
      ? `${size.prefix ?? ""}${size.widthMm}/${size.aspectRatio}${size.zr ? "ZR" : size.construction}${size.rimIn}${size.commercial ? "C" : ""}`
      : `${size.overallDiameterIn}x${size.sectionWidthIn}${size.construction}${size.rimIn}${size.lightTruck ? " LT" : ""}`;
  const li = size.loadIndex === null ? "" : `${size.loadIndex}${size.dualLoadIndex === null ? "" : `/${size.dualLoadIndex}`}`;
  let service: string;
  if (size.speedSymbol === "(Y)") service = `(${li}Y)`;
  else service = `${li}${size.speedSymbol ?? ""}`;
  return [head, service, size.reinforced ? "XL" : ""].filter((p) => p !== "").join(" ");
}

function toSize(size: unknown): TireSize | null {
  if (typeof size === "string") {
    const r = parseTireSize(size);
    return r.ok ? r.size : null;
  }
  if (size && typeof size === "object" && ((size as TireSize).system === "metric" || (size as TireSize).system === "flotation")) {
    return size as TireSize;
  }
  return null;
}

export type Diameter = { mm: number; in: number; circumferenceMm: number; revolutionsPerKm: number };

/**
 * Overall diameter (mm) = rim (in) × 25.4 + 2 × width × aspect / 100; a
 * flotation size states its diameter in inches (trade-facts §4).
 */
export function overallDiameter(size: TireSize | string): Result<Diameter, "bad-size"> {
  const s = toSize(size);
  if (!s) return fail("bad-size", UNREADABLE);
  const mm = s.system === "metric" ? s.rimIn * 25.4 + (2 * s.widthMm * s.aspectRatio) / 100 : s.overallDiameterIn * 25.4;
  const circumferenceMm = Math.PI * mm;
  return { ok: true, mm, in: mm / 25.4, circumferenceMm, revolutionsPerKm: 1_000_000 / circumferenceMm };
}

/** Replacement practice [practice]: overall diameter within about ±3 % of the original. */
export const DIAMETER_TOLERANCE = 0.03;

export type FitStatus = "pass" | "warn" | "fail";
export type FitCheck = { aspect: "load" | "speed" | "diameter" | "rim" | "type"; status: FitStatus; reason: string };

const FIT_ORDER: Record<FitStatus, number> = { pass: 0, warn: 1, fail: 2 };

/**
 * Replacement against the vehicle placard [practice] (trade-facts §4): load
 * index and speed symbol at least the placard's, diameter within ±3 %.
 * `winter: true` turns a lower speed symbol into a warning, because some
 * countries allow it on winter tires with a speed label — local law decides.
 */
export function checkFit(
  replacement: TireSize | string,
  placard: TireSize | string,
  opts: { winter?: boolean } = {},
): Result<{ status: FitStatus; checks: FitCheck[]; diameterChangePct: number; caution: string }, "bad-replacement" | "bad-placard"> {
  const r = toSize(replacement);
  if (!r) return fail("bad-replacement", `The replacement size could not be read. ${UNREADABLE}`);
  const p = toSize(placard);
  if (!p) return fail("bad-placard", `The placard size could not be read. ${UNREADABLE}`);
  const checks: FitCheck[] = [];

  if (r.loadIndex === null || p.loadIndex === null) {
    checks.push({ aspect: "load", status: "warn", reason: "A load index is missing, so the load capacity cannot be compared." });
  } else {
    const rk = loadIndexKg(r.loadIndex) as { kg: number };
    const pk = loadIndexKg(p.loadIndex) as { kg: number };
    checks.push(
      r.loadIndex >= p.loadIndex
        ? { aspect: "load", status: "pass", reason: `Load index ${r.loadIndex} (${rk.kg} kg) meets the placard's ${p.loadIndex} (${pk.kg} kg).` }
        : { aspect: "load", status: "fail", reason: `Load index ${r.loadIndex} (${rk.kg} kg) is below the placard's ${p.loadIndex} (${pk.kg} kg).` },
    );
  }

  if (r.speedSymbol === null || p.speedSymbol === null) {
    checks.push({ aspect: "speed", status: "warn", reason: "A speed symbol is missing, so the speed ratings cannot be compared." });
  } else {
    const rank = (sym: string) => {
      const row = speedSymbolKmh(sym) as { kmh: number; orAbove: boolean };
      return row.kmh + (row.orAbove ? 1 : 0);
    };
    const ok = rank(r.speedSymbol) >= rank(p.speedSymbol);
    checks.push(
      ok
        ? { aspect: "speed", status: "pass", reason: `Speed symbol ${r.speedSymbol} meets the placard's ${p.speedSymbol}.` }
        : {
            aspect: "speed",
            status: opts.winter ? "warn" : "fail",
            reason: opts.winter
              ? `Speed symbol ${r.speedSymbol} is below the placard's ${p.speedSymbol}. Some countries allow this on winter tires with a speed label in view of the driver; check local law.`
              : `Speed symbol ${r.speedSymbol} is below the placard's ${p.speedSymbol}.`,
          },
    );
  }

  const rd = (overallDiameter(r) as { mm: number }).mm;
  const pd = (overallDiameter(p) as { mm: number }).mm;
  const change = rd / pd - 1;
  const pct = Math.round(change * 1000) / 10;
  checks.push(
    Math.abs(change) <= DIAMETER_TOLERANCE + 1e-12
      ? { aspect: "diameter", status: "pass", reason: `Overall diameter differs by ${pct} %, within ±3 %.` }
      : { aspect: "diameter", status: "fail", reason: `Overall diameter differs by ${pct} %, more than ±3 %: speedometer, brakes and clearance may be affected.` },
  );

  if (r.rimIn !== p.rimIn) {
    checks.push({ aspect: "rim", status: "warn", reason: `This size needs ${r.rimIn}-inch wheels instead of ${p.rimIn}-inch.` });
  }
  if (r.system === "metric" && r.prefix === "T") {
    checks.push({ aspect: "type", status: "warn", reason: "A temporary spare is for short distances at reduced speed only." });
  }
  const isLt = (s: TireSize) => (s.system === "metric" ? s.prefix === "LT" : s.lightTruck);
  if (isLt(r) !== isLt(p)) {
    checks.push({ aspect: "type", status: "warn", reason: "Light-truck and passenger tires are built and inflated differently; ask a technician." });
  }
  const status = checks.reduce<FitStatus>((w, c) => (FIT_ORDER[c.status] > FIT_ORDER[w] ? c.status : w), "pass");
  return { ok: true, status, checks, diameterChangePct: change * 100, caution: CAUTION };
}
