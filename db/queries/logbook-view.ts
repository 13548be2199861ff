import "server-only";
// Conditions, ages, patterns and projections of a set's tires, composed only
// from lib/tires: this file decides nothing about tires on its own.
import {
  ageCondition,
  CAUTION,
  decodeDotCode,
  depthCondition,
  depthLimit,
  JURISDICTIONS,
  patternAdvice,
  projectWear,
  tireDepth,
  wearPattern,
  type Condition,
  type Jurisdiction,
  type OdometerEntry,
  type WearPatternKind,
} from "@/lib/tires";
import { toCoreKind } from "./logbook-input";
import type { Tire, TireSet } from "@/db/schema";

/**
 * A tire's condition as the logbook shows it: the core's four levels, plus
 * "unknown" for a tire whose age cannot be read (no DOT code, or one that does
 * not decode). Such a tire is never "good": its age may already be past any
 * limit. Only a worse tread level (plan, replace) outranks it.
 */
export type TireCondition = Condition | "unknown";
const ORDER: Record<TireCondition, number> = { good: 0, unknown: 1, watch: 2, plan: 3, replace: 4 };
export function worseTireCondition(a: TireCondition, b: TireCondition): TireCondition {
  return ORDER[a] >= ORDER[b] ? a : b;
}

export type ReadingRow = {
  checkId: string;
  tireId: string;
  checkedOn: string;
  odometerKm: number | null;
  innerMm: number | null;
  centreMm: number | null;
  outerMm: number | null;
  pressureKpa: number | null;
  approximate: boolean;
};

export type TireView = {
  id: string;
  position: Tire["position"];
  dotCode: string | null;
  dot: { ok: true; week: number; year: number; weekStart: string; weekEnd: string; precision: "week" | "decade-ambiguous" } | { ok: false; error: string } | null;
  age: { years: number; months: number; decimalYears: number } | null;
  ageLevel: Condition | null;
  ageReason: string | null;
  replaceFrom: string | null;
  newDepthMm: number | null;
  latest: ReadingRow | null;
  depthMm: number | null;
  depthLevel: Condition | null;
  depthReason: string | null;
  pattern: { kind: WearPatternKind; likelyCause: string; advice: string; spreadMm: number; source: string } | null;
  projection: {
    method: "least-squares" | "typical-rate";
    projectedDate: string | null;
    projectedOdometerKm: number;
    confidence: string;
    notes: string[];
  } | null;
  condition: TireCondition | null;
  /** Depth against date and odometer, oldest first: the wear chart's points. */
  series: { date: string; odometerKm: number | null; depthMm: number; approximate: boolean }[];
};

export type LimitView = { minMm: number; source: string; legal: boolean; note: string; custom: boolean };

export function jurisdictionOf(value: string | null | undefined): Jurisdiction {
  return JURISDICTIONS.includes(value as Jurisdiction) && value !== "custom" ? (value as Jurisdiction) : "EU";
}

export function limitFor(set: Pick<TireSet, "kind" | "depthLimitMm">, jurisdiction: Jurisdiction, today: string): LimitView {
  if (set.depthLimitMm != null) {
    const custom = depthLimit({ jurisdiction: "custom", season: "summer", date: today, customMm: set.depthLimitMm });
    if (custom.ok) return { minMm: custom.minMm, source: custom.source, legal: false, note: custom.note, custom: true };
  }
  const season = set.kind === "winter" ? "winter" : "summer";
  const l = depthLimit({ jurisdiction, season, date: today });
  if (!l.ok) return { minMm: 1.6, source: "EU minimum", legal: true, note: l.error, custom: false };
  return { minMm: l.minMm, source: l.source, legal: l.legal, note: l.note, custom: false };
}

