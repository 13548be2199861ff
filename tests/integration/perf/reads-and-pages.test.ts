// Reads that do not write and lists that come a page at a time: the access
// log counts a visit's reads in one row, the calendar feed answers 304 when
// nothing changed (RFC 9110 §13.1.1, §13.1.3, §15.4.5), and the cursor pages
// of checks, the shop's passes and the access log hold every row exactly once.
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { accessLog, reminderFeed, treadCheck } from "@/db/schema";
import { GET as feedGET } from "@/app/api/feed/[token]/route";
import { POST as feedPOST } from "@/app/api/reminders/feed/route";
import { GET as checksGET } from "@/app/api/vehicles/[vehicleId]/checks/route";
import { GET as accessLogGET } from "@/app/api/passes/access-log/route";
import { GET as heldGET } from "@/app/api/passes/held/route";
import { ACCESS_VISIT_MS, assertVehicleAccess, visitStartOf } from "@/db/queries/access";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { resolvePassAccess } from "@/db/queries/passes";
import { addCheck, renwickStyleLogbook, setPlan } from "../../support/logbook-fixtures";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { HOUR, insertPass, makeVehicle, sessionOf } from "../passes/helpers";

const NOW = new Date("2026-03-10T12:05:00Z");
beforeAll(() => {
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(NOW);
});
afterAll(() => vi.useRealTimers());

describe("the access log counts reads per visit", () => {
  let driver: TestUser;
  let tech: TestUser;
  let vehicleId: string;
  let passId: string;

  beforeAll(async () => {
    driver = await signUp({ name: "Maren Tollis" });
    tech = await signUp({ name: "Ives Cordray" });
    const shop = await makeShop({ owner: await signUp(), technicians: [tech] });
    const { vehicle } = await makeVehicle(driver);
    vehicleId = vehicle.id;
    passId = (await insertPass({ driver, shopId: shop.id, vehicleIds: [vehicle.id], startsAt: new Date(NOW.getTime() - HOUR), endsAt: new Date(NOW.getTime() + 24 * HOUR) })).id;
  });

  const rowsOf = () => db.select().from(accessLog).where(eq(accessLog.passId, passId)).orderBy(accessLog.at);

  it("three reads in one window are one row with a count of 3; the next window starts a new row", async () => {
    const access = await resolvePassAccess({ session: await sessionOf(tech), passId, now: NOW });
    const start = visitStartOf(NOW);
    expect(start.toISOString()).toBe("2026-03-10T12:00:00.000Z");
    for (const offsetMin of [0, 7, 24]) await assertVehicleAccess(access, { vehicleId, action: "read_logbook", now: new Date(NOW.getTime() + offsetMin * 60_000) });
    let rows = await rowsOf();
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ count: 3, action: "read_logbook", actorName: "Ives Cordray" });
    expect(rows[0].lastAt?.toISOString()).toBe("2026-03-10T12:29:00.000Z");
    // 12:31 is in the window that starts at 12:30.
    await assertVehicleAccess(access, { vehicleId, action: "read_logbook", now: new Date(start.getTime() + ACCESS_VISIT_MS + 60_000) });
    rows = await rowsOf();
    expect(rows).toHaveLength(2);
    expect(rows.map((r) => r.count)).toEqual([3, 1]);
  });

  it("writes keep a row each, and reading the logbook through the query counts into the visit", async () => {
    const access = await resolvePassAccess({ session: await sessionOf(tech), passId, now: NOW });
    const before = (await rowsOf()).length;
    await assertVehicleAccess(access, { vehicleId, action: "add_check", write: true, detail: "Tread check of 4 tire(s)", now: NOW });
    await assertVehicleAccess(access, { vehicleId, action: "add_check", write: true, detail: "Tread check of 4 tire(s)", now: NOW });
    expect((await rowsOf()).length).toBe(before + 2);
    await getVehicleLogbook({ access, vehicleId, today: "2026-03-10" });
    const reads = (await rowsOf()).filter((r) => r.action === "read_logbook" && r.visitStart?.getTime() === visitStartOf(NOW).getTime());
    expect(reads).toHaveLength(1);
    expect(reads[0].count).toBe(4);
  });

  it("the driver pages through the log with a cursor: every row once, newest first", async () => {
    const access = await resolvePassAccess({ session: await sessionOf(tech), passId, now: NOW });
    for (let i = 0; i < 5; i++) await assertVehicleAccess(access, { vehicleId, action: "add_service", write: true, detail: `entry ${i}`, now: new Date(NOW.getTime() - (i + 1) * 60_000) });
    const all = await rowsOf();
    const seen: string[] = [];
    let cursor: string | null = null;
    for (let page = 0; page < 10; page++) {
      const url: string = `/api/passes/access-log?vehicleId=${vehicleId}&limit=3${cursor ? `&cursor=${cursor}` : ""}`;
      const res = await accessLogGET(request(url, { as: driver }), ctx({}));
      expect(res.status).toBe(200);
      const body = (await res.json()) as { entries: { id: string; at: string }[]; nextCursor: string | null };
      expect(body.entries.length).toBeLessThanOrEqual(3);
      seen.push(...body.entries.map((e) => e.id));
      cursor = body.nextCursor;
      if (!cursor) break;
    }
    expect(new Set(seen).size).toBe(seen.length);
    expect([...seen].sort()).toEqual(all.map((r) => r.id).sort());
    const ats = all.sort((a, b) => b.at.getTime() - a.at.getTime() || b.id.localeCompare(a.id)).map((r) => r.id);
    expect(seen).toEqual(ats);
  });

  it("a malformed cursor is a 422 naming the cursor, not a 500", async () => {
    for (const bad of ["%%%", "bm90LWpzb24", Buffer.from(JSON.stringify({ t: "yesterday", id: "x" })).toString("base64url")]) {
      const res = await accessLogGET(request(`/api/passes/access-log?cursor=${encodeURIComponent(bad)}`, { as: driver }), ctx({}));
      expect(res.status).toBe(422);
      expect((await res.json()).error.fields).toHaveProperty("cursor");
    }
  });
});

