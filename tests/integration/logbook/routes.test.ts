// Every logbook route through its real handler on a fresh database: the
// owner is served, another driver gets 404 (never a hint the data exists),
// a signed-out request gets 401, bad input gets 422 naming the field and
// writes nothing.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { serviceEntry, tire, tireSet, treadCheck, treadReading, vehicle } from "@/db/schema";
import { GET as listVehicles, POST as createVehicle } from "@/app/api/vehicles/route";
import { DELETE as deleteVehicle, GET as getVehicle, PATCH as patchVehicle } from "@/app/api/vehicles/[vehicleId]/route";
import { POST as createSet } from "@/app/api/vehicles/[vehicleId]/sets/route";
import { POST as createCheck } from "@/app/api/vehicles/[vehicleId]/checks/route";
import { POST as createService } from "@/app/api/vehicles/[vehicleId]/service-entries/route";
import { POST as swap } from "@/app/api/vehicles/[vehicleId]/swap/route";
import { DELETE as deleteSet, GET as getSet, PATCH as patchSet } from "@/app/api/sets/[setId]/route";
import { DELETE as deleteCheck } from "@/app/api/checks/[checkId]/route";
import { DELETE as deleteService } from "@/app/api/service-entries/[entryId]/route";
import { createSetWithTires } from "@/db/queries/sets";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { thirtySecondsToMm } from "@/lib/tires";
import { setPurchaseSchema, todayIso } from "@/lib/validation/logbook";
import { ctx, request, signUp } from "../../support/users";
import { dotCodeDaysAgo, fourTires, makeSet, makeVehicle, purchaseBody, vehicleBody } from "./fixtures";

type Json = Record<string, unknown> & { error?: { code: string; message: string; fields?: Record<string, string[]> } };
const json = async (res: Response) => (await res.json()) as Json;
const rows = async (table: typeof vehicle | typeof tireSet | typeof tire | typeof treadCheck | typeof serviceEntry) => (await db.select({ n: count() }).from(table))[0].n;

