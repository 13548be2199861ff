// The reminder feed, read back by an independent iCalendar parser (ical.js),
// never by the generator that wrote it. RFC sections are named per check.
import ICAL from "ical.js";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { reminderFeed, tireSet, treadCheck } from "@/db/schema";
import { GET as feedGET } from "@/app/api/feed/[token]/route";
import { DELETE as feedDELETE, POST as feedPOST } from "@/app/api/reminders/feed/route";
import { CAUTION } from "@/lib/tires";
import { addCheck, renwickStyleLogbook, setPlan } from "../../support/logbook-fixtures";
import { ctx, request, signUp, type TestUser } from "../../support/users";

// Fixed "now": 10 March 2026, noon UTC. Only Date is faked; timers stay real for PGlite.
const NOW = new Date("2026-03-10T12:00:00Z");

beforeAll(() => {
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(NOW);
});
afterAll(() => vi.useRealTimers());

async function newFeed(u: TestUser): Promise<{ token: string; urls: { https: string; webcal: string } }> {
  const res = await feedPOST(request("/api/reminders/feed", { method: "POST", as: u }), ctx({}));
  expect(res.status).toBe(201);
  return res.json();
}

async function fetchFeed(tokenSegment: string) {
  return feedGET(request(`/api/feed/${tokenSegment}`), ctx({ token: tokenSegment }));
}

function parse(text: string) {
  const comp = new ICAL.Component(ICAL.parse(text));
  const events = comp.getAllSubcomponents("vevent");
  return { comp, events };
}

const byUid = (events: ICAL.Component[]) => new Map(events.map((e) => [String(e.getFirstPropertyValue("uid")), e]));
const dateOf = (e: ICAL.Component, prop: "dtstart" | "dtend") => (e.getFirstPropertyValue(prop) as ICAL.Time).toString();