describe("pages of a vehicle's checks", () => {
  it("hands out every check once, newest first, and the logbook carries the first page and a cursor", async () => {
    const owner = await signUp();
    const { vehicle, set, tires } = await makeVehicle(owner);
    const byPos = Object.fromEntries(tires.map((t) => [t.position, t.id])) as Parameters<typeof addCheck>[0]["tires"];
    const ids: string[] = [];
    // Two checks on the same day: the entry time and the id break the tie.
    for (const [i, on] of ["2025-06-01", "2025-07-01", "2025-07-01", "2025-08-01", "2025-09-01"].entries()) {
      ids.push(await addCheck({ vehicleId: vehicle.id, setId: set.id, tires: byPos, on, odometerKm: 10_000 + i * 1000, mm: 7 - i * 0.3 }));
    }
    const seen: { id: string; checkedOn: string; readings: unknown[] }[] = [];
    let cursor: string | null = null;
    for (let page = 0; page < 10; page++) {
      const res = await checksGET(request(`/api/vehicles/${vehicle.id}/checks?limit=2${cursor ? `&cursor=${cursor}` : ""}`, { as: owner }), ctx({ vehicleId: vehicle.id }));
      expect(res.status).toBe(200);
      const body = (await res.json()) as { checks: { id: string; checkedOn: string; readings: unknown[] }[]; nextCursor: string | null };
      seen.push(...body.checks);
      cursor = body.nextCursor;
      if (!cursor) break;
    }
    expect(seen.map((c) => c.id).sort()).toEqual([...ids].sort());
    expect(seen.map((c) => c.checkedOn)).toEqual(["2025-09-01", "2025-08-01", "2025-07-01", "2025-07-01", "2025-06-01"]);
    expect(seen.every((c) => c.readings.length === 4)).toBe(true);

    const book = await getVehicleLogbook({ access: { kind: "owner", userId: owner.id, userName: owner.name }, vehicleId: vehicle.id, today: "2026-03-10", historyLimit: 3 });
    expect(book.checks.map((c) => c.id)).toEqual(seen.slice(0, 3).map((c) => c.id));
    expect(book.checksNextCursor).not.toBeNull();
    // The projection still sees every reading, not only the first page.
    const fl = book.sets[0].tires.find((t) => t.position === "front_left")!;
    expect(fl.series).toHaveLength(5);

    const stranger = await signUp();
    const res = await checksGET(request(`/api/vehicles/${vehicle.id}/checks`, { as: stranger }), ctx({ vehicleId: vehicle.id }));
    expect(res.status).toBe(404);
    const bad = await checksGET(request(`/api/vehicles/${vehicle.id}/checks?setId=not-a-uuid`, { as: owner }), ctx({ vehicleId: vehicle.id }));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.fields).toHaveProperty("setId");
    const tooMany = await checksGET(request(`/api/vehicles/${vehicle.id}/checks?limit=5000`, { as: owner }), ctx({ vehicleId: vehicle.id }));
    expect(tooMany.status).toBe(422);
    expect((await tooMany.json()).error.fields).toHaveProperty("limit");
  });
});

