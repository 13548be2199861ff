/**
 * Tire age from the manufacture week, and the age condition of a tire.
 * Age counts from the date code (manufacture), not from purchase or fitting
 * (trade-facts §3).
 */
import { addMonths, calendarDifference, toDayNumber } from "./dates";
import { CAUTION, fail, type Result } from "./result";

export type SetKind = "summer" | "all-season" | "all-weather" | "winter";
export type Condition = "good" | "watch" | "plan" | "replace";

export const CONDITION_ORDER: Record<Condition, number> = { good: 0, watch: 1, plan: 2, replace: 3 };

export function worseCondition(a: Condition, b: Condition): Condition {
  return CONDITION_ORDER[a] >= CONDITION_ORDER[b] ? a : b;
}

export type AgeThresholds = {
  /** Years from manufacture when yearly inspection starts. */
  watchYears: number;
  /** Years from manufacture when the tire should go, whatever its tread. */
  replaceYears: number;
  /** Months before `replaceYears` when replacement should be planned. */
  planLeadMonths: number;
};

/** Default lead time for "plan": one season ahead, time to compare and buy. */
export const DEFAULT_PLAN_LEAD_MONTHS = 6;

/**
 * Rules of thumb of the trade [practice] (trade-facts §3): inspect yearly
 * from 5 years, replace at 10 whatever the tread. Winter tires have a softer
 * compound: keep about 4–5 years, replace past 6. All-weather tires are used
 * all year, like all-season ones, so they share the 5/10 rule here; a driver
 * or shop may override any of these per set.
 */
export const AGE_THRESHOLDS: Record<SetKind, AgeThresholds> = {
  summer: { watchYears: 5, replaceYears: 10, planLeadMonths: DEFAULT_PLAN_LEAD_MONTHS },
  "all-season": { watchYears: 5, replaceYears: 10, planLeadMonths: DEFAULT_PLAN_LEAD_MONTHS },
  "all-weather": { watchYears: 5, replaceYears: 10, planLeadMonths: DEFAULT_PLAN_LEAD_MONTHS },
  winter: { watchYears: 4, replaceYears: 6, planLeadMonths: DEFAULT_PLAN_LEAD_MONTHS },
};

export const SET_KINDS: SetKind[] = ["summer", "all-season", "all-weather", "winter"];

export type TireAge = { years: number; months: number; days: number; totalDays: number; decimalYears: number };

/** Age on `today` of a tire whose manufacture week began on `manufactureWeekStart`. */
export function tireAge(
  manufactureWeekStart: unknown,
  opts: { today: string },
): Result<TireAge, "bad-date" | "bad-today" | "before-manufacture"> {
  const start = toDayNumber(manufactureWeekStart);
  if (start === null) return fail("bad-date", "The manufacture date is missing or not a YYYY-MM-DD date.");
  const today = toDayNumber(opts?.today);
  if (today === null) return fail("bad-today", "Today's date is missing or not a YYYY-MM-DD date.");
  if (today < start) {
    return fail("before-manufacture", "That date is before the tire was made, so it has no age yet.");
  }
  const diff = calendarDifference(manufactureWeekStart as string, opts.today);
  const totalDays = today - start;
  return { ok: true, ...diff, totalDays, decimalYears: totalDays / 365.2425 };
}

export type AgeConditionInput = {
  manufactureWeekStart: string;
  kind: SetKind;
  today: string;
  /** Per-set overrides of the defaults in AGE_THRESHOLDS. */
  overrides?: Partial<AgeThresholds>;
  /** A 3-digit pre-2000 code is over 20 years old whichever decade it means. */
  precision?: "week" | "decade-ambiguous";
};

export type AgeConditionOk = {
  level: Condition;
  age: TireAge;
  thresholds: AgeThresholds;
  /** Dates each level begins (the tire is good before watchFrom). */
  watchFrom: string;
  planFrom: string;
  replaceFrom: string;
  /** The next level the tire will reach and when; null once at replace. */
  next: { level: Condition; date: string } | null;
  reason: string;
  basis: string;
  caution: string;
};

const AGE_BASIS =
  "Common practice [practice]: inspect tires yearly from 5 years after manufacture and replace them at 10 years whatever the tread; winter tires keep about 4–5 years and go after 6.";

export function ageCondition(
  input: AgeConditionInput,
): Result<AgeConditionOk, "bad-date" | "bad-today" | "before-manufacture" | "bad-kind" | "bad-threshold"> {
  // Membership first: indexing with an arbitrary value could hit "constructor" or throw on a null-prototype object.
  if (!SET_KINDS.includes(input?.kind)) return fail("bad-kind", "Choose the kind of set: summer, all-season, all-weather or winter.");
  const base = AGE_THRESHOLDS[input.kind];
  const age = tireAge(input.manufactureWeekStart, { today: input.today });
  if (!age.ok) return age;
  const t: AgeThresholds = { ...base, ...stripUndefined(input.overrides ?? {}) };
  const valid = (n: number) => Number.isFinite(n) && n >= 0 && n <= 100;
  if (!valid(t.watchYears) || !valid(t.replaceYears) || !valid(t.planLeadMonths) || t.watchYears > t.replaceYears) {
    return fail(
      "bad-threshold",
      "The age limits for this set do not make sense: the inspection age must be a number of years no later than the replacement age.",
    );
  }
  const start = input.manufactureWeekStart;
  const watchFrom = addMonths(start, Math.round(t.watchYears * 12));
  const replaceFrom = addMonths(start, Math.round(t.replaceYears * 12));
  let planFrom = addMonths(replaceFrom, -Math.round(t.planLeadMonths));
  if (planFrom < watchFrom) planFrom = watchFrom;

  let level: Condition;
  let reason: string;
  if (input.precision === "decade-ambiguous") {
    level = "replace";
    reason =
      "This tire carries a 3-digit date code, so it was made before 2000 and is over 20 years old: replace it.";
  } else if (input.today >= replaceFrom) {
    level = "replace";
    reason = `The tire is ${age.years} years old; tires of this kind should be replaced at ${t.replaceYears} years whatever the tread.`;
  } else if (input.today >= planFrom) {
    level = "plan";
    reason = `The tire reaches ${t.replaceYears} years on ${replaceFrom}: plan its replacement.`;
  } else if (input.today >= watchFrom) {
    level = "watch";
    reason = `The tire is ${age.years} years old: have it inspected at least once a year.`;
  } else {
    level = "good";
    reason = `The tire is ${age.years} years old, younger than the ${t.watchYears}-year inspection age.`;
  }
  const upcoming: { level: Condition; date: string }[] = [
    { level: "watch" as const, date: watchFrom },
    { level: "plan" as const, date: planFrom },
    { level: "replace" as const, date: replaceFrom },
  ].filter((x) => CONDITION_ORDER[x.level] > CONDITION_ORDER[level]);
  return {
    ok: true,
    level,
    age,
    thresholds: t,
    watchFrom,
    planFrom,
    replaceFrom,
    next: upcoming[0] ?? null,
    reason,
    basis: AGE_BASIS,
    caution: CAUTION,
  };
}

function stripUndefined<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}
