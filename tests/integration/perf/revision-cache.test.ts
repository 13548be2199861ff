// Answers kept in memory under the database's revision numbers (db/revision.ts,
// migration 0012). What must hold: every kind of row a logbook is made of
// moves its vehicle's stamp, whoever writes it; names and settings move the
// shared one; another vehicle's writes and an owner's reads move nothing (or
// nothing would ever be served from memory); a kept answer is served again
// while its stamp stands; and the check mode the whole suite runs under
// catches a write that bypassed the stamps.
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { accessLog, attachment, driverProfile, odometerReading, organization, serviceEntry, tire, tireSet, treadCheck, treadReading, user, vehicle } from "@/db/schema";
import { driverStamp, keptAnswerStats, StaleAnswerError, vehicleStamp } from "@/db/revision";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { GET as feedGET } from "@/app/api/feed/[token]/route";
import { POST as feedPOST } from "@/app/api/reminders/feed/route";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { todayIso } from "@/lib/validation/logbook";
import { setPlan } from "../../support/logbook-fixtures";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { HOUR, insertPass, makeVehicle } from "../passes/helpers";

let driver: TestUser;
let other: TestUser;
let car: Awaited<ReturnType<typeof makeVehicle>>;
let otherCar: Awaited<ReturnType<typeof makeVehicle>>;
let shopId: string;

beforeAll(async () => {
  driver = await signUp({ name: "Orla Penhallow" });
  other = await signUp({ name: "Bram Tessely" });
  car = await makeVehicle(driver, "Grey hatch");
  otherCar = await makeVehicle(other, "Red van");
  shopId = (await makeShop({ owner: await signUp({ name: "Sefa Ondrik" }), name: "Lowmarsh Wheel Bench" })).id;
});

/** The stamp moves across `write`, and the other driver's vehicle keeps its own. */
async function moves(write: () => Promise<unknown>) {
  const before = await vehicleStamp(car.vehicle.id);
  const otherBefore = await vehicleStamp(otherCar.vehicle.id);
  await write();
  expect(await vehicleStamp(car.vehicle.id)).not.toBe(before);
  expect(await vehicleStamp(otherCar.vehicle.id)).toBe(otherBefore);
}