export function tireView(opts: {
  tire: Tire;
  set: TireSet;
  readings: ReadingRow[];
  limitMm: number;
  odometerHistory: OdometerEntry[];
  /** The vehicle's distance per day, computed once for all its tires. */
  distance?: { kmPerDay: number };
  /** False: no wear projection (retired sets, unless asked). */
  project?: boolean;
  today: string;
}): TireView {
  const { tire: t, set, today } = opts;
  let dot: TireView["dot"] = null;
  let weekStart = t.dotWeekStart;
  let precision: "week" | "decade-ambiguous" = (t.dotPrecision as "week" | "decade-ambiguous" | null) ?? "week";
  if (t.dotCode) {
    const d = decodeDotCode(t.dotCode, { today });
    if (d.ok) {
      dot = { ok: true, week: d.week, year: d.year, weekStart: d.weekStart, weekEnd: d.weekEnd, precision: d.precision };
      weekStart = d.weekStart;
      precision = d.precision;
    } else dot = { ok: false, error: d.error };
  }
  let age: TireView["age"] = null;
  let ageLevel: Condition | null = null;
  let ageReason: string | null = null;
  let replaceFrom: string | null = null;
  if (weekStart) {
    const a = ageCondition({
      manufactureWeekStart: weekStart,
      kind: toCoreKind(set.kind),
      today,
      precision,
      overrides: {
        ...(set.ageWatchYears != null ? { watchYears: set.ageWatchYears } : {}),
        ...(set.ageReplaceYears != null ? { replaceYears: set.ageReplaceYears } : {}),
      },
    });
    if (a.ok) {
      age = { years: a.age.years, months: a.age.months, decimalYears: a.age.decimalYears };
      ageLevel = a.level;
      ageReason = a.reason;
      replaceFrom = a.replaceFrom;
    }
  }

  const mine = opts.readings.filter((r) => r.tireId === t.id).sort((a, b) => a.checkedOn.localeCompare(b.checkedOn));
  const series = mine.flatMap((r) => {
    const d = tireDepth(r);
    return d.ok ? [{ date: r.checkedOn, odometerKm: r.odometerKm, depthMm: d.depthMm, approximate: r.approximate }] : [];
  });
  const latest = mine.at(-1) ?? null;
  let depthMm: number | null = null;
  let depthLevel: Condition | null = null;
  let depthReason: string | null = null;
  let pattern: TireView["pattern"] = null;
  if (latest) {
    const d = tireDepth(latest);
    if (d.ok) {
      depthMm = d.depthMm;
      const c = depthCondition({ depthMm: d.depthMm, limitMm: opts.limitMm });
      if (c.ok) {
        depthLevel = c.level;
        depthReason = c.reason;
      }
    }
    // A coin reading has one bracket value, so it says nothing about the shape of the wear.
    if (!latest.approximate) {
      const p = wearPattern(latest);
      if (p.ok) pattern = { kind: p.pattern, likelyCause: p.likelyCause, advice: p.advice, spreadMm: p.spreadMm, source: p.source };
    }
  } else if (t.newDepthMm != null) {
    depthMm = t.newDepthMm;
    const c = depthCondition({ depthMm: t.newDepthMm, limitMm: opts.limitMm });
    if (c.ok) {
      depthLevel = c.level;
      depthReason = `${c.reason} (depth when new)`;
    }
  }

  let projection: TireView["projection"] = null;
  const wearPoints = series.filter((s) => s.odometerKm != null).map((s) => ({ date: s.date, odometerKm: s.odometerKm as number, depthMm: s.depthMm }));
  if (wearPoints.length > 0 && opts.project !== false) {
    const p = projectWear(wearPoints, { limitMm: opts.limitMm, today, odometerHistory: opts.odometerHistory, kmPerDay: opts.distance?.kmPerDay });
    if (p.ok) {
      projection = {
        method: p.method,
        projectedDate: p.projectedDate,
        projectedOdometerKm: p.projectedOdometerKm,
        confidence: p.confidence.level,
        notes: p.notes,
      };
    }
  }
  const levels: TireCondition[] = [ageLevel ?? "unknown", ...(depthLevel ? [depthLevel] : [])];
  const condition = levels.reduce(worseTireCondition);
  // The advice beside the wear shape follows the tire's condition, never the shape alone.
  if (pattern) pattern = { ...pattern, advice: patternAdvice(pattern.kind, condition) };
  return {
    id: t.id,
    position: t.position,
    dotCode: t.dotCode,
    dot,
    age,
    ageLevel,
    ageReason,
    replaceFrom,
    newDepthMm: t.newDepthMm,
    latest,
    depthMm,
    depthLevel,
    depthReason,
    pattern,
    projection,
    condition,
    series,
  };
}

/** A set is in the condition of its worst tire. */
export function setCondition(tires: TireView[]): TireCondition | null {
  const levels = tires.map((t) => t.condition).filter((x): x is TireCondition => x !== null);
  return levels.length ? levels.reduce(worseTireCondition) : null;
}

export { CAUTION };
