// The one place that turns dates, instants, numbers, units and counts into
// text a person reads, through Intl, in the viewer's own locale and time zone.
// Calendar dates ("YYYY-MM-DD": a DOT week, a check day) have no time zone and
// are shown as written; instants (a pass's end, an access-log line) are shown
// in the viewer's zone with the zone's short name.
import { mmToThirtySeconds } from "@/lib/tires/depth";
import { kmToDistance, type DepthUnit, type DistanceUnit, type PressureUnit } from "@/lib/units";

export type FormatPrefs = { locale: string; timeZone: string };

/** Used when nothing is known about the viewer (first visit, e-mail without a zone). */
export const DEFAULT_PREFS: FormatPrefs = { locale: "en-GB", timeZone: "UTC" };

/** The cookie the browser sets with its own IANA zone (components/format/time-zone-cookie). */
export const TIME_ZONE_COOKIE = "fp_tz";

export function isTimeZone(tz: string | null | undefined): tz is string {
  if (!tz || tz.length > 64) return false;
  try {
    new Intl.DateTimeFormat("en", { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

/** The first supported tag of an Accept-Language header; the product's text is English, the numbers follow the viewer. */
export function localeFromAcceptLanguage(header: string | null | undefined): string {
  for (const part of (header ?? "").split(",").slice(0, 8)) {
    const tag = part.split(";")[0]?.trim();
    if (!tag || tag === "*" || tag.length > 35) continue;
    try {
      const [ok] = Intl.DateTimeFormat.supportedLocalesOf([tag]);
      if (ok) return ok;
    } catch {
      // not a well-formed tag: try the next one
    }
  }
  return DEFAULT_PREFS.locale;
}

export function prefsFrom(input: { locale?: string | null; timeZone?: string | null }): FormatPrefs {
  let locale = DEFAULT_PREFS.locale;
  if (input.locale) {
    try {
      locale = Intl.DateTimeFormat.supportedLocalesOf([input.locale])[0] ?? locale;
    } catch {
      // keep the default
    }
  }
  return { locale, timeZone: isTimeZone(input.timeZone) ? input.timeZone : DEFAULT_PREFS.timeZone };
}

type Plural = { one: string; other: string };

export type Formatter = ReturnType<typeof formatter>;

/** Made on first use: an Intl formatter with a time zone costs milliseconds to build, and most pages use a few of them. */
function once<T>(make: () => T): () => T {
  let made: T | undefined;
  return () => (made ??= make());
}

export function formatter(prefs: FormatPrefs) {
  const { locale, timeZone } = prefs;
  const cache = new Map<string, Intl.NumberFormat>();
  const nf = (opts: Intl.NumberFormatOptions) => {
    const key = JSON.stringify(opts);
    let f = cache.get(key);
    if (!f) cache.set(key, (f = new Intl.NumberFormat(locale, opts)));
    return f;
  };
  const rules = once(() => new Intl.PluralRules(locale));
  const calendarDate = once(() => new Intl.DateTimeFormat(locale, { timeZone: "UTC", day: "numeric", month: "short", year: "numeric" }));
  const calendarMonth = once(() => new Intl.DateTimeFormat(locale, { timeZone: "UTC", month: "short", year: "numeric" }));
  const calendarDay = once(() => new Intl.DateTimeFormat(locale, { timeZone: "UTC", weekday: "short", day: "numeric", month: "short", year: "numeric" }));
  const instant = once(() => new Intl.DateTimeFormat(locale, { timeZone, day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", timeZoneName: "short" }));
  const instantTime = once(() => new Intl.DateTimeFormat(locale, { timeZone, hour: "2-digit", minute: "2-digit", timeZoneName: "short" }));
  const instantDate = once(() => new Intl.DateTimeFormat(locale, { timeZone, day: "numeric", month: "short", year: "numeric" }));
  const toDate = (x: Date | string | number) => (x instanceof Date ? x : new Date(x));
  const plainDate = (iso: string) => {
    const [y, m, d] = iso.slice(0, 10).split("-").map(Number);
    return new Date(Date.UTC(y, m - 1, d));
  };
  const unit = (n: number, u: string, digits = 0) => nf({ style: "unit", unit: u, unitDisplay: "long", maximumFractionDigits: digits }).format(n);

  const f = {
    prefs,
    /** A calendar date, `YYYY-MM-DD`, as the viewer writes dates ("5 Mar 2026", "5. März 2026"). */
    date: (iso: string | null | undefined) => (iso ? calendarDate().format(plainDate(iso)) : "—"),
    /** The month of a calendar date ("Mar 2026"), for chart axes. */
    monthYear: (iso: string) => calendarMonth().format(plainDate(iso)),
    /** A calendar date with its weekday. */
    day: (iso: string | null | undefined) => (iso ? calendarDay().format(plainDate(iso)) : "—"),
    /** A moment in time, in the viewer's zone, with the zone's name. */
    dateTime: (at: Date | string | number | null | undefined) => (at == null ? "—" : instant().format(toDate(at))),
    time: (at: Date | string | number) => instantTime().format(toDate(at)),
    /** The calendar day of a moment, in the viewer's zone. */
    dateOf: (at: Date | string | number) => instantDate().format(toDate(at)),
    number: (n: number, digits = 0) => nf({ maximumFractionDigits: digits }).format(n),
    money: (cents: number | null | undefined, currency = "EUR") => {
      if (cents == null) return "—";
      try {
        return nf({ style: "currency", currency }).format(cents / 100);
      } catch {
        return `${nf({ minimumFractionDigits: 2, maximumFractionDigits: 2 }).format(cents / 100)} ${currency}`;
      }
    },
    /** "1 row", "2 rows": the word chosen by Intl.PluralRules for the viewer's locale. */
    count: (n: number, words: Plural) => `${nf({}).format(n)} ${rules().select(n) === "one" ? words.one : words.other}`,
    plural: (n: number, words: Plural) => (rules().select(n) === "one" ? words.one : words.other),
    depth: (mm: number | null | undefined, u: DepthUnit) => {
      if (mm == null || !Number.isFinite(mm)) return "—";
      return u === "32nds" ? `${nf({ maximumFractionDigits: 1 }).format(mmToThirtySeconds(mm))}/32 in` : nf({ style: "unit", unit: "millimeter", maximumFractionDigits: 1 }).format(mm);
    },
    distance: (km: number | null | undefined, u: DistanceUnit) => {
      if (km == null || !Number.isFinite(km)) return "—";
      return nf({ style: "unit", unit: u === "mi" ? "mile" : "kilometer", maximumFractionDigits: 0 }).format(kmToDistance(km, u));
    },
    pressure: (kpa: number | null | undefined, u: PressureUnit) => {
      if (kpa == null || !Number.isFinite(kpa)) return "—";
      if (u === "bar") return `${nf({ maximumFractionDigits: 2 }).format(kpa / 100)} bar`;
      if (u === "psi") return `${nf({ maximumFractionDigits: 1 }).format(kpa / 6.894757293168)} psi`;
      return `${nf({ maximumFractionDigits: 0 }).format(kpa)} kPa`;
    },
    bytes: (n: number) => {
      if (n < 1024) return unit(n, "byte");
      if (n < 1024 * 1024) return nf({ style: "unit", unit: "kilobyte", maximumFractionDigits: 0 }).format(n / 1024);
      return nf({ style: "unit", unit: "megabyte", maximumFractionDigits: 1 }).format(n / (1024 * 1024));
    },
    /** "2 years, 3 months old"; "4 months old"; a tire without a date code has no age. */
    age: (age: { years: number; months: number } | null | undefined) => {
      if (!age) return "age unknown";
      const y = unit(age.years, "year");
      const m = unit(age.months, "month");
      if (age.years === 0) return `${m} old`;
      return age.months ? `${y}, ${m} old` : `${y} old`;
    },
    /** "in 3 days", "2 hours ago". */
    relative: (value: number, u: Intl.RelativeTimeFormatUnit) => new Intl.RelativeTimeFormat(locale, { numeric: "auto" }).format(value, u),
  };
  return f;
}
