/**
 * Calendar dates as ISO `YYYY-MM-DD` strings, computed on UTC day numbers so
 * that no time zone or daylight-saving change can shift a date by one.
 */

const DAY_MS = 86_400_000;
const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Days since 1970-01-01 for a valid ISO date, or null. */
export function toDayNumber(iso: unknown): number | null {
  if (typeof iso !== "string") return null;
  const m = ISO_DATE.exec(iso);
  if (!m) return null;
  const y = Number(m[1]);
  const mo = Number(m[2]);
  const d = Number(m[3]);
  const ms = Date.UTC(y, mo - 1, d);
  const back = new Date(ms);
  // Date.UTC rolls 31 Feb over to March; a real date survives the round trip.
  if (back.getUTCFullYear() !== y || back.getUTCMonth() !== mo - 1 || back.getUTCDate() !== d) return null;
  return Math.round(ms / DAY_MS);
}

export function isIsoDate(iso: unknown): iso is string {
  return toDayNumber(iso) !== null;
}

export function fromDayNumber(day: number): string {
  const dt = new Date(day * DAY_MS);
  const y = dt.getUTCFullYear();
  const m = String(dt.getUTCMonth() + 1).padStart(2, "0");
  const d = String(dt.getUTCDate()).padStart(2, "0");
  return `${String(y).padStart(4, "0")}-${m}-${d}`;
}

/** Day of the week, 0 = Sunday, as the TIN rule counts weeks from Sunday. */
export function weekday(day: number): number {
  // 1970-01-01 was a Thursday (4).
  return (((day + 4) % 7) + 7) % 7;
}

export function dayNumberOf(year: number, month: number, dayOfMonth: number): number {
  return Math.round(Date.UTC(year, month - 1, dayOfMonth) / DAY_MS);
}

/**
 * Adds whole calendar months; a day that does not exist in the target month
 * falls back to that month's last day (29 Feb + 1 year = 28 Feb).
 */
export function addMonths(iso: string, months: number): string {
  const m = ISO_DATE.exec(iso) as RegExpExecArray;
  const y = Number(m[1]);
  const mo = Number(m[2]) - 1 + months;
  const d = Number(m[3]);
  const targetYear = y + Math.floor(mo / 12);
  const targetMonth = ((mo % 12) + 12) % 12;
  const lastDay = new Date(Date.UTC(targetYear, targetMonth + 1, 0)).getUTCDate();
  return fromDayNumber(dayNumberOf(targetYear, targetMonth + 1, Math.min(d, lastDay)));
}

export function addDays(iso: string, days: number): string {
  return fromDayNumber((toDayNumber(iso) as number) + days);
}

/** Whole calendar years, months and days from `from` to `to` (to ≥ from). */
export function calendarDifference(from: string, to: string): { years: number; months: number; days: number } {
  const [fy, fm] = from.split("-").map(Number);
  const [ty, tm] = to.split("-").map(Number);
  let months = (ty - fy) * 12 + (tm - fm);
  // Same month-end fallback as addMonths, so 29 Feb + 1 year is a full year on 28 Feb, as the age dates say.
  if (addMonths(from, months) > to) months -= 1;
  const anchor = addMonths(from, months);
  const days = (toDayNumber(to) as number) - (toDayNumber(anchor) as number);
  return { years: Math.floor(months / 12), months: months % 12, days };
}
