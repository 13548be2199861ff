/**
 * Every dated item the logbook implies: age watch and age replace per set,
 * the projected depth limit, seasonal swaps and rotations. The calendar feed
 * and e-mails are built from these, so each item's id stays the same when
 * its date moves (it becomes the calendar UID).
 */
import { ageCondition, DEFAULT_PLAN_LEAD_MONTHS, SET_KINDS, type AgeThresholds, type SetKind } from "./age";
import { addMonths, dayNumberOf, fromDayNumber, toDayNumber } from "./dates";
import { depthLimit, JURISDICTIONS, tireDepth, type Jurisdiction } from "./depth";
import { decodeDotCode } from "./dot";
import type { Position } from "./patterns";
import { CAUTION, fail, type Result } from "./result";
import { distancePerDay, projectWear, type OdometerEntry, type WearReading } from "./wear";

/** One tread check of one tire. Distances are kilometres: the app converts miles before calling. */
export type TreadCheckInput = {
  date: string;
  odometerKm: number;
  innerMm?: number | null;
  centreMm?: number | null;
  outerMm?: number | null;
};

export type TireInput = {
  id: string;
  position: Position;
  /** The DOT code as typed (full TIN or date code). */
  dotCode?: string | null;
  /** Used when there is no DOT code, e.g. a week entered by hand. */
  manufactureWeekStart?: string | null;
  readings?: readonly TreadCheckInput[];
};

export type SetState = "mounted" | "stored" | "retired";

export type SetInput = {
  id: string;
  name?: string | null;
  kind: SetKind;
  state: SetState;
  ageOverrides?: Partial<AgeThresholds>;
  /** A per-set depth limit in mm, replacing the jurisdiction's. */
  depthLimitMm?: number | null;
  /** When the set went onto the car (start of the rotation count if never rotated). */
  mountedAt?: OdometerEntry | null;
  lastRotation?: OdometerEntry | null;
  tires: readonly TireInput[];
};

export type VehicleInput = {
  id: string;
  nickname?: string | null;
  odometerHistory?: readonly OdometerEntry[];
  sets: readonly SetInput[];
};

export type LogbookInput = { vehicles: readonly VehicleInput[] };

export type ReminderSettings = {
  jurisdiction?: Jurisdiction;
  customDepthMm?: number;
  planLeadMonths?: number;
  /** Rotation interval; default 10,000 km, inside the 8,000–13,000 km of trade-facts §6 [sec]. */
  rotationIntervalKm?: number;
  /** Month-day ("MM-DD") to fit a stored winter set. */
  autumnSwap?: string;
  /** Month-day ("MM-DD") to take the winter set off. */
  springSwap?: string;
};

export const DEFAULT_REMINDER_SETTINGS: Required<Omit<ReminderSettings, "customDepthMm">> = {
  jurisdiction: "practice",
  planLeadMonths: DEFAULT_PLAN_LEAD_MONTHS,
  rotationIntervalKm: 10_000,
  autumnSwap: "10-15",
  springSwap: "04-15",
};

export type ReminderKind = "age-watch" | "age-replace" | "depth-limit" | "seasonal-swap" | "rotation-due";
/** How pressing the item is today, in the words of the tire conditions, plus "info". */
export type ReminderSeverity = "info" | "watch" | "plan" | "replace";

export type ReminderItem = {
  id: string;
  kind: ReminderKind;
  vehicleId: string;
  setId?: string;
  subject: string;
  date: string;
  severity: ReminderSeverity;
  overdue: boolean;
  explanation: string;
};

export type Skipped = { vehicleId: string; setId?: string; tireId?: string; reason: string };

export type RemindersOk = { items: ReminderItem[]; skipped: Skipped[] };

/** Stable per vehicle, set and kind: the calendar UID must survive a date change. */
export function reminderId(vehicleId: string, setId: string, kind: ReminderKind): string {
  return `${encodeURIComponent(vehicleId)}/${encodeURIComponent(setId)}/${kind}`;
}

const MONTH_DAY = /^(\d{2})-(\d{2})$/;

function validMonthDay(md: unknown): md is string {
  if (typeof md !== "string") return false;
  const m = MONTH_DAY.exec(md);
  // 2024 is a leap year, so 02-29 is accepted and falls back to 28 Feb elsewhere.
  return !!m && toDayNumber(`2024-${md}`) !== null;
}

