/**
 * Tread depth: unit conversion by the exact international inch, the depth
 * of a tire, the limit table by jurisdiction and season, and the depth
 * condition.
 */
import type { Condition } from "./age";
import { dayNumberOf, fromDayNumber, toDayNumber } from "./dates";
import { CAUTION, fail, type Result } from "./result";

/** 1 in = 25.4 mm exactly, so 1/32 in = 0.79375 mm [pub: international inch]. */
export const MM_PER_THIRTY_SECOND = 25.4 / 32;

export function mmToThirtySeconds(mm: number): number {
  return mm / MM_PER_THIRTY_SECOND;
}

export function thirtySecondsToMm(thirtySeconds: number): number {
  return thirtySeconds * MM_PER_THIRTY_SECOND;
}

/** Grooves of one tire as read across the tread. Any may be missing. */
export type Grooves = { innerMm?: number | null; centreMm?: number | null; outerMm?: number | null } | readonly (number | null | undefined)[];

function usable(n: unknown): n is number {
  return typeof n === "number" && Number.isFinite(n) && n >= 0 && n <= 40;
}

/**
 * A tire is as deep as its shallowest groove: the law measures the main
 * grooves and the worst one decides.
 */
export function tireDepth(grooves: Grooves): Result<{ depthMm: number; groove: number | "inner" | "centre" | "outer" }, "no-reading"> {
  const entries: [number | "inner" | "centre" | "outer", unknown][] = Array.isArray(grooves)
    ? grooves.map((v, i) => [i, v] as [number, unknown])
    : grooves && typeof grooves === "object"
      ? [
          ["inner", (grooves as { innerMm?: unknown }).innerMm],
          ["centre", (grooves as { centreMm?: unknown }).centreMm],
          ["outer", (grooves as { outerMm?: unknown }).outerMm],
        ]
      : [];
  let best: { depthMm: number; groove: number | "inner" | "centre" | "outer" } | null = null;
  for (const [groove, v] of entries) {
    if (usable(v) && (best === null || v < best.depthMm)) best = { depthMm: v, groove };
  }
  if (!best) return fail("no-reading", "No groove depth was entered. Enter at least one depth between 0 and 40 mm.");
  return { ok: true, ...best };
}

export type Jurisdiction = "EU" | "UK" | "US" | "DE" | "FI" | "NO" | "NO-north" | "SE" | "AT" | "practice" | "custom";
export type Season = "summer" | "winter";

export const JURISDICTIONS: Jurisdiction[] = ["EU", "UK", "US", "DE", "FI", "NO", "NO-north", "SE", "AT", "practice", "custom"];

export type Tag = "pub" | "sec" | "practice" | "memory";

export type DepthLimitRow = {
  id: string;
  jurisdiction: Jurisdiction;
  /** Which season of tire the row is about; "any" when the law does not care. */
  season: Season | "any";
  minMm: number;
  /** Winter period when the row applies, by month/day; absent = all year. */
  period?: { from: [number, number]; to: [number, number] | "monday-after-easter-monday" };
  /** Whether the number is law (within its scope) or advice. */
  legal: boolean;
  note: string;
  source: string;
  tag: Tag;
  caution: string;
};

/**
 * Every row names its source and tag (trade-facts §2). Winter-period rows
 * apply "when conditions require" in their countries; the period is used
 * here as the calendar window because the app cannot see the road.
 */