describe("pages of the shop's passes", () => {
  it("open passes first (soonest to end first), then those ended within 48 hours (latest first), each once; older ones never", async () => {
    const tech = await signUp();
    const shop = await makeShop({ owner: await signUp(), technicians: [tech] });
    const driver = await signUp();
    const { vehicle } = await makeVehicle(driver);
    const at = (h: number) => new Date(NOW.getTime() + h * HOUR);
    const open = [];
    for (const h of [30, 5, 12, 5, 70]) open.push(await insertPass({ driver, shopId: shop.id, vehicleIds: [vehicle.id], startsAt: at(-2), endsAt: at(h) }));
    const endedRecent = await insertPass({ driver, shopId: shop.id, vehicleIds: [vehicle.id], startsAt: at(-10), endsAt: at(-3) });
    const revokedRecent = await insertPass({ driver, shopId: shop.id, vehicleIds: [vehicle.id], startsAt: at(-10), endsAt: at(40), revokedAt: at(-1) });
    await insertPass({ driver, shopId: shop.id, vehicleIds: [vehicle.id], startsAt: at(-100), endsAt: at(-49) });

    const seen: { id: string; state: string }[] = [];
    let cursor: string | null = null;
    for (let page = 0; page < 10; page++) {
      const res = await heldGET(request(`/api/passes/held?limit=2${cursor ? `&cursor=${cursor}` : ""}`, { as: tech }), ctx({}));
      expect(res.status).toBe(200);
      const body = (await res.json()) as { passes: { id: string; state: string; endsAt: string }[]; nextCursor: string | null };
      expect(body.passes.length).toBeLessThanOrEqual(2);
      seen.push(...body.passes);
      cursor = body.nextCursor;
      if (!cursor) break;
    }
    const [a5a, a5b] = [open[1], open[3]].sort((x, y) => x.id.localeCompare(y.id));
    expect(seen.map((p) => p.id)).toEqual([a5a.id, a5b.id, open[2].id, open[0].id, open[4].id, revokedRecent.id, endedRecent.id]);
    expect(seen.map((p) => p.state)).toEqual(["active", "active", "active", "active", "active", "revoked", "expired"]);
  });
});

describe("the calendar feed revalidates", () => {
  let ada: TestUser;
  let token: string;

  beforeAll(async () => {
    ada = await signUp({ name: "Wynne Asquell" });
    await setPlan({ userId: ada.id, plan: "plus", emailReminders: true, timezone: "Europe/Helsinki" });
    await renwickStyleLogbook(ada.id);
    const res = await feedPOST(request("/api/reminders/feed", { method: "POST", as: ada }), ctx({}));
    token = ((await res.json()) as { token?: string; urls: { https: string } }).urls.https.split("/").pop()!.replace(/\.ics$/, "");
  });

  const get = (headers: Record<string, string> = {}) => feedGET(request(`/api/feed/${token}.ics`, { headers }), ctx({ token: `${token}.ics` }));
  const feedRow = async () => (await db.select().from(reminderFeed).where(eq(reminderFeed.userId, ada.id)))[0];

  it("sends ETag and Last-Modified; the same validators get 304 with no body; the body itself does not change between polls", async () => {
    const first = await get();
    expect(first.status).toBe(200);
    const etag = first.headers.get("etag")!;
    const lastModified = first.headers.get("last-modified")!;
    expect(etag).toMatch(/^"[A-Za-z0-9_-]{32}"$/);
    expect(new Date(lastModified).toUTCString()).toBe(lastModified);
    const body = await first.text();

    const again = await get();
    expect(again.headers.get("etag")).toBe(etag);
    expect(await again.text()).toBe(body);

    const byTag = await get({ "if-none-match": etag });
    expect(byTag.status).toBe(304);
    expect(await byTag.text()).toBe("");
    expect(byTag.headers.get("etag")).toBe(etag);
    expect((await get({ "if-none-match": `W/${etag}, "other"` })).status).toBe(304);
    expect((await get({ "if-modified-since": lastModified })).status).toBe(304);
    // If-None-Match decides when both are sent (RFC 9110 §13.2.2).
    expect((await get({ "if-none-match": '"stale"', "if-modified-since": lastModified })).status).toBe(200);
    expect((await get({ "if-modified-since": new Date(Date.parse(lastModified) - 1000).toUTCString() })).status).toBe(200);
  });

  it("a change to the logbook changes the tag and the time; polls do not rewrite the fetch time each time", async () => {
    const before = await get();
    const etag = before.headers.get("etag")!;
    const stamp = (await feedRow()).lastFetchedAt;
    expect(stamp).not.toBeNull();
    vi.setSystemTime(new Date(NOW.getTime() + 10 * 60_000));
    await get();
    expect((await feedRow()).lastFetchedAt?.getTime()).toBe(stamp!.getTime());

    // The newest check of the mounted set reads much shallower: the depth reminder moves.
    const [last] = await db.select().from(treadCheck).orderBy(sql`${treadCheck.checkedOn} desc`).limit(1);
    await db.execute(sql`update tread_reading set inner_mm = 1.7, centre_mm = 1.8, outer_mm = 1.7 where check_id = ${last.id}`);
    const after = await get({ "if-none-match": etag });
    expect(after.status).toBe(200);
    expect(after.headers.get("etag")).not.toBe(etag);
    expect(Date.parse(after.headers.get("last-modified")!)).toBeGreaterThan(Date.parse(before.headers.get("last-modified")!));
    vi.setSystemTime(NOW);
  });
});