/** The first date on or after `today` with the given month-day. */
function nextMonthDay(md: string, today: string): string {
  const [m, d] = md.split("-").map(Number);
  const y = Number(today.slice(0, 4));
  for (const year of [y, y + 1]) {
    const last = new Date(Date.UTC(year, m, 0)).getUTCDate();
    const iso = fromDayNumber(dayNumberOf(year, m, Math.min(d, last)));
    if (iso >= today) return iso;
  }
  /* c8 ignore next */
  return today;
}

/** The latest date on or before `today` with this month-day. */
function lastMonthDay(md: string, today: string): string {
  const [m, d] = md.split("-").map(Number);
  const y = Number(today.slice(0, 4));
  for (const year of [y, y - 1]) {
    const last = new Date(Date.UTC(year, m, 0)).getUTCDate();
    const iso = fromDayNumber(dayNumberOf(year, m, Math.min(d, last)));
    if (iso <= today) return iso;
  }
  /* c8 ignore next */
  return today;
}

/**
 * When a winter set is still where it was after its change date passed (a
 * stored set in December, a mounted one in June), the swap is overdue since
 * that date; otherwise it is due on the next one.
 */
export function seasonalSwapDate(mounted: boolean, autumn: string, spring: string, today: string): { date: string; overdue: boolean } {
  const target = mounted ? spring : autumn;
  const opposite = mounted ? autumn : spring;
  const lastTarget = lastMonthDay(target, today);
  if (lastTarget > lastMonthDay(opposite, today)) return { date: lastTarget, overdue: lastTarget < today };
  return { date: nextMonthDay(target, today), overdue: false };
}

function severityFor(date: string, today: string, leadMonths: number): ReminderSeverity {
  if (date <= today) return "replace";
  if (addMonths(date, -leadMonths) <= today) return "plan";
  return "info";
}

