// Co-keepers through the real route handlers: who may read, write, manage
// and end the arrangement, and what a refusal leaves behind.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { treadCheck, vehicleKeeper } from "@/db/schema";
import { GET as readVehicle, DELETE as deleteVehicleRoute, PATCH as patchVehicle } from "@/app/api/vehicles/[vehicleId]/route";
import { POST as addCheck } from "@/app/api/vehicles/[vehicleId]/checks/route";
import { GET as listKeepersRoute, POST as inviteRoute } from "@/app/api/vehicles/[vehicleId]/keepers/route";
import { POST as acceptRoute } from "@/app/api/keepers/accept/route";
import { DELETE as endRoute } from "@/app/api/keepers/[keeperId]/route";
import { POST as givePass } from "@/app/api/passes/route";
import { GET as vehiclesList } from "@/app/api/vehicles/route";
import { loadLogbookInput } from "@/db/queries/logbook-input";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { counts, HOUR, insertPass, mailsTo, makeVehicle } from "../passes/helpers";

let owner: TestUser, keeper: TestUser, other: TestUser, tech: TestUser, admin: TestUser, shopId: string;
let car: Awaited<ReturnType<typeof makeVehicle>>;
let passId: string;

/** The link's secret from the invitation e-mail (as a person would click it). */
async function tokenFromMail(email: string) {
  const mails = await mailsTo(email);
  const last = mails.at(-1)!;
  const m = /\/keep\/([A-Za-z0-9_-]{43})/.exec(last.html ?? "");
  expect(m, "the invitation e-mail holds the link").not.toBeNull();
  return m![1];
}

const check = (as: TestUser | undefined) =>
  addCheck(
    request(`/api/vehicles/${car.vehicle.id}/checks`, { as, body: { setId: car.set.id, readings: car.tires.map((t) => ({ tireId: t.id, centre: "5.5" })) } }),
    ctx({ vehicleId: car.vehicle.id }),
  );
const read = (as: TestUser | undefined) => readVehicle(request(`/api/vehicles/${car.vehicle.id}`, { as }), ctx({ vehicleId: car.vehicle.id }));

beforeAll(async () => {
  owner = await signUp({ name: "Maren Oldcastle" });
  keeper = await signUp({ name: "Ivo Oldcastle" });
  other = await signUp({ name: "Bettany Quail" });
  tech = await signUp({ name: "Rufus Pellow" });
  admin = await signUp({ name: "Op Erator", admin: true });
  shopId = (await makeShop({ owner: await signUp(), technicians: [tech] })).id;
  car = await makeVehicle(owner, "Maren's estate");
  passId = (await insertPass({ driver: owner, shopId, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + 8 * HOUR) })).id;
});