describe("vehicles", () => {
  it("a driver adds a vehicle; bad input is refused per field and writes nothing; signed out is 401", async () => {
    const ada = await signUp();
    const id = await makeVehicle(ada);
    const [row] = await db.select().from(vehicle).where(eq(vehicle.id, id));
    expect(row).toMatchObject({ ownerId: ada.id, make: "Velora", year: 2019, placardFrontKpa: 230 });

    const before = await rows(vehicle);
    const bad = await createVehicle(request("/api/vehicles", { as: ada, body: { ...vehicleBody, nickname: "", vin: "1HGCM82633A0O4352", placardFrontSize: "banana" } }), ctx({}));
    expect(bad.status).toBe(422);
    const body = await json(bad);
    expect(Object.keys(body.error!.fields!)).toEqual(expect.arrayContaining(["nickname", "vin", "placardFrontSize"]));
    expect(body.error!.fields!.vin[0]).toMatch(/I, O and Q/);
    expect(await rows(vehicle)).toBe(before);

    const out = await createVehicle(request("/api/vehicles", { body: vehicleBody }), ctx({}));
    expect(out.status).toBe(401);
    expect(await rows(vehicle)).toBe(before);
  });

  it("pressure typed in psi is stored in kPa", async () => {
    const ada = await signUp();
    const id = await makeVehicle(ada, { placardFrontPressure: "33", pressureUnit: "psi" });
    const [row] = await db.select().from(vehicle).where(eq(vehicle.id, id));
    // 33 psi × 6.894757 kPa/psi = 227.5 kPa
    expect(row.placardFrontKpa).toBeCloseTo(227.53, 1);
  });

  it("the vehicles list holds only the driver's own vehicles", async () => {
    const ada = await signUp();
    const tomas = await signUp();
    const mine = await makeVehicle(ada, { nickname: "Ada's" });
    await makeVehicle(tomas, { nickname: "Tomas's" });
    const res = await listVehicles(request("/api/vehicles", { as: ada }), ctx({}));
    const body = (await res.json()) as { vehicles: { id: string; nickname: string }[] };
    expect(body.vehicles.map((v) => v.id)).toEqual([mine]);
    expect((await listVehicles(request("/api/vehicles"), ctx({}))).status).toBe(401);
  });

  it("read, change and delete: owner allowed, another driver 404 and nothing changes", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const id = await makeVehicle(ada);
    const url = `/api/vehicles/${id}`;

    expect((await getVehicle(request(url, { as: ada }), ctx({ vehicleId: id }))).status).toBe(200);
    const theirs = await getVehicle(request(url, { as: stranger }), ctx({ vehicleId: id }));
    expect(theirs.status).toBe(404);
    expect(JSON.stringify(await theirs.json())).not.toContain("Velora");
    expect((await getVehicle(request(url), ctx({ vehicleId: id }))).status).toBe(401);
    expect((await getVehicle(request("/api/vehicles/nope", { as: ada }), ctx({ vehicleId: "nope" }))).status).toBe(404);

    const patch = { ...vehicleBody, nickname: "Renamed" };
    expect((await patchVehicle(request(url, { method: "PATCH", as: stranger, body: patch }), ctx({ vehicleId: id }))).status).toBe(404);
    // A stranger's bad body is still a 404: the access check comes first.
    expect((await patchVehicle(request(url, { method: "PATCH", as: stranger, body: { nickname: "" } }), ctx({ vehicleId: id }))).status).toBe(404);
    const bad = await patchVehicle(request(url, { method: "PATCH", as: ada, body: { ...vehicleBody, year: "1800" } }), ctx({ vehicleId: id }));
    expect(bad.status).toBe(422);
    expect((await json(bad)).error!.fields!.year).toBeDefined();
    expect((await db.select().from(vehicle).where(eq(vehicle.id, id)))[0].nickname).toBe("The blue one");
    expect((await patchVehicle(request(url, { method: "PATCH", as: ada, body: patch }), ctx({ vehicleId: id }))).status).toBe(200);
    expect((await db.select().from(vehicle).where(eq(vehicle.id, id)))[0].nickname).toBe("Renamed");

    expect((await deleteVehicle(request(url, { method: "DELETE", as: stranger }), ctx({ vehicleId: id }))).status).toBe(404);
    expect((await db.select().from(vehicle).where(eq(vehicle.id, id))).length).toBe(1);
    expect((await deleteVehicle(request(url, { method: "DELETE" }), ctx({ vehicleId: id }))).status).toBe(401);
    expect((await deleteVehicle(request(url, { method: "DELETE", as: ada }), ctx({ vehicleId: id }))).status).toBe(200);
    expect((await db.select().from(vehicle).where(eq(vehicle.id, id))).length).toBe(0);
  });
});