export function computeReminders(
  logbook: LogbookInput,
  settings: ReminderSettings,
  opts: { today: string },
): Result<RemindersOk, "bad-today" | "bad-settings" | "bad-logbook"> {
  const today = opts?.today;
  if (toDayNumber(today) === null) return fail("bad-today", "Today's date is missing or not a YYYY-MM-DD date.");
  const s = { ...DEFAULT_REMINDER_SETTINGS, ...Object.fromEntries(Object.entries(settings ?? {}).filter(([, v]) => v !== undefined)) } as Required<Omit<ReminderSettings, "customDepthMm">> & { customDepthMm?: number };
  if (
    !JURISDICTIONS.includes(s.jurisdiction) ||
    !validMonthDay(s.autumnSwap) ||
    !validMonthDay(s.springSwap) ||
    !(Number.isFinite(s.planLeadMonths) && s.planLeadMonths >= 0 && s.planLeadMonths <= 60) ||
    !(Number.isFinite(s.rotationIntervalKm) && s.rotationIntervalKm > 0)
  ) {
    return fail(
      "bad-settings",
      "The reminder settings are incomplete: check the region, the swap dates (month-day), the lead time and the rotation interval.",
    );
  }
  const vehicles: readonly VehicleInput[] | undefined = logbook?.vehicles;
  if (!Array.isArray(vehicles)) return fail("bad-logbook", "The logbook could not be read.");

  const items: ReminderItem[] = [];
  const skipped: Skipped[] = [];
  const withCaution = (text: string) => `${text} ${CAUTION}`;

  for (const vehicle of vehicles as readonly VehicleInput[]) {
    const vehicleName = vehicle.nickname || "your vehicle";
    const sets = (vehicle.sets ?? []).filter((set) => set.state !== "retired");
    for (const set of sets) {
      if (!SET_KINDS.includes(set.kind)) {
        skipped.push({ vehicleId: vehicle.id, setId: set.id, reason: "The set has no known kind (summer, all-season, all-weather, winter)." });
        continue;
      }
      const label = `${set.name || `${set.kind} set`} on ${vehicleName}`;
      const base = { vehicleId: vehicle.id, setId: set.id };

      // Age, from the oldest tire: the set is as old as its oldest member.
      let oldest: { weekStart: string; precision: "week" | "decade-ambiguous"; tireId: string } | null = null;
      for (const tire of set.tires ?? []) {
        let weekStart: string | null = null;
        let precision: "week" | "decade-ambiguous" = "week";
        if (tire.dotCode) {
          const d = decodeDotCode(tire.dotCode, { today });
          if (!d.ok) {
            skipped.push({ ...base, tireId: tire.id, reason: d.error });
            continue;
          }
          weekStart = d.weekStart;
          precision = d.precision;
        } else if (tire.manufactureWeekStart && toDayNumber(tire.manufactureWeekStart) !== null && tire.manufactureWeekStart <= today) {
          weekStart = tire.manufactureWeekStart;
        }
        if (weekStart === null) continue;
        const older = oldest === null || precision === "decade-ambiguous" || (oldest.precision === "week" && weekStart < oldest.weekStart);
        if (older) oldest = { weekStart, precision, tireId: tire.id };
      }
      if (oldest) {
        const age = ageCondition({
          manufactureWeekStart: oldest.weekStart,
          kind: set.kind,
          today,
          precision: oldest.precision,
          overrides: { planLeadMonths: s.planLeadMonths, ...(set.ageOverrides ?? {}) },
        });
        if (!age.ok) {
          skipped.push({ ...base, tireId: oldest.tireId, reason: age.error });
        } else {
          const replaceDate = oldest.precision === "decade-ambiguous" && age.replaceFrom > today ? today : age.replaceFrom;
          if (today < replaceDate) {
            items.push({
              ...base,
              id: reminderId(vehicle.id, set.id, "age-watch"),
              kind: "age-watch",
              subject: `${label}: tires reach ${age.thresholds.watchYears} years, inspect yearly`,
              date: age.watchFrom,
              severity: "watch",
              overdue: age.watchFrom < today,
              explanation: withCaution(
                `The oldest tire of this set was made in the week of ${dayText(oldest.weekStart)}. From ${age.thresholds.watchYears} years on, common practice is to have tires inspected at least once a year.`,
              ),
            });
          }
          items.push({
            ...base,
            id: reminderId(vehicle.id, set.id, "age-replace"),
            kind: "age-replace",
            subject: `${label}: tires reach ${age.thresholds.replaceYears} years, replace them`,
            date: replaceDate,
            severity: severityFor(replaceDate, today, age.thresholds.planLeadMonths),
            overdue: replaceDate < today,
            explanation: withCaution(
              oldest.precision === "decade-ambiguous"
                ? "A tire of this set has a 3-digit date code, so it was made before 2000: it should be replaced now."
                : `The oldest tire of this set was made in the week of ${dayText(oldest.weekStart)}. Common practice is to replace ${set.kind} tires ${age.thresholds.replaceYears} years after manufacture, whatever the tread.`,
            ),
          });
        }
      }

      if (set.state !== "mounted") continue;

      const readingsOf = (tire: TireInput): WearReading[] =>
        (tire.readings ?? []).flatMap((r) => {
          const d = tireDepth(r);
          return d.ok ? [{ date: r.date, odometerKm: r.odometerKm, depthMm: d.depthMm }] : [];
        });
      const allReadings = (set.tires ?? []).flatMap(readingsOf);
      const history: OdometerEntry[] = [...(vehicle.odometerHistory ?? []), ...allReadings];

      // Depth: the first tire to reach the limit sets the date for the set.
      const limit = setDepthLimit(set, s, today);
      if (!limit.ok) {
        skipped.push({ ...base, reason: limit.error });
      } else {
        let first: { tireId: string; date: string; odo: number; method: string; confidence: string } | null = null;
        for (const tire of set.tires ?? []) {
          const readings = readingsOf(tire);
          if (readings.length === 0) continue;
          const p = projectWear(readings, { limitMm: limit.mm, today, odometerHistory: history });
          if (!p.ok || p.projectedDate === null) continue;
          if (first === null || p.projectedDate < first.date) {
            first = { tireId: tire.id, date: p.projectedDate, odo: p.projectedOdometerKm, method: p.method, confidence: p.confidence.level };
          }
        }
        if (first) {
          const how =
            first.method === "typical-rate"
              ? "estimated from a typical wear rate of about 1 mm per 10,000 km, because there are too few checks"
              : `projected from the tread checks (confidence: ${first.confidence})`;
          items.push({
            ...base,
            id: reminderId(vehicle.id, set.id, "depth-limit"),
            kind: "depth-limit",
            subject: `${label}: tread reaches ${round1(limit.mm)} mm`,
            date: first.date,
            severity: severityFor(first.date, today, s.planLeadMonths),
            overdue: first.date < today,
            explanation: withCaution(
              `The first tire of this set should reach the ${round1(limit.mm)} mm limit (${limit.source}) around ${km(first.odo)} km; the date is ${how}.`,
            ),
          });
        }
      }

      // Rotation, counted from the last rotation, else from mounting, else from the first check.
      const firstReading = [...allReadings].filter((r) => toDayNumber(r.date) !== null).sort((a, b) => a.date.localeCompare(b.date))[0];
      const start = set.lastRotation ?? set.mountedAt ?? firstReading ?? null;
      const rate = distancePerDay(history.filter((h) => typeof h?.date === "string" && h.date <= today));
      const startDay = toDayNumber(start?.date);
      if (!start || startDay === null || !Number.isFinite(start.odometerKm)) {
        skipped.push({ ...base, reason: "No rotation or fitting date with an odometer reading, so no rotation reminder." });
      } else if (rate.kmPerDay <= 0) {
        skipped.push({ ...base, reason: "The odometer history shows no driving yet, so no rotation date can be set." });
      } else {
        const dueKm = start.odometerKm + s.rotationIntervalKm;
        const anchor = history
          .filter((h) => toDayNumber(h.date) !== null && h.date <= today && Number.isFinite(h.odometerKm))
          .sort((a, b) => a.date.localeCompare(b.date) || a.odometerKm - b.odometerKm)
          .pop() as OdometerEntry;
        const anchorDay = toDayNumber(anchor.date) as number;
        const day = Math.max(startDay, anchorDay + Math.ceil((dueKm - anchor.odometerKm) / rate.kmPerDay));
        const date = fromDayNumber(Math.min(day, anchorDay + 365 * 50));
        items.push({
          ...base,
          id: reminderId(vehicle.id, set.id, "rotation-due"),
          kind: "rotation-due",
          subject: `${label}: rotation due at ${km(dueKm)} km`,
          date,
          severity: date < today ? "watch" : "info",
          overdue: date < today,
          explanation: withCaution(
            `Tires are commonly rotated every ${km(s.rotationIntervalKm)} km or as the vehicle's manual says; at about ${Math.round(rate.kmPerDay)} km a day this falls around ${dayText(date)}.`,
          ),
        });
      }
    }

    // Seasonal swap: one item per winter set, pointing at the next change of season.
    for (const set of sets.filter((x) => x.kind === "winter")) {
      const mounted = set.state === "mounted";
      const { date, overdue } = seasonalSwapDate(mounted, s.autumnSwap, s.springSwap, today as string);
      const label = `${set.name || "winter set"} on ${vehicleName}`;
      items.push({
        vehicleId: vehicle.id,
        setId: set.id,
        id: reminderId(vehicle.id, set.id, "seasonal-swap"),
        kind: "seasonal-swap",
        subject: mounted ? `${label}: time to take the winter tires off` : `${label}: time to fit the winter tires`,
        date,
        severity: overdue ? "watch" : "info",
        overdue,
        explanation: withCaution(
          mounted
            ? "Winter tires wear faster in warm weather; swap when the season turns, on the date you chose."
            : "Fit the winter set before the cold season, on the date you chose; some countries require winter tires or a minimum depth in their winter period.",
        ),
      });
    }
  }
  items.sort((a, b) => a.date.localeCompare(b.date) || a.id.localeCompare(b.id));
  return { ok: true, items, skipped };
}

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/**
 * A calendar date in the explanation's prose as "28 Mar 2021": day, month
 * name, year reads one way in every English-speaking country, unlike an ISO
 * date or a numeric one, and needs no locale data (the core runs anywhere).
 */
