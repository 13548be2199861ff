import { describe, expect, it } from "vitest";
import { formatter, localeFromAcceptLanguage, prefsFrom } from "@/lib/format";

// Expected texts are CLDR's patterns as shipped with Node's full ICU [memory: CLDR 4x data];
// zone offsets follow the EU summer-time rule (Directive 2000/84/EC: last Sunday of March to
// last Sunday of October, 01:00 UTC) and the US rule (15 U.S.C. §260a: second Sunday of March
// to first Sunday of November).
const nbsp = (s: string) => s.replace(/[\u00a0\u202f]/g, " ");

describe("the formatting module", () => {
  it("builds an Intl formatter only when a text needs it, and once", () => {
    // A formatter is made per request on the server and on every page start in
    // the browser; building the zone-aware Intl objects up front cost ~60 ms of a
    // phone page's start (a Chromium CPU profile under 4x throttling).
    const made = { dates: 0, rules: 0 };
    const { DateTimeFormat, PluralRules } = Intl;
    // PluralRules is typed read-only; at run time both are writable, as ECMA-402 defines them.
    const intl = Intl as { -readonly [K in keyof typeof Intl]: (typeof Intl)[K] };
    intl.DateTimeFormat = class extends DateTimeFormat {
      constructor(...args: ConstructorParameters<typeof DateTimeFormat>) {
        super(...args);
        made.dates += 1;
      }
    } as typeof DateTimeFormat;
    intl.PluralRules = class extends PluralRules {
      constructor(...args: ConstructorParameters<typeof PluralRules>) {
        super(...args);
        made.rules += 1;
      }
    } as typeof PluralRules;
    try {
      const f = formatter({ locale: "en-GB", timeZone: "Europe/Berlin" });
      expect(made).toEqual({ dates: 0, rules: 0 });
      expect(f.date("2026-03-01")).toBe("1 Mar 2026");
      expect(f.date("2026-03-02")).toBe("2 Mar 2026");
      expect(made.dates).toBe(1);
      expect(nbsp(f.time("2026-01-15T12:00:00Z"))).toBe("13:00 CET");
      expect(made.dates).toBe(2);
      expect(f.plural(2, { one: "row", other: "rows" })).toBe("rows");
      expect(f.plural(1, { one: "row", other: "rows" })).toBe("row");
      expect(made.rules).toBe(1);
    } finally {
      intl.DateTimeFormat = DateTimeFormat;
      intl.PluralRules = PluralRules;
    }
  });

  it("shows an instant in the viewer's zone, with the zone's name", () => {
    const berlin = formatter({ locale: "en-GB", timeZone: "Europe/Berlin" });
    // 12:00 UTC in January is 13:00 CET; in July 14:00 CEST.
    expect(nbsp(berlin.dateTime("2026-01-15T12:00:00Z"))).toBe("15 Jan 2026, 13:00 CET");
    expect(nbsp(berlin.dateTime("2026-07-15T12:00:00Z"))).toBe("15 Jul 2026, 14:00 CEST");
    // The EU change on Sunday 29 March 2026 at 01:00 UTC.
    expect(nbsp(berlin.time("2026-03-29T00:59:00Z"))).toBe("01:59 CET");
    expect(nbsp(berlin.time("2026-03-29T01:00:00Z"))).toBe("03:00 CEST");
    const ny = formatter({ locale: "en-US", timeZone: "America/New_York" });
    // US change on Sunday 8 March 2026 at 07:00 UTC (02:00 EST).
    expect(nbsp(ny.time("2026-03-08T06:59:00Z"))).toBe("01:59 AM EST");
    expect(nbsp(ny.time("2026-03-08T07:00:00Z"))).toBe("03:00 AM EDT");
    // The calendar day of a late-evening instant is the viewer's day, not UTC's.
    expect(ny.dateOf("2026-05-02T02:30:00Z")).toBe("May 1, 2026");
  });

  it("never moves a calendar date, whatever the zone", () => {
    for (const timeZone of ["Pacific/Kiritimati", "Pacific/Pago_Pago", "UTC"]) {
      expect(formatter({ locale: "en-GB", timeZone }).date("2026-03-01")).toBe("1 Mar 2026");
    }
    expect(formatter({ locale: "de-DE", timeZone: "UTC" }).date("2026-03-01")).toBe("1. März 2026");
    expect(formatter({ locale: "en-US", timeZone: "UTC" }).date("2026-03-01")).toBe("Mar 1, 2026");
    expect(formatter({ locale: "en-GB", timeZone: "UTC" }).date(null)).toBe("—");
  });

  it("chooses words with Intl.PluralRules: 1 row, 2 rows, 0 rows", () => {
    const f = formatter({ locale: "en-GB", timeZone: "UTC" });
    const rows = { one: "row", other: "rows" };
    expect(f.count(1, rows)).toBe("1 row");
    expect(f.count(0, rows)).toBe("0 rows");
    expect(f.count(2, rows)).toBe("2 rows");
    expect(f.count(1200, rows)).toBe("1,200 rows");
  });

  it("writes ages with plural units and without 'y'/'m' abbreviations", () => {
    const f = formatter({ locale: "en-GB", timeZone: "UTC" });
    expect(f.age({ years: 1, months: 0 })).toBe("1 year old");
    expect(f.age({ years: 0, months: 2 })).toBe("2 months old");
    expect(f.age({ years: 3, months: 1 })).toBe("3 years, 1 month old");
    expect(f.age(null)).toBe("age unknown");
  });

  it("groups and separates numbers as the viewer's locale does", () => {
    // 1 mi = 1.609344 km (international mile); 6.35 mm = 8/32 in (1 in = 25.4 mm).
    expect(nbsp(formatter({ locale: "en-GB", timeZone: "UTC" }).distance(73_740, "km"))).toBe("73,740 km");
    expect(nbsp(formatter({ locale: "de-DE", timeZone: "UTC" }).distance(73_740, "km"))).toBe("73.740 km");
    expect(nbsp(formatter({ locale: "en-US", timeZone: "UTC" }).distance(160.9344, "mi"))).toBe("100 mi");
    expect(nbsp(formatter({ locale: "de-DE", timeZone: "UTC" }).depth(3.26, "mm"))).toBe("3,3 mm");
    expect(formatter({ locale: "en-GB", timeZone: "UTC" }).depth(6.35, "32nds")).toBe("8/32 in");
    expect(formatter({ locale: "de-DE", timeZone: "UTC" }).pressure(240, "bar")).toBe("2,4 bar");
    expect(formatter({ locale: "en-GB", timeZone: "UTC" }).pressure(241.3165, "psi")).toBe("35 psi");
    expect(nbsp(formatter({ locale: "de-DE", timeZone: "UTC" }).money(38990, "EUR"))).toBe("389,90 €");
    expect(formatter({ locale: "en-GB", timeZone: "UTC" }).money(38990, "GBP")).toBe("£389.90");
  });

  it("takes the locale from Accept-Language and the zone only when it exists", () => {
    expect(localeFromAcceptLanguage("de-AT,de;q=0.9,en;q=0.8")).toBe("de-AT");
    expect(localeFromAcceptLanguage("*")).toBe("en-GB");
    expect(localeFromAcceptLanguage("not a tag!!,fr-CH")).toBe("fr-CH");
    expect(localeFromAcceptLanguage(null)).toBe("en-GB");
    expect(prefsFrom({ timeZone: "Europe/Berlin" }).timeZone).toBe("Europe/Berlin");
    expect(prefsFrom({ timeZone: "Mars/Olympus_Mons" }).timeZone).toBe("UTC");
    expect(prefsFrom({ timeZone: "../../etc" }).timeZone).toBe("UTC");
  });
});