describe("a tire purchase", () => {
  it("stores the set, four tires with their decoded DOT weeks, and a fitting entry; the logbook shows ages and a condition", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const code = dotCodeDaysAgo(400);
    const { setId, serviceEntryId } = await makeSet(ada, vehicleId);
    const [set] = await db.select().from(tireSet).where(eq(tireSet.id, setId));
    // Load index and speed symbol come from the size itself.
    expect(set).toMatchObject({ state: "mounted", loadIndex: 91, speedSymbol: "V", priceCents: 41250, seller: "Quillby Tread Works" });
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    expect(tires).toHaveLength(4);
    for (const t of tires) {
      expect(t.dotCode).toBe(`DOT 3QXY ABC ${code}`);
      expect(t.dotWeek).toBe(Number(code.slice(0, 2)));
      expect(t.dotYear).toBe(2000 + Number(code.slice(2)));
      expect(t.dotWeekStart! <= todayIso()).toBe(true);
      expect(t.newDepthMm).toBe(8);
    }
    const [fit] = await db.select().from(serviceEntry).where(eq(serviceEntry.id, serviceEntryId!));
    expect(fit).toMatchObject({ kind: "fitting", setId, odometerKm: 41000, costCents: 41250 });

    const res = await getVehicle(request(`/api/vehicles/${vehicleId}`, { as: ada }), ctx({ vehicleId }));
    const book = (await res.json()) as { sets: { condition: string; tires: { age: { years: number }; condition: string; dot: { ok: boolean } }[] }[]; caution: string };
    expect(book.sets[0].tires[0].dot.ok).toBe(true);
    expect(book.sets[0].tires[0].age.years).toBe(1);
    // An 8 mm, one-year-old summer tire is good by age (under 5 years) and by depth [practice, trade-facts §3].
    expect(book.sets[0].condition).toBe("good");
    expect(book.caution).toMatch(/technician/);
  });

  it("refuses an impossible DOT code naming the tire, and writes nothing", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const before = [await rows(tireSet), await rows(tire), await rows(serviceEntry)];
    const tires = fourTires(dotCodeDaysAgo(100));
    tires[2] = { ...tires[2], dotCode: "DOT 3QXY ABC 5818" };
    const res = await createSet(request(`/api/vehicles/${vehicleId}/sets`, { as: ada, body: purchaseBody({ tires }) }), ctx({ vehicleId }));
    expect(res.status).toBe(422);
    const body = await json(res);
    expect(Object.keys(body.error!.fields!)).toEqual(["tires.2.dotCode"]);
    // Week 58 does not exist (49 CFR 574.5 weeks run 01–52/53) [pub].
    expect(body.error!.fields!["tires.2.dotCode"][0]).toMatch(/week/i);
    expect([await rows(tireSet), await rows(tire), await rows(serviceEntry)]).toEqual(before);
  });

  it("asks what becomes of the set on the car, then stores it where the driver says", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const first = await makeSet(ada, vehicleId);
    const before = await rows(tireSet);
    const res = await createSet(request(`/api/vehicles/${vehicleId}/sets`, { as: ada, body: purchaseBody({ kind: "winter", odometer: "42000" }) }), ctx({ vehicleId }));
    expect(res.status).toBe(422);
    expect((await json(res)).error!.fields!.replacedFate).toBeDefined();
    expect(await rows(tireSet)).toBe(before);

    await makeSet(ada, vehicleId, { kind: "winter", odometer: "42000", replacedFate: "stored", replacedStorage: "Garage loft" });
    const [old] = await db.select().from(tireSet).where(eq(tireSet.id, first.setId));
    expect(old).toMatchObject({ state: "stored", storageLocation: "Garage loft" });
  });

  it("a purchase with an odometer below the last reading asks first (409), then saves when confirmed", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    await makeSet(ada, vehicleId);
    const before = await rows(tireSet);
    const body = purchaseBody({ odometer: "40000", replacedFate: "retired" });
    const res = await createSet(request(`/api/vehicles/${vehicleId}/sets`, { as: ada, body }), ctx({ vehicleId }));
    expect(res.status).toBe(409);
    expect((await json(res)).error!.fields!.odometer).toBeDefined();
    expect(await rows(tireSet)).toBe(before);
    await makeSet(ada, vehicleId, { odometer: "40000", replacedFate: "retired", confirmLowerOdometer: true });
    expect(await rows(tireSet)).toBe(before + 1);
  });

  it("a failure half-way through the transaction leaves no set, no tire and the old set on the car", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const first = await makeSet(ada, vehicleId);
    const before = [await rows(tireSet), await rows(tire), await rows(serviceEntry)];
    const input = setPurchaseSchema.parse(purchaseBody({ odometer: "43000", replacedFate: "retired" }));
    // A position the database does not know makes the tire insert fail after the set row was written.
    (input.tires[3] as { position: string }).position = "roof";
    await expect(createSetWithTires({ access: ownerAccess({ user: { id: ada.id, name: ada.name } }), vehicleId, input })).rejects.toThrow();
    expect([await rows(tireSet), await rows(tire), await rows(serviceEntry)]).toEqual(before);
    expect((await db.select().from(tireSet).where(eq(tireSet.id, first.setId)))[0].state).toBe("mounted");
  });

  it("another driver's vehicle is 404 and signed out is 401, with nothing written", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const vehicleId = await makeVehicle(ada);
    const before = await rows(tireSet);
    expect((await createSet(request(`/api/vehicles/${vehicleId}/sets`, { as: stranger, body: purchaseBody() }), ctx({ vehicleId }))).status).toBe(404);
    expect((await createSet(request(`/api/vehicles/${vehicleId}/sets`, { body: purchaseBody() }), ctx({ vehicleId }))).status).toBe(401);
    expect(await rows(tireSet)).toBe(before);
  });

  it("the set page: owner reads it, a stranger gets 404; edits and deletion are owner-only", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId);
    const url = `/api/sets/${setId}`;
    const res = await getSet(request(url, { as: ada }), ctx({ setId }));
    expect(res.status).toBe(200);
    const detail = (await res.json()) as { set: { tires: unknown[]; limit: { minMm: number } } };
    expect(detail.set.tires).toHaveLength(4);
    // The EU default for a summer set is the 1.6 mm legal minimum (Directive 89/459/EEC) [pub].
    expect(detail.set.limit.minMm).toBe(1.6);
    expect((await getSet(request(url, { as: stranger }), ctx({ setId }))).status).toBe(404);
    expect((await getSet(request(url), ctx({ setId }))).status).toBe(401);

    const bad = await patchSet(request(url, { method: "PATCH", as: ada, body: { ageWatchYears: "8", ageReplaceYears: "6" } }), ctx({ setId }));
    expect(bad.status).toBe(422);
    expect((await json(bad)).error!.fields!.ageWatchYears).toBeDefined();
    expect((await patchSet(request(url, { method: "PATCH", as: stranger, body: { label: "Mine now" } }), ctx({ setId }))).status).toBe(404);
    expect((await patchSet(request(url, { method: "PATCH", as: ada, body: { label: "Summer set", depthLimitMm: "3" } }), ctx({ setId }))).status).toBe(200);
    expect((await db.select().from(tireSet).where(eq(tireSet.id, setId)))[0]).toMatchObject({ label: "Summer set", depthLimitMm: 3 });

    expect((await deleteSet(request(url, { method: "DELETE", as: stranger }), ctx({ setId }))).status).toBe(404);
    expect((await deleteSet(request(url, { method: "DELETE", as: ada }), ctx({ setId }))).status).toBe(200);
    expect(await db.select().from(tire).where(eq(tire.setId, setId))).toHaveLength(0);
  });
});