describe("a vehicle's stamp", () => {
  it("moves with every insert, update and delete of what its logbook is made of", async () => {
    const v = car.vehicle.id;
    await moves(() => db.update(vehicle).set({ nickname: "Grey hatch (new)" }).where(eq(vehicle.id, v)));
    let setId = "";
    await moves(async () => (setId = (await db.insert(tireSet).values({ vehicleId: v, kind: "winter", size: "205/55R16", state: "stored" }).returning())[0].id));
    await moves(() => db.update(tireSet).set({ storageLocation: "Loft" }).where(eq(tireSet.id, setId)));
    let tireId = "";
    await moves(async () => (tireId = (await db.insert(tire).values({ setId, position: "front_left", newDepthMm: 9 }).returning())[0].id));
    await moves(() => db.update(tire).set({ newDepthMm: 8.5 }).where(eq(tire.id, tireId)));
    let checkId = "";
    await moves(async () => (checkId = (await db.insert(treadCheck).values({ vehicleId: v, setId, checkedOn: "2026-01-10", odometerKm: 1000 }).returning())[0].id));
    await moves(() => db.update(treadCheck).set({ notes: "Cold morning" }).where(eq(treadCheck.id, checkId)));
    let readingId = "";
    await moves(async () => (readingId = (await db.insert(treadReading).values({ checkId, tireId, centreMm: 8 }).returning())[0].id));
    await moves(() => db.update(treadReading).set({ centreMm: 7.9 }).where(eq(treadReading.id, readingId)));
    await moves(() => db.delete(treadReading).where(eq(treadReading.id, readingId)));
    let entryId = "";
    await moves(async () => (entryId = (await db.insert(serviceEntry).values({ vehicleId: v, setId, kind: "rotation", performedOn: "2026-01-11" }).returning())[0].id));
    await moves(() => db.update(serviceEntry).set({ notes: "Front to back" }).where(eq(serviceEntry.id, entryId)));
    let fileId = "";
    await moves(
      async () =>
        (fileId = (
          await db
            .insert(attachment)
            .values({ ownerId: driver.id, vehicleId: v, kind: "receipt", fileName: "r.pdf", storedName: `rev-${Date.now()}`, mimeType: "application/pdf", sizeBytes: 10 })
            .returning()
        )[0].id),
    );
    await moves(() => db.update(attachment).set({ fileName: "receipt.pdf" }).where(eq(attachment.id, fileId)));
    await moves(() => db.delete(attachment).where(eq(attachment.id, fileId)));
    let odoId = "";
    await moves(async () => (odoId = (await db.insert(odometerReading).values({ vehicleId: v, readOn: "2026-01-12", odometerKm: 1200 }).returning())[0].id));
    await moves(() => db.update(odometerReading).set({ odometerKm: 1250 }).where(eq(odometerReading.id, odoId)));
    await moves(() => db.delete(odometerReading).where(eq(odometerReading.id, odoId)));
    const pass = await insertPass({ driver, shopId, vehicleIds: [v], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) });
    let logId = "";
    await moves(async () => (logId = (await db.insert(accessLog).values({ passId: pass.id, vehicleId: v, shopId, actorName: "Sefa Ondrik", action: "Opened the logbook" }).returning())[0].id));
    await moves(() => db.update(accessLog).set({ count: 2 }).where(eq(accessLog.id, logId)));
    await moves(() => db.delete(accessLog).where(eq(accessLog.id, logId)));
    // Deleting a check takes its readings with it (a cascade): still a move.
    await moves(() => db.delete(treadCheck).where(eq(treadCheck.id, checkId)));
    await moves(() => db.delete(serviceEntry).where(eq(serviceEntry.id, entryId)));
    await moves(() => db.delete(tire).where(eq(tire.id, tireId)));
    await moves(() => db.delete(tireSet).where(eq(tireSet.id, setId)));
  });

  it("moves with people's and shops' names and drivers' settings, for every vehicle", async () => {
    const both = async () => [await vehicleStamp(car.vehicle.id), await vehicleStamp(otherCar.vehicle.id)];
    for (const write of [
      () => db.update(user).set({ name: "Orla Penhallow-Reyes" }).where(eq(user.id, driver.id)),
      () => db.update(organization).set({ name: "Lowmarsh Wheel Bench & Tyre" }).where(eq(organization.id, shopId)),
      () => db.update(driverProfile).set({ units: "imperial" }).where(eq(driverProfile.userId, other.id)),
    ]) {
      const [a, b] = await both();
      await write();
      const [a2, b2] = await both();
      expect(a2).not.toBe(a);
      expect(b2).not.toBe(b);
    }
  });

  it("does not move when the owner only reads, and never comes back to an old number", async () => {
    const access = ownerAccess({ user: { id: driver.id, name: driver.name } });
    const before = await vehicleStamp(car.vehicle.id);
    await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today: todayIso() });
    await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today: todayIso() });
    expect(await vehicleStamp(car.vehicle.id)).toBe(before);
    // A set deleted and written again does not bring an older number back.
    const seen = new Set([before]);
    for (let i = 0; i < 3; i++) {
      const [s] = await db.insert(tireSet).values({ vehicleId: car.vehicle.id, kind: "summer", size: "195/65R15", state: "stored" }).returning();
      seen.add(await vehicleStamp(car.vehicle.id));
      await db.delete(tireSet).where(eq(tireSet.id, s.id));
      seen.add(await vehicleStamp(car.vehicle.id));
    }
    expect(seen.size).toBe(7);
  });

  it("of a driver lists their vehicles: a new one moves it", async () => {
    const before = await driverStamp(driver.id);
    const extra = await makeVehicle(driver, "Spare runabout");
    expect(await driverStamp(driver.id)).not.toBe(before);
    await db.delete(vehicle).where(eq(vehicle.id, extra.vehicle.id));
  });
});