export function dayText(iso: string): string {
  const [y, m, d] = iso.split("-").map(Number);
  return `${d} ${MONTHS[m - 1]} ${y}`;
}

/** Thousands with commas, without depending on the runtime's locale data. */
function km(n: number): string {
  return String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, ",");
}

function round1(n: number): number {
  return Math.round(n * 10) / 10;
}

/**
 * Sets used in winter (all but summer sets) are held to the stricter of
 * today's limit and the mid-January one, so a winter-period minimum is not
 * missed by a forecast made in summer.
 */
function setDepthLimit(
  set: SetInput,
  s: { jurisdiction: Jurisdiction; customDepthMm?: number },
  today: string,
): { ok: true; mm: number; source: string } | { ok: false; error: string } {
  if (typeof set.depthLimitMm === "number" && Number.isFinite(set.depthLimitMm) && set.depthLimitMm > 0 && set.depthLimitMm <= 20) {
    return { ok: true, mm: set.depthLimitMm, source: "the limit set for this set" };
  }
  const season = set.kind === "summer" || set.kind === "all-season" ? "summer" : "winter";
  const dates = set.kind === "summer" ? [today] : [today, `${today.slice(0, 4)}-01-15`];
  let best: { ok: true; mm: number; source: string } | null = null;
  for (const date of dates) {
    const l = depthLimit({ jurisdiction: s.jurisdiction, season, date, customMm: s.customDepthMm });
    if (!l.ok) return { ok: false, error: l.error };
    if (best === null || l.minMm > best.mm) best = { ok: true, mm: l.minMm, source: l.source };
  }
  return best as { ok: true; mm: number; source: string };
}