describe("tread checks", () => {
  async function setUp() {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId);
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    return { ada, vehicleId, setId, tires };
  }
  const post = (vehicleId: string, body: unknown, as?: Awaited<ReturnType<typeof signUp>>) =>
    createCheck(request(`/api/vehicles/${vehicleId}/checks`, { as, body }), ctx({ vehicleId }));

  it("stores per-groove readings in mm; a depth over 20 mm is refused naming the groove and nothing is written", async () => {
    const { ada, vehicleId, setId, tires } = await setUp();
    const ok = await post(vehicleId, { setId, odometer: "45000", readings: tires.map((t) => ({ tireId: t.id, inner: "6.5", centre: "7", outer: "7.1", pressure: "230" })) }, ada);
    expect(ok.status).toBe(201);
    const { id } = (await ok.json()) as { id: string };
    const readings = await db.select().from(treadReading).where(eq(treadReading.checkId, id));
    expect(readings).toHaveLength(4);
    expect(readings[0]).toMatchObject({ innerMm: 6.5, centreMm: 7, outerMm: 7.1, pressureKpa: 230, approximate: false });
    const [c] = await db.select().from(treadCheck).where(eq(treadCheck.id, id));
    expect(c).toMatchObject({ measuredBy: "driver", method: "gauge", odometerKm: 45000, shopId: null });

    const before = await rows(treadCheck);
    const bad = await post(vehicleId, { setId, odometer: "46000", readings: [{ tireId: tires[0].id, inner: "25", centre: "6" }] }, ada);
    expect(bad.status).toBe(422);
    const body = await json(bad);
    expect(body.error!.fields!["readings.0.inner"][0]).toMatch(/between 0 and 20 mm/);
    const none = await post(vehicleId, { setId, readings: [{ tireId: tires[0].id }] }, ada);
    expect((await json(none)).error!.fields!["readings.0.centre"]).toBeDefined();
    expect(await rows(treadCheck)).toBe(before);
  });

  it("converts 32nds and psi, and stores a coin reading as its approximate depth", async () => {
    const { ada, vehicleId, setId, tires } = await setUp();
    const r32 = await post(vehicleId, { setId, depthUnit: "32nds", pressureUnit: "psi", readings: [{ tireId: tires[0].id, centre: "8", pressure: "32" }] }, ada);
    expect(r32.status).toBe(201);
    const [a] = await db.select().from(treadReading).where(eq(treadReading.checkId, ((await r32.json()) as { id: string }).id));
    // 8/32 in = 6.35 mm exactly (1 in = 25.4 mm) [pub: international inch]
    expect(a.centreMm).toBeCloseTo(6.35, 10);
    expect(a.pressureKpa).toBeCloseTo(220.63, 1);
    // 26/32 in is 20.6 mm: over the limit of what a gauge reading may be.
    const over = await post(vehicleId, { setId, depthUnit: "32nds", readings: [{ tireId: tires[0].id, centre: "26" }] }, ada);
    expect((await json(over)).error!.fields!["readings.0.centre"][0]).toMatch(/25\/32/);

    const coin = await post(vehicleId, { setId, method: "coin", readings: [{ tireId: tires[1].id, coin: "between" }] }, ada);
    expect(coin.status).toBe(201);
    const [b] = await db.select().from(treadReading).where(eq(treadReading.checkId, ((await coin.json()) as { id: string }).id));
    // "Between" the cent (2/32 in) and the quarter (4/32 in) counts as 2/32 in, the safe edge [practice, trade-facts §2].
    expect(b).toMatchObject({ approximate: true, innerMm: null, outerMm: null });
    expect(b.centreMm).toBeCloseTo(thirtySecondsToMm(2), 10);
    const noCoin = await post(vehicleId, { setId, method: "coin", readings: [{ tireId: tires[1].id }] }, ada);
    expect((await json(noCoin)).error!.fields!["readings.0.coin"]).toBeDefined();
  });

  it("an odometer lower than the last asks for confirmation (409), then saves", async () => {
    const { ada, vehicleId, setId, tires } = await setUp();
    const body = { setId, odometer: "30000", readings: [{ tireId: tires[0].id, centre: "7" }] };
    const res = await post(vehicleId, body, ada);
    expect(res.status).toBe(409);
    expect((await json(res)).error!.fields!.odometer[0]).toMatch(/lower than the last one \(41,000 km/);
    expect((await post(vehicleId, { ...body, confirmLowerOdometer: true }, ada)).status).toBe(201);
  });

  it("another driver gets 404, signed out 401, and a tire of another set is refused", async () => {
    const { ada, vehicleId, setId, tires } = await setUp();
    const stranger = await signUp();
    const body = { setId, readings: [{ tireId: tires[0].id, centre: "7" }] };
    expect((await post(vehicleId, body, stranger)).status).toBe(404);
    expect((await post(vehicleId, body)).status).toBe(401);
    const other = await setUp();
    const res = await post(vehicleId, { setId, readings: [{ tireId: other.tires[0].id, centre: "7" }] }, ada);
    expect(res.status).toBe(422);
    expect((await json(res)).error!.fields!["readings.0.tireId"]).toBeDefined();
  });

  it("deleting a check: stranger 404, owner removes it with its readings", async () => {
    const { ada, vehicleId, setId, tires } = await setUp();
    const stranger = await signUp();
    const { id } = (await (await post(vehicleId, { setId, readings: [{ tireId: tires[0].id, centre: "7" }] }, ada)).json()) as { id: string };
    expect((await deleteCheck(request(`/api/checks/${id}`, { method: "DELETE", as: stranger }), ctx({ checkId: id }))).status).toBe(404);
    expect((await deleteCheck(request(`/api/checks/${id}`, { method: "DELETE" }), ctx({ checkId: id }))).status).toBe(401);
    expect((await deleteCheck(request(`/api/checks/${id}`, { method: "DELETE", as: ada }), ctx({ checkId: id }))).status).toBe(200);
    expect(await db.select().from(treadReading).where(eq(treadReading.checkId, id))).toHaveLength(0);
  });
});

