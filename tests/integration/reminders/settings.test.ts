// The driver's reminder settings through the API: validation per field,
// and every saved choice showing in the feed (kinds, alarms, swap dates).
import ICAL from "ical.js";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { GET as feedGET } from "@/app/api/feed/[token]/route";
import { POST as feedPOST } from "@/app/api/reminders/feed/route";
import { GET as settingsGET, PUT as settingsPUT } from "@/app/api/reminders/settings/route";
import { isOptedOut, optOut } from "@/db/queries/reminders";
import { renwickStyleLogbook, setPlan } from "../../support/logbook-fixtures";
import { ctx, request, signUp, type TestUser } from "../../support/users";

beforeAll(() => {
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(new Date("2026-03-10T12:00:00Z"));
});
afterAll(() => vi.useRealTimers());

const form = {
  jurisdiction: "EU",
  kinds: ["age-replace", "seasonal-swap"],
  alarmLeadDays: ["30", "", ""],
  emailLeadDays: "10",
  autumnSwap: "10-01",
  springSwap: "04-20",
  rotationIntervalKm: "10000",
  emailReminders: true,
  timezone: "Europe/Oslo",
};

async function put(u: TestUser, body: unknown) {
  return settingsPUT(request("/api/reminders/settings", { method: "PUT", body, as: u }), ctx({}));
}

async function feedEvents(token: string) {
  const text = await (await feedGET(request(`/api/feed/${token}`), ctx({ token }))).text();
  return { text, events: new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent") };
}

describe("reminder settings", () => {
  let u: TestUser;
  let token: string;
  beforeAll(async () => {
    u = await signUp({ name: "Kit Marlowe-Dunn" });
    await setPlan({ userId: u.id, plan: "plus" });
    await renwickStyleLogbook(u.id);
    token = ((await (await feedPOST(request("/api/reminders/feed", { method: "POST", as: u }), ctx({}))).json()) as { token: string }).token;
  });

  it("refuses bad input field by field and saves nothing", async () => {
    const res = await put(u, { ...form, autumnSwap: "31-10", rotationIntervalKm: "abc", alarmLeadDays: ["400"] });
    expect(res.status).toBe(422);
    const body = (await res.json()) as { error: { fields: Record<string, string[]> } };
    expect(Object.keys(body.error.fields).sort()).toEqual(["alarmLeadDays.0", "autumnSwap", "rotationIntervalKm"]);
    const saved = (await (await settingsGET(request("/api/reminders/settings", { as: u }), ctx({}))).json()) as { settings: { autumnSwap: string } };
    expect(saved.settings.autumnSwap).toBe("10-15");
  });

  it("GET answers every field PUT requires, so what was read can be written back unchanged", async () => {
    const got = (await (await settingsGET(request("/api/reminders/settings", { as: u }), ctx({}))).json()) as {
      jurisdiction: string; emailReminders: boolean; timezone: string; settings: Record<string, unknown>;
    };
    const res = await put(u, { jurisdiction: got.jurisdiction, emailReminders: got.emailReminders, timezone: got.timezone, ...got.settings });
    expect(res.status).toBe(200);
  });

  it("shows the saved kinds, alarm and swap date in the feed", async () => {
    expect((await put(u, form)).status).toBe(200);
    const { text, events } = await feedEvents(token);
    const kinds = events.map((e) => String(e.getFirstPropertyValue("uid")).split("/")[2].replace("@fourpatch", "")).sort();
    expect(kinds).toEqual(["age-replace", "age-replace", "seasonal-swap"]);
    // The winter set is still stored in March, after the chosen autumn date: overdue since 1 October.
    const swap = events.find((e) => String(e.getFirstPropertyValue("uid")).includes("seasonal-swap"))!;
    expect((swap.getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe("2025-10-01");
    // One alarm, 30 days before (RFC 5545 §3.8.6.3).
    for (const e of events) {
      expect(e.getAllSubcomponents("valarm").map((a) => (a.getFirstPropertyValue("trigger") as ICAL.Duration).toSeconds())).toEqual([-30 * 86_400]);
    }
    expect(text).toContain("X-WR-TIMEZONE:Europe/Oslo");
  });

  it("clears an earlier unsubscribe when the driver ticks e-mail reminders again", async () => {
    await optOut({ userId: u.id, kind: "reminder-digest" });
    expect((await put(u, { ...form, emailReminders: false })).status).toBe(200);
    expect(await isOptedOut({ userId: u.id, kind: "reminder-digest" })).toBe(true);
    expect((await put(u, form)).status).toBe(200);
    expect(await isOptedOut({ userId: u.id, kind: "reminder-digest" })).toBe(false);
  });

  it("needs a session", async () => {
    const res = await settingsPUT(request("/api/reminders/settings", { method: "PUT", body: form }), ctx({}));
    expect(res.status).toBe(401);
  });
});