export const DEPTH_LIMITS: readonly DepthLimitRow[] = [
  {
    id: "eu-1.6",
    jurisdiction: "EU",
    season: "any",
    minMm: 1.6,
    legal: true,
    note: "At least 1.6 mm in the main grooves, the central zone of about three-quarters of the tread width.",
    source: "Council Directive 89/459/EEC",
    tag: "sec",
    caution: CAUTION,
  },
  {
    id: "uk-1.6",
    jurisdiction: "UK",
    season: "any",
    minMm: 1.6,
    legal: true,
    note: "At least 1.6 mm across the central three-quarters of the tread and around the whole circumference (cars).",
    source: "Highway Code annex 6; Road Vehicles (Construction and Use) Regulations 1986, reg. 27",
    tag: "pub",
    caution: CAUTION,
  },
  {
    id: "us-2/32",
    jurisdiction: "US",
    season: "any",
    minMm: thirtySecondsToMm(2),
    legal: true,
    note: "2/32 in, where the tread-wear indicator bars sit; no federal in-use limit for cars, most states set 2/32 in.",
    source: "FMVSS 109/119 tread-wear indicators (NHTSA interpretation letter); state laws",
    tag: "pub",
    caution: CAUTION,
  },
  {
    id: "de-1.6",
    jurisdiction: "DE",
    season: "any",
    minMm: 1.6,
    legal: true,
    note: "1.6 mm by law; 4 mm for winter tires is advice only.",
    source: "German rule as quoted in trade-facts §2",
    tag: "sec",
    caution: CAUTION,
  },
  {
    id: "fi-winter-3",
    jurisdiction: "FI",
    season: "any",
    minMm: 3,
    period: { from: [11, 1], to: [3, 31] },
    legal: true,
    note: "3.0 mm for winter tires from 1 November to 31 March when conditions require.",
    source: "Traficom (Finnish Transport and Communications Agency)",
    tag: "pub",
    caution: CAUTION,
  },
  {
    id: "no-winter-3",
    jurisdiction: "NO",
    season: "any",
    minMm: 3,
    period: { from: [11, 1], to: "monday-after-easter-monday" },
    legal: true,
    note: "3 mm from 1 November to the Monday after Easter Monday.",
    source: "Norwegian vehicle rules as quoted in trade-facts §2",
    tag: "pub",
    caution: CAUTION,
  },
  {
    id: "no-north-winter-3",
    jurisdiction: "NO-north",
    season: "any",
    minMm: 3,
    period: { from: [10, 16], to: [4, 30] },
    legal: true,
    note: "3 mm from 16 October to 30 April in the northern counties.",
    source: "Norwegian vehicle rules as quoted in trade-facts §2",
    tag: "sec",
    caution: CAUTION,
  },
  {
    id: "se-winter-3",
    jurisdiction: "SE",
    season: "any",
    minMm: 3,
    period: { from: [12, 1], to: [3, 31] },
    legal: true,
    note: "3 mm from 1 December to 31 March in winter road conditions.",
    source: "Swedish rule as quoted in trade-facts §2",
    tag: "sec",
    caution: CAUTION,
  },
  {
    id: "at-winter-4",
    jurisdiction: "AT",
    season: "any",
    minMm: 4,
    period: { from: [11, 1], to: [4, 15] },
    legal: true,
    note: "4 mm for radial winter tires (5 mm bias) from 1 November to 15 April when conditions require.",
    source: "Austrian rule as quoted in trade-facts §2",
    tag: "sec",
    caution: CAUTION,
  },
  {
    id: "practice-summer-3",
    jurisdiction: "practice",
    season: "summer",
    minMm: 3,
    legal: false,
    note: "Many road-safety bodies advise replacing summer tires at 3 mm; below about 3 mm (4/32 in) wet grip falls noticeably.",
    source: "Road-safety bodies' advice (trade-facts §2)",
    tag: "sec",
    caution: CAUTION,
  },
  {
    id: "practice-winter-4",
    jurisdiction: "practice",
    season: "winter",
    minMm: 4,
    legal: false,
    note: "Many road-safety bodies advise replacing winter tires at 4 mm; below about 3 mm a snow tire is no longer a safe winter tire.",
    source: "Road-safety bodies' advice (trade-facts §2)",
    tag: "sec",
    caution: CAUTION,
  },
];

/** Where a country's winter-period row does not apply, the EU minimum does. */
const OUTSIDE_WINTER_ROW: Record<string, string> = { FI: "eu-1.6", NO: "eu-1.6", "NO-north": "eu-1.6", SE: "eu-1.6", AT: "eu-1.6" };

