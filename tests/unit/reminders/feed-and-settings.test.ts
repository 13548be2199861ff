// Pure parts of reminders: the feed builder's dates whatever the server's
// zone, the settings schema, the plan gate and the feed secret's shape.
import ICAL from "ical.js";
import { afterEach, describe, expect, it } from "vitest";
import { planAllows, planAllowsKind } from "@/lib/plan";
import { todayIn } from "@/lib/reminders/describe";
import { buildFeed } from "@/lib/reminders/feed";
import { feedUrls, hashFeedToken, newFeedToken, tokenFromPath } from "@/lib/reminders/token";
import type { ReminderItem } from "@/lib/tires";
import { DEFAULT_STORED_SETTINGS, parseStoredSettings, reminderSettingsFormSchema } from "@/lib/validation/reminders";

const item = (over: Partial<ReminderItem> = {}): ReminderItem => ({
  id: "veh-1/set-1/age-replace",
  kind: "age-replace",
  vehicleId: "veh-1",
  setId: "set-1",
  subject: "Larkspur summer on Grey hatch: tires reach 10 years, replace them",
  date: "2026-11-15",
  severity: "info",
  overdue: false,
  explanation: "Because.",
  ...over,
});

const originalTz = process.env.TZ;
afterEach(() => {
  process.env.TZ = originalTz;
});

describe("buildFeed", () => {
  for (const tz of ["UTC", "America/Los_Angeles", "Pacific/Kiritimati"]) {
    it(`writes the reminder's own day as DATE values with a server clock in ${tz} (RFC 5545 §3.3.4, §3.6.1)`, () => {
      process.env.TZ = tz;
      const text = buildFeed({ items: [item(), item({ id: "veh-1/set-1/age-watch", date: "2027-01-01" })], plan: "plus", timezone: "Europe/Oslo", alarmLeadDays: [7], baseUrl: "https://fp.example", now: new Date("2026-06-01T10:00:00Z") });
      expect(text).toContain("DTSTART;VALUE=DATE:20261115\r\n");
      expect(text).toContain("DTEND;VALUE=DATE:20261116\r\n");
      // A year boundary: 1 January ends on 2 January (exclusive DTEND).
      expect(text).toContain("DTSTART;VALUE=DATE:20270101\r\n");
      expect(text).toContain("DTEND;VALUE=DATE:20270102\r\n");
      const events = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent");
      expect(events.map((e) => (e.getFirstPropertyValue("dtstart") as ICAL.Time).toString())).toEqual(["2026-11-15", "2027-01-01"]);
    });
  }

  it("writes an alarm on the day itself as a zero trigger (RFC 5545 §3.8.6.3)", () => {
    const text = buildFeed({ items: [item()], plan: "plus", timezone: "UTC", alarmLeadDays: [0], baseUrl: "https://fp.example", now: new Date() });
    const alarm = new ICAL.Component(ICAL.parse(text)).getFirstSubcomponent("vevent")!.getFirstSubcomponent("valarm")!;
    expect((alarm.getFirstPropertyValue("trigger") as ICAL.Duration).toSeconds()).toBe(0);
    expect(String(alarm.getFirstPropertyValue("description"))).toMatch(/^Today: /);
  });

  it("leaves alarms out on Free whatever the settings say", () => {
    const text = buildFeed({ items: [item()], plan: "free", timezone: "UTC", alarmLeadDays: [14, 1], baseUrl: "https://fp.example", now: new Date() });
    expect(text).not.toContain("VALARM");
  });

  it("is an empty but valid calendar with no reminders", () => {
    const text = buildFeed({ items: [], plan: "plus", timezone: "UTC", alarmLeadDays: [1], baseUrl: "https://fp.example", now: new Date() });
    const comp = new ICAL.Component(ICAL.parse(text));
    expect(comp.name).toBe("vcalendar");
    expect(comp.getAllSubcomponents("vevent")).toHaveLength(0);
    expect(String(comp.getFirstPropertyValue("prodid"))).toContain("Fourpatch");
  });
});

