// Changing and deleting tread checks and service entries (the driver, and a
// shop under the pass it recorded them with), and deleting one tire with its
// readings, through the real route handlers. Refusals write nothing, not
// even an access-log row; every change under a pass is a row of its own.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { accessLog, serviceEntry, tire, treadCheck, treadReading } from "@/db/schema";
import { DELETE as deleteCheck, PATCH as patchCheck } from "@/app/api/checks/[checkId]/route";
import { DELETE as deleteEntry, PATCH as patchEntry } from "@/app/api/service-entries/[entryId]/route";
import { DELETE as deleteTire } from "@/app/api/tires/[tireId]/route";
import { DELETE as passDeleteCheck, PATCH as passPatchCheck } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/[checkId]/route";
import { DELETE as passDeleteEntry, PATCH as passPatchEntry } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/[entryId]/route";
import { POST as passAddService } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/route";
import { POST as passAddCheck } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/route";
import { POST as addCheck } from "@/app/api/vehicles/[vehicleId]/checks/route";
import { POST as addService } from "@/app/api/vehicles/[vehicleId]/service-entries/route";
import { GET as getSet } from "@/app/api/sets/[setId]/route";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { counts, HOUR, insertPass, makeVehicle } from "../passes/helpers";

type Json = { error?: { code: string; message: string; fields?: Record<string, string[]> } } & Record<string, unknown>;
const ORIGIN = { origin: "http://fourpatch.test" };
const send = (url: string, as: TestUser | undefined, method: string, body?: unknown) => request(url, { as, method, body, headers: ORIGIN });

async function world() {
  const driver = await signUp({ name: "Lise Ambery" });
  const other = await signUp({ name: "Corin Vale" });
  const shopOwner = await signUp({ name: "Hale Dunmore" });
  const tech = await signUp({ name: "Pim Ostrander" });
  const otherTech = await signUp({ name: "Sorrel Hatch" });
  const shop = await makeShop({ name: "Brackwater Tread Co", owner: shopOwner, technicians: [tech] });
  const otherShop = await makeShop({ name: "Feld Lane Wheels", owner: await signUp({ name: "Odo Frane" }), technicians: [otherTech] });
  const car = await makeVehicle(driver, "The green Ostra");
  const base = { driver, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + 24 * HOUR) };
  const pass = await insertPass({ ...base, shopId: shop.id });
  const earlierPass = await insertPass({ ...base, shopId: shop.id });
  const otherPass = await insertPass({ ...base, shopId: otherShop.id });
  return { driver, other, tech, otherTech, shop, car, pass: pass.id, earlierPass: earlierPass.id, otherPass: otherPass.id };
}
type W = Awaited<ReturnType<typeof world>>;

const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);
const checkBody = (w: W, centre: string, extra: Record<string, unknown> = {}) => ({ setId: w.car.set.id, readings: w.car.tires.map((t) => ({ tireId: t.id, centre })), ...extra });

async function driverCheck(w: W, body: unknown) {
  const res = await addCheck(send(`/api/vehicles/${w.car.vehicle.id}/checks`, w.driver, "POST", body), ctx({ vehicleId: w.car.vehicle.id }));
  expect(res.status).toBe(201);
  return ((await res.json()) as { id: string }).id;
}
async function shopEntry(w: W, passId: string, as: TestUser) {
  const body = { kind: "rotation", odometer: "41000", notes: "Rotated front to back.", checks: [{ setId: w.car.set.id, readings: w.car.tires.map((t) => ({ tireId: t.id, centre: "6" })) }] };
  const res = await passAddService(send(`/api/passes/${passId}/vehicles/${w.car.vehicle.id}/service`, as, "POST", body), ctx({ passId, vehicleId: w.car.vehicle.id }));
  expect(res.status).toBe(201);
  return ((await res.json()) as { entry: { id: string; checkIds: string[] } }).entry;
}
const logRows = (w: W, action: string) => db.select().from(accessLog).where(and(eq(accessLog.vehicleId, w.car.vehicle.id), eq(accessLog.action, action)));