describe("service entries and seasonal swaps", () => {
  it("a service entry with a tread check is saved together; bad input names the field; stranger 404", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId);
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    const url = `/api/vehicles/${vehicleId}/service-entries`;
    const body = { kind: "rotation", odometer: "48000", cost: "25", notes: "Front to back", checks: [{ setId, readings: tires.map((t) => ({ tireId: t.id, centre: "6.8" })) }] };
    const res = await createService(request(url, { as: ada, body }), ctx({ vehicleId }));
    expect(res.status).toBe(201);
    const { id, checkIds } = (await res.json()) as { id: string; checkIds: string[] };
    const [check] = await db.select().from(treadCheck).where(eq(treadCheck.id, checkIds[0]));
    expect(check).toMatchObject({ serviceEntryId: id, odometerKm: 48000 });

    const before = [await rows(serviceEntry), await rows(treadCheck)];
    const bad = await createService(request(url, { as: ada, body: { ...body, kind: "polishing", odometer: "49000" } }), ctx({ vehicleId }));
    expect(bad.status).toBe(422);
    expect((await json(bad)).error!.fields!.kind).toBeDefined();
    const badDepth = await createService(
      request(url, { as: ada, body: { ...body, odometer: "49000", checks: [{ setId, readings: [{ tireId: tires[0].id, centre: "-1" }] }] } }),
      ctx({ vehicleId }),
    );
    expect((await json(badDepth)).error!.fields!["checks.0.readings.0.centre"]).toBeDefined();
    expect((await createService(request(url, { as: stranger, body }), ctx({ vehicleId }))).status).toBe(404);
    expect((await createService(request(url, { body }), ctx({ vehicleId }))).status).toBe(401);
    expect([await rows(serviceEntry), await rows(treadCheck)]).toEqual(before);

    expect((await deleteService(request(`/api/service-entries/${id}`, { method: "DELETE", as: stranger }), ctx({ entryId: id }))).status).toBe(404);
    expect((await deleteService(request(`/api/service-entries/${id}`, { method: "DELETE", as: ada }), ctx({ entryId: id }))).status).toBe(200);
    expect(await db.select().from(serviceEntry).where(eq(serviceEntry.id, id))).toHaveLength(0);
  });

  it("a seasonal swap mounts the stored set, stores the other where the driver says, and writes a swap entry", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const vehicleId = await makeVehicle(ada);
    const summer = await makeSet(ada, vehicleId);
    const winter = await makeSet(ada, vehicleId, { kind: "winter", mountNow: false, storageLocation: "Quillby Tread Works", odometer: "" });
    const url = `/api/vehicles/${vehicleId}/swap`;
    const body = { setId: winter.setId, storageLocation: "Garage shelf", odometer: "50000" };
    expect((await swap(request(url, { as: stranger, body }), ctx({ vehicleId }))).status).toBe(404);
    const missing = await swap(request(url, { as: ada, body: { setId: winter.setId } }), ctx({ vehicleId }));
    expect((await json(missing)).error!.fields!.storageLocation).toBeDefined();

    const res = await swap(request(url, { as: ada, body }), ctx({ vehicleId }));
    expect(res.status).toBe(200);
    const states = await db.select({ id: tireSet.id, state: tireSet.state, storageLocation: tireSet.storageLocation }).from(tireSet).where(eq(tireSet.vehicleId, vehicleId));
    expect(states).toEqual(
      expect.arrayContaining([
        { id: summer.setId, state: "stored", storageLocation: "Garage shelf" },
        { id: winter.setId, state: "mounted", storageLocation: null },
      ]),
    );
    const entries = await db.select().from(serviceEntry).where(eq(serviceEntry.kind, "seasonal_swap"));
    expect(entries.find((e) => e.setId === winter.setId)).toMatchObject({ odometerKm: 50000 });
    const again = await swap(request(url, { as: ada, body: { ...body, odometer: "50100" } }), ctx({ vehicleId }));
    expect(again.status).toBe(409);
  });
});
