/**
 * DOT tire identification number (TIN) and its date code, by 49 CFR 574.5.
 *
 * The week rule is the regulation's, not ISO 8601: weeks run Sunday to
 * Saturday, week 01 is the first full week of the year (it starts on the first
 * Sunday on or after 1 January), days before it belong to the previous year's
 * last week, so a year has 52 or 53 weeks.
 */
import { addDays, dayNumberOf, fromDayNumber, toDayNumber, weekday } from "./dates";
import { fail, type Result } from "./result";

/** Day number of the Sunday that opens week 01 of `year`. */
export function dotWeekOneStart(year: number): number {
  const jan1 = dayNumberOf(year, 1, 1);
  return jan1 + ((7 - weekday(jan1)) % 7);
}

/** 52 or 53: the number of Sundays that open a full TIN week in `year`. */
export function dotWeeksInYear(year: number): number {
  return (dotWeekOneStart(year + 1) - dotWeekOneStart(year)) / 7;
}

/** ISO date of the Sunday that opens `week` of `year` (week not checked). */
export function dotWeekStart(week: number, year: number): string {
  return fromDayNumber(dotWeekOneStart(year) + 7 * (week - 1));
}

/** The TIN week (and its year) that contains an ISO date. */
export function dotWeekOf(iso: string): { week: number; year: number } | null {
  const day = toDayNumber(iso);
  if (day === null) return null;
  const y = Number(iso.slice(0, 4));
  const year = day >= dotWeekOneStart(y) ? y : y - 1;
  return { week: Math.floor((day - dotWeekOneStart(year)) / 7) + 1, year };
}

export type DotErrorCode =
  | "not-text"
  | "empty"
  | "bad-characters"
  | "wrong-length"
  | "letters-in-date"
  | "week-zero"
  | "week-out-of-range"
  | "future-week"
  | "bad-today";

export type DotLayout = "date-code-only" | "pre-2015" | "2015";

export type DotDecoded = {
  /** The symbols as read: upper case, no spaces, no "DOT". */
  normalized: string;
  dateCode: string;
  week: number;
  /**
   * Four-digit codes: the year. Three-digit (pre-2000) codes: the later of the
   * two possible years, so an age computed from it is the youngest possible.
   */
  year: number;
  /** Both decades a three-digit code may mean, oldest first. */
  yearCandidates: number[];
  weekStart: string;
  weekEnd: string;
  precision: "week" | "decade-ambiguous";
  layout: DotLayout;
  plantCode?: string;
  /** Symbols between the plant code and the date code, when a full TIN was given. */
  manufacturerCode?: string;
};

export type DotResult = Result<DotDecoded, DotErrorCode>;

const MSG = {
  notText: "Type the DOT code as letters and digits, for example DOT U2LL LMLR 4518.",
  empty: "The DOT code is empty. Type the last group of digits on the sidewall, for example 4518.",
  badCharacters: "A DOT code holds only letters and digits. Check the code on the sidewall and type it again.",
  wrongLength:
    "That DOT code has the wrong length. A full code has 8 to 13 letters and digits after \"DOT\"; the date code alone is its last 4 digits (3 on tires made before 2000).",
  lettersInDate:
    "The date code (the last 4 digits of the DOT code) must be digits only. Check the sidewall: a letter O may be a zero.",
  weekZero: "Week 00 does not exist in a DOT date code: weeks run from 01. Check the first two digits of the date code.",
  weekRange: (week: number, year: number, weeks: number) =>
    `Week ${String(week).padStart(2, "0")} does not exist in ${year}: that year has ${weeks} weeks in a DOT date code. Check the date code on the sidewall.`,
  future: (start: string) =>
    `That date code points to a week starting ${start}, which has not begun yet. Check the date code on the sidewall.`,
  badToday: "Today's date is missing or not a YYYY-MM-DD date.",
} as const;