describe("the driver changes and deletes history", () => {
  it("a changed check replaces its readings, and the set's depths and projection follow", async () => {
    const w = await world();
    await driverCheck(w, checkBody(w, "7", { checkedOn: daysAgo(200), odometer: "30000" }));
    const id = await driverCheck(w, checkBody(w, "6", { checkedOn: daysAgo(20), odometer: "40000" }));
    const before = (await (await getSet(request(`/api/sets/${w.car.set.id}`, { as: w.driver }), ctx({ setId: w.car.set.id }))).json()) as { set: { tires: { depthMm: number; projection: { projectedDate: string | null } | null }[] } };
    expect(before.set.tires[0].depthMm).toBe(6);

    const res = await patchCheck(send(`/api/checks/${id}`, w.driver, "PATCH", checkBody(w, "5", { checkedOn: daysAgo(20), odometer: "40000", notes: "Gauge re-zeroed." })), ctx({ checkId: id }));
    expect(res.status).toBe(200);
    const stored = await db.select().from(treadReading).where(eq(treadReading.checkId, id));
    expect(stored.map((r) => r.centreMm)).toEqual([5, 5, 5, 5]);
    expect((await db.select().from(treadCheck).where(eq(treadCheck.id, id)))[0].notes).toBe("Gauge re-zeroed.");
    const after = (await (await getSet(request(`/api/sets/${w.car.set.id}`, { as: w.driver }), ctx({ setId: w.car.set.id }))).json()) as typeof before;
    expect(after.set.tires[0].depthMm).toBe(5);
    // 2 mm over 10 000 km instead of 1 mm: the limit comes sooner.
    expect(after.set.tires[0].projection?.projectedDate && before.set.tires[0].projection?.projectedDate).toBeTruthy();
    expect(after.set.tires[0].projection!.projectedDate! < before.set.tires[0].projection!.projectedDate!).toBe(true);
    // The driver's own change is not a shop's: no access-log row.
    expect(await logRows(w, "edit_check")).toHaveLength(0);
  });

  it("an edit is asked about like a new check: deeper than new, a big jump up, a lower odometer; nothing changes until confirmed", async () => {
    const w = await world();
    await driverCheck(w, checkBody(w, "6", { checkedOn: daysAgo(100), odometer: "35000" }));
    const id = await driverCheck(w, checkBody(w, "5", { checkedOn: daysAgo(10), odometer: "40000" }));
    const snapshot = async () => ({ readings: await db.select().from(treadReading).where(eq(treadReading.checkId, id)), check: await db.select().from(treadCheck).where(eq(treadCheck.id, id)) });
    const was = await snapshot();

    // 12 mm on a tire that was 8 mm new.
    let res = await patchCheck(send(`/api/checks/${id}`, w.driver, "PATCH", checkBody(w, "12", { checkedOn: daysAgo(10), odometer: "40000" })), ctx({ checkId: id }));
    expect(res.status).toBe(409);
    let body = (await res.json()) as Json;
    expect(body.error?.fields).toHaveProperty("confirmUnusualDepth");
    expect(body.error?.fields).toHaveProperty(["readings.0.centre"]);
    expect(await snapshot()).toEqual(was);

    // Lower than the reading of 90 days before it.
    res = await patchCheck(send(`/api/checks/${id}`, w.driver, "PATCH", checkBody(w, "5", { checkedOn: daysAgo(10), odometer: "30000" })), ctx({ checkId: id }));
    expect(res.status).toBe(409);
    body = (await res.json()) as Json;
    expect(body.error?.fields).toHaveProperty("odometer");
    expect(await snapshot()).toEqual(was);

    // Confirmed, both are saved.
    res = await patchCheck(send(`/api/checks/${id}`, w.driver, "PATCH", checkBody(w, "7.9", { checkedOn: daysAgo(10), odometer: "30000", confirmLowerOdometer: true, confirmUnusualDepth: true })), ctx({ checkId: id }));
    expect(res.status).toBe(200);
    // Saving it again unchanged (a note added) asks nothing: it was confirmed once.
    res = await patchCheck(send(`/api/checks/${id}`, w.driver, "PATCH", checkBody(w, "7.9", { checkedOn: daysAgo(10), odometer: "30000", notes: "Measured twice." })), ctx({ checkId: id }));
    expect(res.status).toBe(200);
  });

  it("an older check is compared with what came before it, not with later odometers, and not with itself", async () => {
    const w = await world();
    const old = await driverCheck(w, checkBody(w, "7", { checkedOn: daysAgo(300), odometer: "20000" }));
    await driverCheck(w, checkBody(w, "5", { checkedOn: daysAgo(5), odometer: "45000" }));
    // Correcting the old check's odometer down a little: nothing before it is higher.
    const res = await patchCheck(send(`/api/checks/${old}`, w.driver, "PATCH", checkBody(w, "7", { checkedOn: daysAgo(300), odometer: "19500" })), ctx({ checkId: old }));
    expect(res.status).toBe(200);
    expect((await db.select().from(treadCheck).where(eq(treadCheck.id, old)))[0].odometerKm).toBe(19500);
  });

  it("a changed service entry takes its checks' date and odometer along; a delete keeps the checks; another driver finds nothing", async () => {
    const w = await world();
    const res0 = await addService(send(`/api/vehicles/${w.car.vehicle.id}/service-entries`, w.driver, "POST", { kind: "rotation", performedOn: daysAgo(30), odometer: "38000", checks: [{ setId: w.car.set.id, readings: [{ tireId: w.car.tires[0].id, centre: "6" }] }] }), ctx({ vehicleId: w.car.vehicle.id }));
    const entry = (await res0.json()) as { id: string; checkIds: string[] };
    const body = { kind: "balancing", setId: w.car.set.id, performedOn: daysAgo(29), odometer: "38100", cost: "45.50", notes: "Balanced all four." };

    const stranger = await patchEntry(send(`/api/service-entries/${entry.id}`, w.other, "PATCH", body), ctx({ entryId: entry.id }));
    expect(stranger.status).toBe(404);
    const invalid = await patchEntry(send(`/api/service-entries/${entry.id}`, w.driver, "PATCH", { ...body, kind: "polishing", cost: "-3" }), ctx({ entryId: entry.id }));
    expect(invalid.status).toBe(422);
    expect(Object.keys(((await invalid.json()) as Json).error!.fields!)).toEqual(expect.arrayContaining(["kind", "cost"]));

    const res = await patchEntry(send(`/api/service-entries/${entry.id}`, w.driver, "PATCH", body), ctx({ entryId: entry.id }));
    expect(res.status).toBe(200);
    const [row] = await db.select().from(serviceEntry).where(eq(serviceEntry.id, entry.id));
    expect(row).toMatchObject({ kind: "balancing", performedOn: daysAgo(29), odometerKm: 38100, costCents: 4550, notes: "Balanced all four." });
    const [check] = await db.select().from(treadCheck).where(eq(treadCheck.id, entry.checkIds[0]));
    expect(check).toMatchObject({ checkedOn: daysAgo(29), odometerKm: 38100 });

    expect((await deleteEntry(send(`/api/service-entries/${entry.id}`, w.other, "DELETE"), ctx({ entryId: entry.id }))).status).toBe(404);
    expect((await deleteEntry(send(`/api/service-entries/${entry.id}`, w.driver, "DELETE"), ctx({ entryId: entry.id }))).status).toBe(200);
    expect(await db.select().from(serviceEntry).where(eq(serviceEntry.id, entry.id))).toHaveLength(0);
    expect(await db.select().from(treadCheck).where(eq(treadCheck.id, entry.checkIds[0]))).toHaveLength(1);
  });

  it("deleting one tire takes its readings, and a check that measured only that tire; the rest stays", async () => {
    const w = await world();
    const [gone, kept] = w.car.tires;
    const all = await driverCheck(w, checkBody(w, "6", { checkedOn: daysAgo(40) }));
    const onlyGone = await driverCheck(w, { setId: w.car.set.id, checkedOn: daysAgo(20), readings: [{ tireId: gone.id, centre: "5.5" }] });

    expect((await deleteTire(send(`/api/tires/${gone.id}`, w.other, "DELETE"), ctx({ tireId: gone.id }))).status).toBe(404);
    expect((await deleteTire(send(`/api/tires/not-a-tire`, w.driver, "DELETE"), ctx({ tireId: "not-a-tire" }))).status).toBe(404);
    const res = await deleteTire(send(`/api/tires/${gone.id}`, w.driver, "DELETE"), ctx({ tireId: gone.id }));
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ deleted: true, readings: 2, checksRemoved: 1 });
    expect(await db.select().from(tire).where(eq(tire.id, gone.id))).toHaveLength(0);
    expect(await db.select().from(treadReading).where(eq(treadReading.tireId, gone.id))).toHaveLength(0);
    expect(await db.select().from(treadCheck).where(eq(treadCheck.id, onlyGone))).toHaveLength(0);
    expect((await db.select().from(treadReading).where(eq(treadReading.checkId, all))).map((r) => r.tireId)).not.toContain(gone.id);
    expect(await db.select().from(tire).where(eq(tire.id, kept.id))).toHaveLength(1);
  });
});