describe("co-keepers", () => {
  it("only the owner invites; the invitation is e-mailed and a stranger's link does nothing for another account", async () => {
    for (const [as, status] of [[keeper, 404], [other, 404], [tech, 404], [admin, 404], [undefined, 401]] as const) {
      const res = await inviteRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as, body: { email: keeper.email } }), ctx({ vehicleId: car.vehicle.id }));
      expect(res.status, `invite as ${as?.name ?? "signed out"}`).toBe(status);
    }
    expect(await db.select().from(vehicleKeeper)).toHaveLength(0);
    const bad = await inviteRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as: owner, body: { email: "not-an-address" } }), ctx({ vehicleId: car.vehicle.id }));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.fields.email).toBeTruthy();
    const res = await inviteRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as: owner, body: { email: keeper.email.toUpperCase() } }), ctx({ vehicleId: car.vehicle.id }));
    expect(res.status).toBe(201);
    const token = await tokenFromMail(keeper.email);
    // Before accepting, the invited person has no access at all.
    expect((await read(keeper)).status).toBe(404);
    // Another signed-in account cannot take up someone else's invitation.
    const wrong = await acceptRoute(request("/api/keepers/accept", { as: other, body: { token } }), ctx({}));
    expect(wrong.status).toBe(403);
    const anon = await acceptRoute(request("/api/keepers/accept", { body: { token } }), ctx({}));
    expect(anon.status).toBe(401);
  });

  it("the invited account accepts once; then reads, writes under its own name, and sees the vehicle in its list and reminders", async () => {
    const token = await tokenFromMail(keeper.email);
    const ok = await acceptRoute(request("/api/keepers/accept", { as: keeper, body: { token } }), ctx({}));
    expect(ok.status).toBe(200);
    const again = await acceptRoute(request("/api/keepers/accept", { as: keeper, body: { token } }), ctx({}));
    expect(again.status).toBe(409);
    expect((await again.json()).error.message).toMatch(/already used/);

    expect((await read(keeper)).status).toBe(200);
    const res = await check(keeper);
    expect(res.status).toBe(201);
    const [row] = await db.select().from(treadCheck).where(eq(treadCheck.vehicleId, car.vehicle.id));
    expect(row.authorUserId).toBe(keeper.id);
    // The owner sees it, by the co-keeper's name; the co-keeper sees it as theirs.
    const ownerView = await (await read(owner)).json();
    expect(ownerView.checks[0]).toMatchObject({ authorName: "Ivo Oldcastle", byViewer: false });
    const keeperView = await (await read(keeper)).json();
    expect(keeperView.checks[0].byViewer).toBe(true);
    expect(keeperView.role).toBe("keeper");
    // Co-keepers see no shop access log (it is the owner's record of their passes).
    expect(keeperView.accessLog).toEqual([]);

    const list = await (await vehiclesList(request("/api/vehicles", { as: keeper }), ctx({}))).json();
    expect(JSON.stringify(list)).toContain(car.vehicle.id);
    const input = await loadLogbookInput({ ownerId: keeper.id });
    expect(input.vehicles.map((v) => v.id)).toContain(car.vehicle.id);
    const otherInput = await loadLogbookInput({ ownerId: other.id });
    expect(otherInput.vehicles).toHaveLength(0);
  });

  it("owner-only actions refuse a co-keeper and write nothing: delete, change the vehicle, invite, give a pass", async () => {
    const before = await counts();
    const del = await deleteVehicleRoute(request(`/api/vehicles/${car.vehicle.id}`, { as: keeper, method: "DELETE" }), ctx({ vehicleId: car.vehicle.id }));
    expect(del.status).toBe(403);
    const patch = await patchVehicle(
      request(`/api/vehicles/${car.vehicle.id}`, { as: keeper, method: "PATCH", body: { nickname: "Mine now", make: "Velora", model: "Strand", odometerUnit: "km" } }),
      ctx({ vehicleId: car.vehicle.id }),
    );
    expect([403, 422]).toContain(patch.status);
    const inv = await inviteRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as: keeper, body: { email: other.email } }), ctx({ vehicleId: car.vehicle.id }));
    expect(inv.status).toBe(403);
    const pass = await givePass(
      request("/api/passes", { as: keeper, body: { shopId, vehicleIds: [car.vehicle.id], scope: "view", duration: "4h" } }),
      ctx({}),
    );
    expect(pass.status).toBe(404);
    expect(await counts()).toEqual(before);
    expect((await read(owner)).status).toBe(200);
  });

  it("the owner lists co-keepers; other drivers, technicians under a pass and operators cannot", async () => {
    const mine = await (await listKeepersRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as: owner }), ctx({ vehicleId: car.vehicle.id }))).json();
    expect(mine.keepers).toEqual([expect.objectContaining({ name: "Ivo Oldcastle", state: "active" })]);
    for (const as of [other, tech, admin]) {
      const res = await listKeepersRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as }), ctx({ vehicleId: car.vehicle.id }));
      expect(res.status).toBe(404);
    }
    expect(passId).toBeTruthy();
  });

  it("another driver cannot end it; the co-keeper can, and is then refused everywhere", async () => {
    const [k] = await db.select().from(vehicleKeeper).where(eq(vehicleKeeper.userId, keeper.id));
    const stranger = await endRoute(request(`/api/keepers/${k.id}`, { as: other, method: "DELETE" }), ctx({ keeperId: k.id }));
    expect(stranger.status).toBe(404);
    const techEnd = await endRoute(request(`/api/keepers/${k.id}`, { as: tech, method: "DELETE" }), ctx({ keeperId: k.id }));
    expect(techEnd.status).toBe(404);
    const ended = await endRoute(request(`/api/keepers/${k.id}`, { as: keeper, method: "DELETE" }), ctx({ keeperId: k.id }));
    expect(ended.status).toBe(200);
    const before = await counts();
    expect((await read(keeper)).status).toBe(404);
    expect((await check(keeper)).status).toBe(404);
    expect(await counts()).toEqual(before);
    expect((await loadLogbookInput({ ownerId: keeper.id })).vehicles).toHaveLength(0);
    // Their earlier check stays in the owner's logbook, with their name.
    const ownerView = await (await read(owner)).json();
    expect(ownerView.checks[0].authorName).toBe("Ivo Oldcastle");
  });

  it("the owner can end it too, and an expired invitation says so", async () => {
    await inviteRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as: owner, body: { email: keeper.email } }), ctx({ vehicleId: car.vehicle.id }));
    const token = await tokenFromMail(keeper.email);
    expect((await acceptRoute(request("/api/keepers/accept", { as: keeper, body: { token } }), ctx({}))).status).toBe(200);
    const [k] = await db.select().from(vehicleKeeper).where(eq(vehicleKeeper.state, "active"));
    expect((await endRoute(request(`/api/keepers/${k.id}`, { as: owner, method: "DELETE" }), ctx({ keeperId: k.id }))).status).toBe(200);
    expect((await read(keeper)).status).toBe(404);

    await inviteRoute(request(`/api/vehicles/${car.vehicle.id}/keepers`, { as: owner, body: { email: other.email } }), ctx({ vehicleId: car.vehicle.id }));
    const t2 = await tokenFromMail(other.email);
    await db.update(vehicleKeeper).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(vehicleKeeper.email, other.email));
    const late = await acceptRoute(request("/api/keepers/accept", { as: other, body: { token: t2 } }), ctx({}));
    expect(late.status).toBe(409);
    expect((await late.json()).error.message).toMatch(/expired/);
    expect((await read(other)).status).toBe(404);
  });
});