describe("reminder settings", () => {
  it("fills defaults and drops only the fields that no longer parse", () => {
    expect(parseStoredSettings(null)).toEqual(DEFAULT_STORED_SETTINGS);
    const s = parseStoredSettings({ alarmLeadDays: [3, 30, 3], autumnSwap: "13-40", rotationIntervalKm: 12_000 });
    expect(s.alarmLeadDays).toEqual([30, 3]);
    expect(s.autumnSwap).toBe("10-15");
    expect(s.rotationIntervalKm).toBe(12_000);
  });

  const valid = {
    jurisdiction: "FI",
    kinds: ["age-watch", "depth-limit"],
    alarmLeadDays: ["14", "", "1"],
    emailLeadDays: "7",
    autumnSwap: "10-01",
    springSwap: "04-20",
    rotationIntervalKm: "9000",
    emailReminders: "on",
    timezone: "Europe/Helsinki",
  };

  it("accepts the form as the browser sends it, coercing numbers and blanks", () => {
    const r = reminderSettingsFormSchema.safeParse(valid);
    expect(r.success).toBe(true);
    expect(r.data).toMatchObject({ alarmLeadDays: [14, 1], emailLeadDays: 7, rotationIntervalKm: 9000, emailReminders: true });
  });

  it.each([
    ["autumnSwap", "02-30", "That day does not exist in that month."],
    ["springSwap", "4/20", "Use month-day, for example 10-15 for 15 October."],
    ["rotationIntervalKm", "500", "At least 1,000 km."],
    ["emailLeadDays", "2.5", "Whole days only."],
    ["timezone", "Mars/Olympus", "That time zone is unknown."],
  ])("names the field when %s is %s", (field, value, message) => {
    const r = reminderSettingsFormSchema.safeParse({ ...valid, [field]: value });
    expect(r.success).toBe(false);
    expect(r.error!.issues.find((i) => i.path[0] === field)?.message).toBe(message);
  });

  it("asks for a depth when the region is the driver's own", () => {
    const r = reminderSettingsFormSchema.safeParse({ ...valid, jurisdiction: "custom" });
    expect(r.error!.issues[0].path).toEqual(["customDepthMm"]);
  });
});

describe("plan gate", () => {
  it("keeps e-mail, alarms, seasonal and rotation kinds for Plus", () => {
    for (const feature of ["email-reminders", "alarms", "seasonal-swap", "rotation-due"] as const) {
      expect(planAllows({ plan: "plus", feature })).toBe(true);
      expect(planAllows({ plan: "free", feature })).toBe(false);
    }
    expect(planAllowsKind({ plan: "free", kind: "age-replace" })).toBe(true);
    expect(planAllowsKind({ plan: "free", kind: "depth-limit" })).toBe(true);
    expect(planAllowsKind({ plan: "free", kind: "seasonal-swap" })).toBe(false);
  });
});

describe("feed secret", () => {
  it("is 256 random bits in base64url, hashed with SHA-256, and accepted with or without .ics", () => {
    const a = newFeedToken();
    expect(a).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(newFeedToken()).not.toBe(a);
    expect(hashFeedToken(a)).toMatch(/^[0-9a-f]{64}$/);
    expect(tokenFromPath(`${a}.ics`)).toBe(a);
    expect(tokenFromPath(a)).toBe(a);
    expect(tokenFromPath(`${a.slice(1)}.ics`)).toBeNull();
    expect(tokenFromPath("../../etc")).toBeNull();
    expect(feedUrls(a, "http://192.0.2.10:3000")).toEqual({ https: `http://192.0.2.10:3000/api/feed/${a}.ics`, webcal: `webcal://192.0.2.10:3000/api/feed/${a}.ics` });
  });

  it("takes today's date in the driver's zone", () => {
    const now = new Date("2026-03-09T23:30:00Z");
    expect(todayIn("UTC", now)).toBe("2026-03-09");
    expect(todayIn("Europe/Helsinki", now)).toBe("2026-03-10");
    expect(todayIn("America/Los_Angeles", now)).toBe("2026-03-09");
    expect(todayIn("Not/AZone", now)).toBe("2026-03-09");
  });
});