/**
 * Reads a whole TIN ("DOT U2LL LMLR 4518") or a bare date code ("4518",
 * "031"). Case, spaces and hyphens do not matter; "DOT" is optional.
 *
 * A TIN ending in four digits is read with a 4-digit date code: those have
 * been required since July 2000 and tires older than that are rare on the
 * road, while a 3-digit reading of the same symbols would call a new tire 20+
 * years old. The plant code is 3 symbols in a 13-symbol TIN (the 2015 layout)
 * and 2 symbols in the older layout.
 */
export function decodeDotCode(input: unknown, opts: { today: string }): DotResult {
  const todayDay = toDayNumber(opts?.today);
  if (todayDay === null) return fail("bad-today", MSG.badToday);
  if (typeof input !== "string") return fail("not-text", MSG.notText);
  let s = input.toUpperCase().replace(/[\s\-–—.]+/g, "");
  if (s.startsWith("DOT")) s = s.slice(3);
  if (s.length === 0) return fail("empty", MSG.empty);
  if (!/^[A-Z0-9]+$/.test(s)) return fail("bad-characters", MSG.badCharacters);

  let dateCode: string;
  let layout: DotLayout;
  let plantCode: string | undefined;
  if (s.length === 3 || s.length === 4) {
    dateCode = s;
    layout = "date-code-only";
  } else if (s.length >= 7 && s.length <= 13) {
    const last4 = s.slice(-4);
    const last3 = s.slice(-3);
    if (/^\d{4}$/.test(last4) && s.length >= 8) dateCode = last4;
    else if (/^\d{3}$/.test(last3) && s.length <= 11) dateCode = last3;
    else if (s.length === 7) return fail("wrong-length", MSG.wrongLength);
    else return fail("letters-in-date", MSG.lettersInDate);
    layout = s.length === 13 ? "2015" : "pre-2015";
    plantCode = s.slice(0, layout === "2015" ? 3 : 2);
  } else {
    return fail("wrong-length", MSG.wrongLength);
  }
  if (!/^\d+$/.test(dateCode)) return fail("letters-in-date", MSG.lettersInDate);

  const week = Number(dateCode.slice(0, 2));
  if (week === 0) return fail("week-zero", MSG.weekZero);

  let year: number;
  let yearCandidates: number[];
  if (dateCode.length === 4) {
    // Four-digit codes only exist from 2000 on, so "00" is 2000, not 1900.
    year = 2000 + Number(dateCode.slice(2));
    yearCandidates = [year];
    const weeks = dotWeeksInYear(year);
    if (week > weeks) return fail("week-out-of-range", MSG.weekRange(week, year, weeks));
  } else {
    const digit = Number(dateCode[2]);
    yearCandidates = [1980 + digit, 1990 + digit].filter((y) => week <= dotWeeksInYear(y));
    if (yearCandidates.length === 0) {
      return fail("week-out-of-range", MSG.weekRange(week, 1990 + digit, dotWeeksInYear(1990 + digit)));
    }
    year = yearCandidates[yearCandidates.length - 1];
  }

  const weekStart = dotWeekStart(week, year);
  if ((toDayNumber(weekStart) as number) > todayDay) return fail("future-week", MSG.future(weekStart));

  const decoded: DotDecoded = {
    normalized: s,
    dateCode,
    week,
    year,
    yearCandidates,
    weekStart,
    weekEnd: addDays(weekStart, 6),
    precision: dateCode.length === 4 ? "week" : "decade-ambiguous",
    layout,
  };
  if (plantCode !== undefined) {
    decoded.plantCode = plantCode;
    decoded.manufacturerCode = s.slice(plantCode.length, s.length - dateCode.length);
  }
  return { ok: true, ...decoded };
}

/** The 4-digit date code for a TIN week ("0109" for week 1 of 2009). */
export function formatDotDateCode(week: number, year: number): string {
  return String(week).padStart(2, "0") + String(year % 100).padStart(2, "0");
}