describe("a shop changes and deletes its own entries under the pass", () => {
  it("the technician changes and deletes what this pass recorded; each is a row of the driver's access log", async () => {
    const w = await world();
    const entry = await shopEntry(w, w.pass, w.tech);
    const checkId = entry.checkIds[0];
    const url = `/api/passes/${w.pass}/vehicles/${w.car.vehicle.id}`;

    const res = await passPatchCheck(send(`${url}/checks/${checkId}`, w.tech, "PATCH", checkBody(w, "5.8")), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, checkId }));
    expect(res.status).toBe(200);
    expect((await db.select().from(treadReading).where(eq(treadReading.checkId, checkId))).map((r) => r.centreMm)).toEqual([5.8, 5.8, 5.8, 5.8]);
    const edits = await logRows(w, "edit_check");
    expect(edits).toHaveLength(1);
    expect(edits[0]).toMatchObject({ passId: w.pass, actorName: "Pim Ostrander", shopName: "Brackwater Tread Co" });
    expect(edits[0].detail).toMatch(/^Tread check of /);

    const entryRes = await passPatchEntry(send(`${url}/service/${entry.id}`, w.tech, "PATCH", { kind: "rotation", odometer: "41050", notes: "Rotated; torque checked." }), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, entryId: entry.id }));
    expect(entryRes.status).toBe(200);
    expect(await logRows(w, "edit_service")).toHaveLength(1);

    expect((await passDeleteCheck(send(`${url}/checks/${checkId}`, w.tech, "DELETE"), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, checkId }))).status).toBe(200);
    expect((await passDeleteEntry(send(`${url}/service/${entry.id}`, w.tech, "DELETE"), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, entryId: entry.id }))).status).toBe(200);
    expect(await db.select().from(serviceEntry).where(eq(serviceEntry.id, entry.id))).toHaveLength(0);
    expect(await logRows(w, "delete_check")).toHaveLength(1);
    const [del] = await logRows(w, "delete_service");
    expect(del).toMatchObject({ passId: w.pass, actorName: "Pim Ostrander" });
    expect(del.detail).toMatch(/^Rotation of /);
  });

  it("refuses the driver's entries, another pass's and another shop's, view-only, ended and revoked passes, and writes nothing", async () => {
    const w = await world();
    const driverCheckId = await driverCheck(w, checkBody(w, "6"));
    const earlier = await shopEntry(w, w.earlierPass, w.tech);
    const otherShops = await shopEntry(w, w.otherPass, w.otherTech);
    const mine = await shopEntry(w, w.pass, w.tech);
    const viewPass = (await insertPass({ driver: w.driver, shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) })).id;
    const ended = (await insertPass({ driver: w.driver, shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], startsAt: new Date(Date.now() - 5 * HOUR), endsAt: new Date(Date.now() - HOUR) })).id;
    const revoked = (await insertPass({ driver: w.driver, shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR), revokedAt: new Date(Date.now() - 60_000) })).id;
    const elsewhere = await makeVehicle(w.driver, "The driver's other car");

    const before = await counts();
    const readingsBefore = await db.select().from(treadReading);
    const tries: [string, () => Promise<Response>, number, string?][] = [
      ["the driver's own check", () => passPatchCheck(send("/", w.tech, "PATCH", checkBody(w, "5")), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, checkId: driverCheckId })), 403, "forbidden"],
      ["the driver's own check, deleted", () => passDeleteCheck(send("/", w.tech, "DELETE"), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, checkId: driverCheckId })), 403, "forbidden"],
      ["an earlier pass's entry", () => passPatchEntry(send("/", w.tech, "PATCH", { kind: "inspection" }), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, entryId: earlier.id })), 403, "forbidden"],
      ["another shop's entry, through this pass", () => passDeleteEntry(send("/", w.tech, "DELETE"), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, entryId: otherShops.id })), 403, "forbidden"],
      ["this pass's entry, by another shop's technician", () => passDeleteEntry(send("/", w.otherTech, "DELETE"), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, entryId: mine.id })), 404],
      ["this pass's entry, by the driver through the pass route", () => passDeleteEntry(send("/", w.driver, "DELETE"), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, entryId: mine.id })), 404],
      ["this pass's entry under a view-only pass", () => passPatchEntry(send("/", w.tech, "PATCH", { kind: "inspection" }), ctx({ passId: viewPass, vehicleId: w.car.vehicle.id, entryId: mine.id })), 403, "forbidden"],
      ["this pass's check under an ended pass", () => passPatchCheck(send("/", w.tech, "PATCH", checkBody(w, "5")), ctx({ passId: ended, vehicleId: w.car.vehicle.id, checkId: mine.checkIds[0] })), 403, "pass_ended"],
      ["this pass's check under a revoked pass", () => passDeleteCheck(send("/", w.tech, "DELETE"), ctx({ passId: revoked, vehicleId: w.car.vehicle.id, checkId: mine.checkIds[0] })), 403, "pass_ended"],
      ["this pass's entry named under another vehicle", () => passDeleteEntry(send("/", w.tech, "DELETE"), ctx({ passId: w.pass, vehicleId: elsewhere.vehicle.id, entryId: mine.id })), 404],
      ["a driver's route used by the technician", () => deleteCheck(send("/", w.tech, "DELETE"), ctx({ checkId: mine.checkIds[0] })), 404],
    ];
    for (const [what, call, status, code] of tries) {
      const res = await call();
      expect(res.status, what).toBe(status);
      if (code) expect(((await res.json()) as Json).error?.code, what).toBe(code);
    }
    expect(await counts()).toEqual(before);
    expect(await db.select().from(treadReading)).toEqual(readingsBefore);
    // The pass's own check still changes: the refusals were about the rows, not the pass.
    const ok = await passPatchCheck(send("/", w.tech, "PATCH", checkBody(w, "5.9")), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, checkId: mine.checkIds[0] }));
    expect(ok.status).toBe(200);
  });

  it("a check added on its own under the pass is the shop's to change too", async () => {
    const w = await world();
    const res = await passAddCheck(send("/", w.tech, "POST", checkBody(w, "6.5")), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id }));
    const checkId = ((await res.json()) as { check: { id: string } }).check.id;
    const edit = await passPatchCheck(send("/", w.tech, "PATCH", checkBody(w, "6.4")), ctx({ passId: w.pass, vehicleId: w.car.vehicle.id, checkId }));
    expect(edit.status).toBe(200);
    // The driver may still change or delete what the shop recorded.
    expect((await deleteCheck(send("/", w.driver, "DELETE"), ctx({ checkId }))).status).toBe(200);
  });
});
