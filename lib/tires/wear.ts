/**
 * Wear projection: when a tire reaches its depth limit, by odometer and by
 * date, from its own tread checks and the vehicle's odometer history.
 */
import { fromDayNumber, toDayNumber } from "./dates";
import { CAUTION, fail, type Result } from "./result";

export type WearReading = { date: string; odometerKm: number; depthMm: number };
export type OdometerEntry = { date: string; odometerKm: number };

/** Roughly 1 mm per 10,000 km (a technical inspection body's estimate) [sec], trade-facts §6. */
export const TYPICAL_WEAR_MM_PER_KM = 1 / 10_000;

/**
 * A rise in depth larger than this between two checks is a measurement
 * error, not rubber growing back: about what two gauge readings of the same
 * groove commonly differ by [practice].
 */
export const MEASUREMENT_TOLERANCE_MM = 0.5;

type Fit = { slope: number; intercept: number; rSquared: number; n: number };

/** Ordinary least squares; null when x does not vary (no slope exists). */
export function leastSquares(points: readonly { x: number; y: number }[]): Fit | null {
  const n = points.length;
  if (n < 2) return null;
  const mx = points.reduce((s, p) => s + p.x, 0) / n;
  const my = points.reduce((s, p) => s + p.y, 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (const p of points) {
    sxx += (p.x - mx) ** 2;
    sxy += (p.x - mx) * (p.y - my);
    syy += (p.y - my) ** 2;
  }
  // Relative test: odometers in the 100,000s make an absolute epsilon meaningless.
  if (sxx <= 1e-9 * Math.max(1, mx * mx)) return null;
  const slope = sxy / sxx;
  const rSquared = syy === 0 ? 1 : (sxy * sxy) / (sxx * syy);
  return { slope, intercept: my - slope * mx, rSquared, n };
}

function finite(n: unknown): n is number {
  return typeof n === "number" && Number.isFinite(n);
}

/**
 * Distance per day from dated odometer values. Least squares over every
 * entry, not first/last: one mistyped entry at either end then moves the rate
 * far less, and every entry the driver made counts. A rate that is zero or
 * negative (car standing, odometer typo) is reported as 0: not driven.
 */
export function distancePerDay(history: readonly OdometerEntry[]): { kmPerDay: number; points: number; method: "least-squares" | "none" } {
  const pts = (Array.isArray(history) ? history : [])
    .map((h) => ({ x: toDayNumber(h?.date), y: h?.odometerKm }))
    .filter((p): p is { x: number; y: number } => p.x !== null && finite(p.y) && p.y >= 0);
  const fit = leastSquares(pts);
  if (!fit) return { kmPerDay: 0, points: pts.length, method: "none" };
  return { kmPerDay: Math.max(0, fit.slope), points: pts.length, method: "least-squares" };
}

export type Confidence = "low" | "medium" | "high";

export type WearProjection = {
  method: "least-squares" | "typical-rate";
  /** Positive: tread lost per 1,000 km. */
  wearMmPer1000Km: number;
  kmPerDay: number;
  /** The newest usable reading the projection starts from. */
  lastReading: WearReading;
  limitMm: number;
  alreadyAtLimit: boolean;
  projectedOdometerKm: number;
  /** Null when the car is not being driven: the tread then lasts, the age limit still applies. */
  projectedDate: string | null;
  /** Depth and odometer estimated for `today` from the rates. */
  estimatedToday: { odometerKm: number; depthMm: number };
  measurementNoise: boolean;
  confidence: { level: Confidence; rSquared: number | null; points: number };
  notes: string[];
  caution: string;
};

export type ProjectWearOptions = {
  limitMm: number;
  today: string;
  odometerHistory?: readonly OdometerEntry[];
  /**
   * The vehicle's distance per day, when the caller already computed it once
   * for all its tires (distancePerDay of the vehicle's history). Replaces the
   * rate from `odometerHistory` and the tire's own readings.
   */
  kmPerDay?: number;
  typicalWearMmPerKm?: number;
};

/**
 * Least squares of depth against odometer per tire. Confidence is "high"
 * with 4+ readings and R² ≥ 0.9, "medium" with 3+ and R² ≥ 0.7, else "low";
 * two points always fit a line exactly, so they say little.
 */
export function projectWear(
  readings: readonly WearReading[],
  opts: ProjectWearOptions,
): Result<WearProjection, "bad-today" | "bad-limit" | "no-readings"> {
  const today = toDayNumber(opts?.today);
  if (today === null) return fail("bad-today", "Today's date is missing or not a YYYY-MM-DD date.");
  const limitMm = opts.limitMm;
  if (!finite(limitMm) || limitMm <= 0 || limitMm > 20) {
    return fail("bad-limit", "The depth limit must be a positive number of millimetres.");
  }
  const usable = (Array.isArray(readings) ? readings : [])
    .map((r) => ({ r, day: toDayNumber(r?.date) }))
    .filter(
      (x): x is { r: WearReading; day: number } =>
        x.day !== null && finite(x.r.odometerKm) && x.r.odometerKm >= 0 && finite(x.r.depthMm) && x.r.depthMm >= 0 && x.r.depthMm <= 40,
    )
    // Readings after today are typos or clock trouble; they must not steer a forecast made today.
    .filter((x) => x.day <= today)
    .sort((a, b) => a.day - b.day || a.r.odometerKm - b.r.odometerKm);
  if (usable.length === 0) {
    return fail("no-readings", "There is no usable tread check yet. Record a depth with its date and odometer reading.");
  }
  const notes: string[] = [];
  const last = usable[usable.length - 1];
  const lastDay = last.day;
  const maxOdo = Math.max(...usable.map((x) => x.r.odometerKm));

  let measurementNoise = false;
  const byOdo = [...usable].sort((a, b) => a.r.odometerKm - b.r.odometerKm || a.day - b.day);
  for (let i = 1; i < byOdo.length; i++) {
    if (byOdo[i].r.depthMm - byOdo[i - 1].r.depthMm > MEASUREMENT_TOLERANCE_MM) measurementNoise = true;
  }
  if (measurementNoise) notes.push("A later check reads deeper than an earlier one: at least one reading is probably off. Measure again.");

  const fit = leastSquares(usable.map((x) => ({ x: x.r.odometerKm, y: x.r.depthMm })));
  const typical = finite(opts.typicalWearMmPerKm) && opts.typicalWearMmPerKm > 0 ? opts.typicalWearMmPerKm : TYPICAL_WEAR_MM_PER_KM;
  let method: WearProjection["method"];
  let rate: number;
  let startDepth: number;
  let rSquared: number | null = null;
  if (fit && fit.slope < 0) {
    method = "least-squares";
    rate = -fit.slope;
    rSquared = fit.rSquared;
    // Start from the fitted line at the furthest odometer: it smooths the last reading's gauge error.
    startDepth = fit.intercept + fit.slope * maxOdo;
  } else {
    method = "typical-rate";
    rate = typical;
    // The shallowest of the newest readings, so a noisy high reading cannot postpone the forecast.
    startDepth = Math.min(...usable.filter((x) => x.r.odometerKm === maxOdo).map((x) => x.r.depthMm));
    notes.push(
      fit
        ? "The checks show no wear yet, so a typical rate of about 1 mm per 10,000 km is used: an estimate only."
        : "Fewer than two checks at different odometer readings, so a typical rate of about 1 mm per 10,000 km is used: an estimate only.",
    );
  }

  const alreadyAtLimit = startDepth <= limitMm;
  // Capped so a near-zero wear rate cannot produce Infinity.
  const projectedOdometerKm = alreadyAtLimit ? maxOdo : maxOdo + Math.min((startDepth - limitMm) / rate, 1e9);

  let kmPerDay: number;
  if (finite(opts.kmPerDay) && opts.kmPerDay >= 0) kmPerDay = opts.kmPerDay;
  else {
    const history = [...(opts.odometerHistory ?? []), ...usable.map((x) => ({ date: x.r.date, odometerKm: x.r.odometerKm }))];
    kmPerDay = distancePerDay(history.filter((h) => (toDayNumber(h?.date) ?? Infinity) <= today)).kmPerDay;
  }
  let projectedDate: string | null = null;
  if (alreadyAtLimit) projectedDate = fromDayNumber(lastDay);
  else if (kmPerDay > 0) {
    const days = Math.ceil((projectedOdometerKm - maxOdo) / kmPerDay);
    // Far-off dates are clamped so the calendar never receives an invalid year.
    projectedDate = fromDayNumber(lastDay + Math.min(days, 365 * 200));
  } else {
    notes.push("The odometer history shows no driving, so no date can be projected; the age limit still applies.");
  }

  const elapsed = today - lastDay;
  const estOdo = maxOdo + kmPerDay * elapsed;
  const estimatedToday = { odometerKm: estOdo, depthMm: Math.max(0, startDepth - rate * (estOdo - maxOdo)) };

  const n = usable.length;
  let level: Confidence = "low";
  if (method === "least-squares" && rSquared !== null) {
    if (n >= 4 && rSquared >= 0.9) level = "high";
    else if (n >= 3 && rSquared >= 0.7) level = "medium";
  }
  if (measurementNoise && level === "high") level = "medium";

  return {
    ok: true,
    method,
    wearMmPer1000Km: rate * 1000,
    kmPerDay,
    lastReading: { ...last.r },
    limitMm,
    alreadyAtLimit,
    projectedOdometerKm,
    projectedDate,
    estimatedToday,
    measurementNoise,
    confidence: { level, rSquared, points: n },
    notes,
    caution: CAUTION,
  };
}