describe("reminder feed for a known logbook (Plus driver)", () => {
  let ada: TestUser;
  let ids: Awaited<ReturnType<typeof renwickStyleLogbook>>;
  let token: string;
  let text: string;

  beforeAll(async () => {
    ada = await signUp({ name: "Orla Fenwick" });
    await setPlan({ userId: ada.id, plan: "plus", emailReminders: true, timezone: "Europe/Helsinki", settings: { alarmLeadDays: [14, 1] } });
    ids = await renwickStyleLogbook(ada.id);
    ({ token } = await newFeed(ada));
    const res = await fetchFeed(`${token}.ics`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/calendar; charset=utf-8");
    text = await res.text();
  });

  it("has one event per reminder with the dates the logbook implies", () => {
    const { events } = parse(text);
    const summer = ids.setIds["Meadowline summer"];
    const winter = ids.setIds["Frostvale winter"];
    const uids = byUid(events);
    // Summer set: age watch, age replace, depth limit, rotation. Stored winter set: age watch, age replace, seasonal swap.
    expect(events).toHaveLength(7);
    const uid = (setId: string, kind: string) => `${ids.vehicleId}/${setId}/${kind}@fourpatch`;
    // DOT 2523 = week from Sun 18 Jun 2023 (49 CFR 574.5 [sec, trade-facts §1]); watch at 5 years, replace at 10 [practice, §3].
    expect(dateOf(uids.get(uid(summer, "age-watch"))!, "dtstart")).toBe("2028-06-18");
    expect(dateOf(uids.get(uid(summer, "age-replace"))!, "dtstart")).toBe("2033-06-18");
    // DOT 0722 = week from Sun 13 Feb 2022 [sec, §1]; winter sets: watch at 4, replace at 6 years [practice, §3].
    expect(dateOf(uids.get(uid(winter, "age-watch"))!, "dtstart")).toBe("2026-02-13");
    expect(dateOf(uids.get(uid(winter, "age-replace"))!, "dtstart")).toBe("2028-02-13");
    // A winter set still stored in March, after the default 15 October: the swap is overdue since then.
    expect(dateOf(uids.get(uid(winter, "seasonal-swap"))!, "dtstart")).toBe("2025-10-15");
    // 10,000 km since the first check at 20,000 km: rotation was due at the 30,000 km check (1 March).
    expect(dateOf(uids.get(uid(summer, "rotation-due"))!, "dtstart")).toBe("2026-03-01");
    // 1 mm per 10,000 km from 6.0 mm: 1.6 mm (EU, 89/459/EEC [sec]) is 44,000 km and about two years away.
    const depth = dateOf(uids.get(uid(summer, "depth-limit"))!, "dtstart");
    expect(depth > "2027-06-01" && depth < "2029-01-01").toBe(true);
  });

  it("uses all-day DATE values with an exclusive DTEND one day later (RFC 5545 §3.6.1, §3.3.4)", () => {
    for (const e of parse(text).events) {
      const start = e.getFirstProperty("dtstart")!;
      const end = e.getFirstProperty("dtend")!;
      expect(start.type).toBe("date");
      expect(end.type).toBe("date");
      const s = start.getFirstValue() as ICAL.Time;
      const d = end.getFirstValue() as ICAL.Time;
      expect(s.isDate && d.isDate).toBe(true);
      expect(d.subtractDate(s).toSeconds()).toBe(86_400);
    }
    expect(text).toMatch(/DTSTART;VALUE=DATE:\d{8}\r\n/);
  });

  it("gives every event a UID and a DTSTAMP in UTC (RFC 5545 §3.6.1, §3.8.4.7, §3.8.7.2)", () => {
    for (const e of parse(text).events) {
      expect(String(e.getFirstPropertyValue("uid"))).toMatch(/@fourpatch$/);
      const stamp = e.getFirstPropertyValue("dtstamp") as ICAL.Time;
      expect(stamp.zone?.tzid ?? "UTC").toBe("UTC");
      expect(stamp.toJSDate().toISOString()).toBe(NOW.toISOString());
    }
  });

  it("carries valid DISPLAY alarms at the driver's lead times (RFC 5545 §3.6.6, §3.8.6.3)", () => {
    for (const e of parse(text).events) {
      const alarms = e.getAllSubcomponents("valarm");
      expect(alarms).toHaveLength(2);
      const triggers = alarms.map((a) => {
        // ACTION and TRIGGER exactly once; DISPLAY needs DESCRIPTION; no lone DURATION/REPEAT.
        expect(a.getAllProperties("action")).toHaveLength(1);
        expect(a.getAllProperties("trigger")).toHaveLength(1);
        expect(a.getFirstPropertyValue("action")).toBe("DISPLAY");
        expect(String(a.getFirstPropertyValue("description") ?? "").length).toBeGreaterThan(0);
        expect(a.hasProperty("duration")).toBe(a.hasProperty("repeat"));
        return (a.getFirstPropertyValue("trigger") as ICAL.Duration).toSeconds();
      });
      expect(triggers.sort((x, y) => x - y)).toEqual([-14 * 86_400, -1 * 86_400]);
    }
  });

  it("names vehicle and set, explains, links back and cautions in each event", () => {
    for (const e of parse(text).events) {
      const summary = String(e.getFirstPropertyValue("summary"));
      expect(summary).toContain("Blue estate");
      expect(summary).toMatch(/Meadowline summer|Frostvale winter/);
      const description = String(e.getFirstPropertyValue("description"));
      expect(description).toContain("What to do:");
      expect(description).toContain(CAUTION);
      expect(description).toMatch(/http:\/\/fourpatch\.test\/sets\/[0-9a-f-]{36}/);
      expect(description).toContain(`http://fourpatch.test/vehicles/${ids.vehicleId}`);
      expect(String(e.getFirstPropertyValue("url"))).toMatch(/^http:\/\/fourpatch\.test\/sets\//);
    }
  });

  it("asks clients to refresh daily and names the driver's time zone (RFC 7986 §5.7)", () => {
    const { comp } = parse(text);
    const refresh = comp.getFirstProperty("refresh-interval")!;
    // ical.js turns the VALUE=DURATION parameter into the property's type.
    expect(refresh.type).toBe("duration");
    expect(text).toContain("REFRESH-INTERVAL;VALUE=DURATION:P1D\r\n");
    expect(String(refresh.getFirstValue())).toBe("P1D");
    expect(String(comp.getFirstPropertyValue("x-published-ttl"))).toBe("P1D");
    expect(String(comp.getFirstPropertyValue("x-wr-timezone"))).toBe("Europe/Helsinki");
    expect(comp.getFirstPropertyValue("version")).toBe("2.0");
  });

  it("keeps UIDs across two fetches, and a moved date moves the event, not its UID", async () => {
    const before = byUid(parse(await (await fetchFeed(token)).text()).events);
    const again = byUid(parse(await (await fetchFeed(`${token}.ics`)).text()).events);
    expect([...again.keys()].sort()).toEqual([...before.keys()].sort());

    // A new check shows faster wear: the depth date moves earlier.
    const summer = ids.setIds["Meadowline summer"];
    const depthUid = `${ids.vehicleId}/${summer}/depth-limit@fourpatch`;
    const oldDate = dateOf(before.get(depthUid)!, "dtstart");
    await addCheck({ vehicleId: ids.vehicleId, setId: summer, tires: ids.tireIds["Meadowline summer"], on: "2026-03-09", odometerKm: 31_000, mm: 4.0 });
    const after = byUid(parse(await (await fetchFeed(token)).text()).events);
    expect([...after.keys()].sort()).toEqual([...before.keys()].sort());
    const newDate = dateOf(after.get(depthUid)!, "dtstart");
    expect(newDate < oldDate).toBe(true);
    await db.delete(treadCheck).where(eq(treadCheck.checkedOn, "2026-03-09"));
  });

  it("drops the events of a reminder that no longer applies (a retired set)", async () => {
    const winter = ids.setIds["Frostvale winter"];
    await db.update(tireSet).set({ state: "retired" }).where(eq(tireSet.id, winter));
    const events = parse(await (await fetchFeed(token)).text()).events;
    expect(events).toHaveLength(4);
    expect(events.some((e) => String(e.getFirstPropertyValue("uid")).includes(winter))).toBe(false);
    await db.update(tireSet).set({ state: "stored" }).where(eq(tireSet.id, winter));
  });

  it("keeps only the token's SHA-256, never the token", async () => {
    const rows = await db.select().from(reminderFeed).where(eq(reminderFeed.userId, ada.id));
    expect(rows.map((r) => r.tokenHash)).not.toContain(token);
    expect(JSON.stringify(rows)).not.toContain(token);
    expect(rows.find((r) => !r.revokedAt)!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    // 32 random bytes → 43 base64url characters (≥ 128 bits).
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
  });
});

describe("feed secrets", () => {
  it("answers unknown, malformed and revoked tokens with the same bare 404; a new token kills the old URL", async () => {
    const u = await signUp({ name: "Pell Ardan" });
    await renwickStyleLogbook(u.id);
    const first = await newFeed(u);
    expect((await fetchFeed(first.token)).status).toBe(200);

    const unknown = await fetchFeed(`${"A".repeat(43)}.ics`);
    const malformed = await fetchFeed("not-a-token");
    expect(unknown.status).toBe(404);
    expect(malformed.status).toBe(404);
    const unknownBody = await unknown.text();
    expect(await malformed.text()).toBe(unknownBody);

    const second = await newFeed(u);
    expect(second.token).not.toBe(first.token);
    const old = await fetchFeed(first.token);
    expect(old.status).toBe(404);
    expect(await old.text()).toBe(unknownBody);
    expect((await fetchFeed(`${second.token}.ics`)).status).toBe(200);

    const del = await feedDELETE(request("/api/reminders/feed", { method: "DELETE", as: u }), ctx({}));
    expect(del.status).toBe(200);
    const revoked = await fetchFeed(second.token);
    expect(revoked.status).toBe(404);
    expect(await revoked.text()).toBe(unknownBody);
    expect(revoked.headers.get("content-type")).toBe(unknown.headers.get("content-type"));
  });

  it("will not make a feed without a session", async () => {
    const res = await feedPOST(request("/api/reminders/feed", { method: "POST" }), ctx({}));
    expect(res.status).toBe(401);
  });

  it("gives a Free driver the basic feed: age and depth items, no alarms", async () => {
    const u = await signUp({ name: "Tamsin Brook" });
    await setPlan({ userId: u.id, plan: "free", settings: { alarmLeadDays: [14, 1] } });
    await renwickStyleLogbook(u.id);
    const { token } = await newFeed(u);
    const text = await (await fetchFeed(token)).text();
    const { events } = parse(text);
    expect(events).toHaveLength(5);
    const kinds = events.map((e) => String(e.getFirstPropertyValue("uid")).split("/")[2].replace("@fourpatch", "")).sort();
    expect(kinds).toEqual(["age-replace", "age-replace", "age-watch", "age-watch", "depth-limit"]);
    expect(text).not.toContain("BEGIN:VALARM");

    // Switching the same driver to Plus switches the Plus kinds and the alarms on.
    await setPlan({ userId: u.id, plan: "plus" });
    const plus = parse(await (await fetchFeed(token)).text());
    expect(plus.events).toHaveLength(7);
    expect(plus.events[0].getAllSubcomponents("valarm")).toHaveLength(2);
  });
});