/** Easter Sunday (Gregorian), by the anonymous Meeus/Jones/Butcher algorithm. */
export function easterSunday(year: number): string {
  const a = year % 19;
  const b = Math.floor(year / 100);
  const c = year % 100;
  const d = Math.floor(b / 4);
  const e = b % 4;
  const f = Math.floor((b + 8) / 25);
  const g = Math.floor((b - f + 1) / 3);
  const h = (19 * a + b - d - g + 15) % 30;
  const i = Math.floor(c / 4);
  const k = c % 4;
  const l = (32 + 2 * e + 2 * i - h - k) % 7;
  const m = Math.floor((a + 11 * h + 22 * l) / 451);
  const month = Math.floor((h + l - 7 * m + 114) / 31);
  const day = ((h + l - 7 * m + 114) % 31) + 1;
  return fromDayNumber(dayNumberOf(year, month, day));
}

/** Whether an ISO date falls inside a row's winter period (periods cross New Year). */
export function inPeriod(row: DepthLimitRow, iso: string): boolean {
  if (!row.period) return true;
  const year = Number(iso.slice(0, 4));
  const day = toDayNumber(iso) as number;
  const [fm, fd] = row.period.from;
  const endOf = (y: number) =>
    row.period!.to === "monday-after-easter-monday"
      ? (toDayNumber(easterSunday(y)) as number) + 8
      : dayNumberOf(y, (row.period!.to as [number, number])[0], (row.period!.to as [number, number])[1]);
  // The period runs from `from` in one year to `to` in the next.
  return day >= dayNumberOf(year, fm, fd) || day <= endOf(year);
}

export type DepthLimitOk = {
  minMm: number;
  minThirtySeconds: number;
  row: DepthLimitRow | null;
  legal: boolean;
  source: string;
  tag: Tag | "custom";
  note: string;
  caution: string;
};

export function depthLimit(input: {
  jurisdiction: Jurisdiction;
  season: Season;
  date: string;
  customMm?: number;
}): Result<DepthLimitOk, "bad-jurisdiction" | "bad-season" | "bad-date" | "bad-custom"> {
  if (!JURISDICTIONS.includes(input?.jurisdiction)) {
    return fail("bad-jurisdiction", "Choose where the vehicle is driven, or enter your own limit.");
  }
  if (input.season !== "summer" && input.season !== "winter") {
    return fail("bad-season", "Choose summer or winter tires for the depth limit.");
  }
  if (toDayNumber(input.date) === null) return fail("bad-date", "The date is missing or not a YYYY-MM-DD date.");
  if (input.jurisdiction === "custom") {
    const mm = input.customMm;
    if (typeof mm !== "number" || !Number.isFinite(mm) || mm <= 0 || mm > 20) {
      return fail("bad-custom", "Enter your own depth limit as a number of millimetres between 0 and 20.");
    }
    return {
      ok: true,
      minMm: mm,
      minThirtySeconds: mmToThirtySeconds(mm),
      row: null,
      legal: false,
      source: "Your own limit",
      tag: "custom",
      note: "A limit you chose. Make sure it is not below the legal minimum where you drive.",
      caution: CAUTION,
    };
  }
  const rows = DEPTH_LIMITS.filter(
    (r) => r.jurisdiction === input.jurisdiction && (r.season === "any" || r.season === input.season),
  );
  let row = rows.find((r) => inPeriod(r, input.date));
  if (!row) {
    const fallback = OUTSIDE_WINTER_ROW[input.jurisdiction];
    row = DEPTH_LIMITS.find((r) => r.id === fallback) as DepthLimitRow;
  }
  return {
    ok: true,
    minMm: row.minMm,
    minThirtySeconds: mmToThirtySeconds(row.minMm),
    row,
    legal: row.legal,
    source: row.source,
    tag: row.tag,
    note: row.note,
    caution: row.caution,
  };
}

/**
 * Margins above the limit where the condition steps down [practice]. About
 * 1 mm of tread goes per 10,000 km (trade-facts §6), so "plan" at 1 mm above
 * the limit leaves roughly a season of driving to buy tires, and "watch" at
 * 2 mm asks for checks more often before that.
 */