describe("answers kept in memory", () => {
  it("serve a logbook again while its stamp stands, and compute it after a write", async () => {
    const access = ownerAccess({ user: { id: driver.id, name: driver.name } });
    const today = todayIso();
    const first = await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today });
    const s0 = keptAnswerStats();
    const again = await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today });
    const s1 = keptAnswerStats();
    expect(s1.hits).toBe(s0.hits + 1);
    expect(s1.misses).toBe(s0.misses);
    expect(again).toBe(first);
    await db.insert(treadCheck).values({ vehicleId: car.vehicle.id, setId: car.set.id, checkedOn: today, odometerKm: 2000, notes: "After the trip" });
    const after = await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today });
    expect(keptAnswerStats().misses).toBe(s1.misses + 1);
    expect(after.checks.map((c) => c.notes)).toContain("After the trip");
    // Another reader, another day or another page size is another answer.
    const s2 = keptAnswerStats();
    await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today: "2030-01-01" });
    await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today, historyLimit: 5 });
    expect(keptAnswerStats().misses).toBe(s2.misses + 2);
  });

  it("are checked in the tests: a write that bypasses the triggers is caught as stale", async () => {
    expect(process.env.FOURPATCH_CACHE_CHECK).toBe("1");
    const access = ownerAccess({ user: { id: driver.id, name: driver.name } });
    const today = todayIso();
    await getVehicleLogbook({ access, vehicleId: car.vehicle.id, today });
    await db.execute(sql`alter table tread_check disable trigger tread_check_logbook_ins`);
    try {
      await db.insert(treadCheck).values({ vehicleId: car.vehicle.id, setId: car.set.id, checkedOn: today, odometerKm: 2100, notes: "Behind the stamp's back" });
      await expect(getVehicleLogbook({ access, vehicleId: car.vehicle.id, today })).rejects.toBeInstanceOf(StaleAnswerError);
    } finally {
      await db.execute(sql`alter table tread_check enable trigger tread_check_logbook_ins`);
      // Move the stamp so later reads compute afresh.
      await db.update(vehicle).set({ nickname: "Grey hatch" }).where(eq(vehicle.id, car.vehicle.id));
    }
  });

  it("serve the calendar feed again while nothing changed, and a new one after a check", async () => {
    await setPlan({ userId: driver.id, plan: "plus" });
    const res = await feedPOST(request("/api/reminders/feed", { as: driver, body: {} }), ctx({}));
    expect(res.status).toBe(201);
    const { token } = (await res.json()) as { token: string };
    const poll = () => feedGET(new Request(`http://fourpatch.test/api/feed/${token}`), ctx({ token }));
    const a = await poll();
    const bodyA = await a.text();
    const s0 = keptAnswerStats();
    const b = await poll();
    expect(await b.text()).toBe(bodyA);
    expect(b.headers.get("etag")).toBe(a.headers.get("etag"));
    expect(keptAnswerStats().hits).toBeGreaterThanOrEqual(s0.hits + 2);
    // A new tread reading changes what the feed says.
    const [check] = await db.insert(treadCheck).values({ vehicleId: car.vehicle.id, setId: car.set.id, checkedOn: todayIso(), odometerKm: 2500 }).returning();
    await db.insert(treadReading).values(car.tires.map((t) => ({ checkId: check.id, tireId: t.id, centreMm: 1.2, innerMm: 1.2, outerMm: 1.2 })));
    const c = await poll();
    expect(c.headers.get("etag")).not.toBe(a.headers.get("etag"));
    expect(await c.text()).not.toBe(bodyA);
  });
});