export const DEPTH_PLAN_MARGIN_MM = 1;
export const DEPTH_WATCH_MARGIN_MM = 2;

export function depthCondition(input: {
  depthMm: number;
  limitMm: number;
  planMarginMm?: number;
  watchMarginMm?: number;
}): Result<
  { level: Condition; depthMm: number; limitMm: number; planBelowMm: number; watchBelowMm: number; reason: string; caution: string },
  "bad-depth" | "bad-limit" | "bad-margin"
> {
  const { depthMm, limitMm } = input ?? ({} as never);
  if (!usable(depthMm)) return fail("bad-depth", "Enter the tread depth as a number of millimetres between 0 and 40.");
  if (!usable(limitMm) || limitMm <= 0) return fail("bad-limit", "The depth limit must be a positive number of millimetres.");
  const plan = input.planMarginMm ?? DEPTH_PLAN_MARGIN_MM;
  const watch = input.watchMarginMm ?? DEPTH_WATCH_MARGIN_MM;
  if (!usable(plan) || !usable(watch) || plan > watch) {
    return fail("bad-margin", "The warning margins must be positive, with the planning margin no larger than the watch margin.");
  }
  const planBelowMm = limitMm + plan;
  const watchBelowMm = limitMm + watch;
  const d = fmt(depthMm);
  const l = fmt(limitMm);
  let level: Condition;
  let reason: string;
  if (depthMm <= limitMm) {
    level = "replace";
    reason = `${d} mm of tread is at or below the ${l} mm limit: replace the tire.`;
  } else if (depthMm <= planBelowMm) {
    level = "plan";
    reason = `${d} mm of tread is within ${fmt(plan)} mm of the ${l} mm limit: plan new tires.`;
  } else if (depthMm <= watchBelowMm) {
    level = "watch";
    reason = `${d} mm of tread is within ${fmt(watch)} mm of the ${l} mm limit: check it more often.`;
  } else {
    level = "good";
    reason = `${d} mm of tread is well above the ${l} mm limit.`;
  }
  return { ok: true, level, depthMm, limitMm, planBelowMm, watchBelowMm, reason, caution: CAUTION };
}

function fmt(n: number): string {
  return String(Math.round(n * 10) / 10);
}

/**
 * Tread does not grow back [practice]. A reading deeper than the tire was new,
 * or clearly deeper than its previous reading, is most likely a typo, a
 * reading of the wrong tire, or a gauge pushed into a sipe; the driver is
 * asked before it is saved. The slack allows for gauge tolerance: about
 * ±0.5 mm for a simple probe gauge [practice]; a later reading may read 1 mm
 * deeper than the last one through gauge and groove differences [practice].
 */
export const DEEPER_THAN_NEW_SLACK_MM = 0.5;
export const DEEPER_THAN_LAST_SLACK_MM = 1.0;

export function unusualDepth(input: {
  /** Deepest groove of this reading. */
  deepestMm: number;
  /** The tire's depth when new, if logged. */
  newDepthMm?: number | null;
  /** The previous reading's depth (shallowest groove), if any. */
  previousMm?: number | null;
  /** This reading's depth (shallowest groove). */
  depthMm: number;
}): { reason: "deeper-than-new" | "jump-up"; message: string } | null {
  const { deepestMm, newDepthMm, previousMm, depthMm } = input;
  if (newDepthMm != null && deepestMm > newDepthMm + DEEPER_THAN_NEW_SLACK_MM) {
    return { reason: "deeper-than-new", message: `deeper than the tire was new (${newDepthMm} mm)` };
  }
  if (previousMm != null && depthMm > previousMm + DEEPER_THAN_LAST_SLACK_MM) {
    return { reason: "jump-up", message: `more than ${DEEPER_THAN_LAST_SLACK_MM} mm deeper than the last reading (${previousMm} mm)` };
  }
  return null;
}
