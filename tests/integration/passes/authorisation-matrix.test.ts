// Every shop-facing route, called as every kind of caller: the expected
// status, nothing of the logbook in a refusal, and nothing written where
// refused (row counts before and after). Pass states are set by the pass's
// own times, relative to the clock at the request.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { invitation, member, organization, serviceEntry, shopPass, treadCheck } from "@/db/schema";
import { GET as heldPasses } from "@/app/api/passes/held/route";
import { GET as readLogbook } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/route";
import { POST as addService } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/route";
import { POST as addCheck } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/route";
import { POST as addSet } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/sets/route";
import { POST as revoke } from "@/app/api/passes/[passId]/revoke/route";
import { POST as extend } from "@/app/api/passes/[passId]/extend/route";
import { GET as shopGet, PATCH as shopPatch } from "@/app/api/shops/[shopId]/route";
import { POST as invite } from "@/app/api/shops/[shopId]/invitations/route";
import { DELETE as removeStaff } from "@/app/api/shops/[shopId]/staff/[memberId]/route";
import { GET as shopWork } from "@/app/api/shops/[shopId]/work/route";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { counts, HOUR, insertPass, makeVehicle, mailsTo } from "./helpers";

type Actor = "ownerDriver" | "otherDriver" | "tech" | "techOtherShop" | "shopOwner" | "signedOut" | "admin";
type PassKind = "active" | "ended" | "revoked" | "view";

let users: Record<Exclude<Actor, "signedOut">, TestUser>;
let shopA: string;
let shopB: string;
let car: Awaited<ReturnType<typeof makeVehicle>>;
let otherCar: Awaited<ReturnType<typeof makeVehicle>>;
let passes: Record<PassKind, string>;

beforeAll(async () => {
  users = {
    ownerDriver: await signUp({ name: "Odile Farrant" }),
    otherDriver: await signUp({ name: "Piet Varnsworth" }),
    tech: await signUp({ name: "Tamsin Rook" }),
    techOtherShop: await signUp({ name: "Hollis Grebe" }),
    shopOwner: await signUp({ name: "Sella Brandt" }),
    admin: await signUp({ name: "Op Erator", admin: true }),
  };
  const otherOwner = await signUp();
  shopA = (await makeShop({ name: "Ferncastle Wheelhouse", owner: users.shopOwner, technicians: [users.tech] })).id;
  shopB = (await makeShop({ name: "Duncombe Rubber Yard", owner: otherOwner, technicians: [users.techOtherShop] })).id;
  car = await makeVehicle(users.ownerDriver, "Odile's grey Velora");
  otherCar = await makeVehicle(users.ownerDriver, "Odile's trailer car");
  const now = Date.now();
  const base = { driver: users.ownerDriver, shopId: shopA, vehicleIds: [car.vehicle.id] };
  passes = {
    active: (await insertPass({ ...base, startsAt: new Date(now - HOUR), endsAt: new Date(now + 8 * HOUR) })).id,
    ended: (await insertPass({ ...base, startsAt: new Date(now - 10 * HOUR), endsAt: new Date(now - HOUR) })).id,
    revoked: (await insertPass({ ...base, startsAt: new Date(now - HOUR), endsAt: new Date(now + 8 * HOUR), revokedAt: new Date(now - 60_000) })).id,
    view: (await insertPass({ ...base, scope: "view", startsAt: new Date(now - HOUR), endsAt: new Date(now + 8 * HOUR) })).id,
  };
});

const as = (a: Actor) => (a === "signedOut" ? undefined : users[a]);

const bodies = {
  service: () => ({
    kind: "rotation",
    notes: "Rotated front to back.",
    checks: [{ setId: car.set.id, method: "gauge", depthUnit: "mm", pressureUnit: "kpa", readings: [{ tireId: car.tires[0].id, inner: "6.0", centre: "6.2", outer: "6.1", pressure: "230" }] }],
  }),
  check: () => ({ setId: car.set.id, readings: car.tires.map((t) => ({ tireId: t.id, centre: "5.5" })) }),
  set: () => ({
    kind: "winter",
    size: "205/55R16",
    mountNow: true,
    replacedFate: "stored",
    replacedStorage: "Rack 3 at the shop",
    tires: (["front_left", "front_right", "rear_left", "rear_right"] as const).map((position) => ({ position, dotCode: "DOT XJ7K ABCD 1224", newDepth: "9" })),
  }),
};

type Op = { name: string; write: boolean; call: (actor: Actor, passId: string, vehicleId?: string) => Promise<Response> };
const ops: Op[] = [
  {
    name: "read the logbook",
    write: false,
    call: (a, passId, vehicleId = car.vehicle.id) => readLogbook(request(`/api/passes/${passId}/vehicles/${vehicleId}`, { as: as(a) }), ctx({ passId, vehicleId })),
  },
  {
    name: "record a service entry with a check",
    write: true,
    call: (a, passId, vehicleId = car.vehicle.id) => addService(request(`/api/passes/${passId}/vehicles/${vehicleId}/service`, { as: as(a), body: bodies.service() }), ctx({ passId, vehicleId })),
  },
  {
    name: "record a tread check",
    write: true,
    call: (a, passId, vehicleId = car.vehicle.id) => addCheck(request(`/api/passes/${passId}/vehicles/${vehicleId}/checks`, { as: as(a), body: bodies.check() }), ctx({ passId, vehicleId })),
  },
  {
    name: "log a fitted set",
    write: true,
    call: (a, passId, vehicleId = car.vehicle.id) => addSet(request(`/api/passes/${passId}/vehicles/${vehicleId}/sets`, { as: as(a), body: bodies.set() }), ctx({ passId, vehicleId })),
  },
];

// [caller, pass, expected status for a read, expected status for a write]
const matrix: [Actor, PassKind, number, number][] = [
  ["ownerDriver", "active", 404, 404], // the driver is not staff of the shop: the shop side is not theirs
  ["otherDriver", "active", 404, 404],
  ["tech", "active", 200, 201],
  ["tech", "ended", 403, 403],
  ["tech", "revoked", 403, 403],
  ["tech", "view", 200, 403],
  ["techOtherShop", "active", 404, 404],
  ["shopOwner", "active", 200, 201],
  ["signedOut", "active", 401, 401],
  ["admin", "active", 404, 404],
];

describe.each(ops)("$name", (op) => {
  it.each(matrix)("as %s with the %s pass", async (actor, kind, readStatus, writeStatus) => {
    const expected = op.write ? writeStatus : readStatus;
    const before = await counts();
    const res = await op.call(actor, passes[kind]);
    const body = await res.json();
    expect(res.status, JSON.stringify(body)).toBe(expected);
    const after = await counts();
    if (expected >= 400) {
      // Refused: nothing written, not even an access-log row, and nothing of the logbook in the answer.
      expect(after).toEqual(before);
      const text = JSON.stringify(body);
      expect(text).not.toContain(car.vehicle.nickname);
      expect(text).not.toContain("XJ7K");
      expect(body.error.code).toBe(
        expected === 401 ? "unauthenticated" : expected === 404 ? "not_found" : kind === "ended" || kind === "revoked" ? "pass_ended" : "forbidden",
      );
      if (kind === "ended") expect(body.error.message).toMatch(/ended on/);
      if (kind === "revoked") expect(body.error.message).toMatch(/withdrew/);
      if (kind === "view") expect(body.error.message).toMatch(/not add to it/);
    } else {
      // Allowed: exactly one access-log row, and the write itself.
      expect(after.accessLog).toBe(before.accessLog + 1);
      if (op.name === "read the logbook") {
        expect(body.logbook.vehicle.nickname).toBe(car.vehicle.nickname);
        expect(body.logbook.accessLog).toEqual([]); // the driver's log is not shown to the shop
        expect(after.serviceEntry).toBe(before.serviceEntry);
      }
      if (op.name === "record a service entry with a check") {
        expect(after.serviceEntry).toBe(before.serviceEntry + 1);
        expect(after.treadCheck).toBe(before.treadCheck + 1);
        const [entry] = await db.select().from(serviceEntry).where(eq(serviceEntry.id, body.entry.id));
        expect(entry).toMatchObject({ shopId: shopA, authorUserId: users[actor as "tech"].id, passId: passes[kind] });
        const [check] = await db.select().from(treadCheck).where(eq(treadCheck.serviceEntryId, body.entry.id));
        expect(check).toMatchObject({ measuredBy: "shop", shopId: shopA });
      }
      if (op.name === "record a tread check") expect(after.treadReading).toBe(before.treadReading + 4);
      if (op.name === "log a fitted set") {
        expect(after.tireSet).toBe(before.tireSet + 1);
        expect(after.tire).toBe(before.tire + 4);
      }
    }
  });

  it("refuses a vehicle of the same driver that the pass does not cover, as not found", async () => {
    const before = await counts();
    const res = await op.call("tech", passes.active, otherCar.vehicle.id);
    expect(res.status).toBe(404);
    expect(JSON.stringify(await res.json())).not.toContain(otherCar.vehicle.nickname);
    expect(await counts()).toEqual(before);
  });
});

describe("the passes the shop holds", () => {
  it.each([
    ["tech", 200, 3],
    ["shopOwner", 200, 3],
    ["techOtherShop", 200, 0],
    ["ownerDriver", 200, 0],
    ["admin", 200, 0],
    ["signedOut", 401, 0],
  ] as [Actor, number, number][])("as %s: %i with %i passes", async (actor, status, n) => {
    const res = await heldPasses(request("/api/passes/held", { as: as(actor) }), ctx({}));
    expect(res.status).toBe(status);
    if (status === 200) {
      const { passes: list } = await res.json();
      // active and view are open, ended and revoked are greyed; all within 48 h.
      expect(list.length).toBe(n === 0 ? 0 : 4);
      if (n > 0) expect(list.slice(0, 2).map((p: { state: string }) => p.state)).toEqual(["active", "active"]);
      if (n > 0) expect(list[0].driverName).toBe("Odile Farrant");
    }
  });
});

describe("a pass that ends while the page is open", () => {
  it("works, then the driver ends it, and the technician's next request is refused with a clear message", async () => {
    const p = await insertPass({ driver: users.ownerDriver, shopId: shopA, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) });
    const read = () => readLogbook(request(`/api/passes/${p.id}/vehicles/${car.vehicle.id}`, { as: users.tech }), ctx({ passId: p.id, vehicleId: car.vehicle.id }));
    expect((await read()).status).toBe(200);
    // Only the driver who gave it can end it.
    for (const who of [users.tech, users.shopOwner, users.otherDriver, users.admin]) {
      expect((await revoke(request(`/api/passes/${p.id}/revoke`, { as: who, body: {} }), ctx({ passId: p.id }))).status).toBe(404);
      expect((await extend(request(`/api/passes/${p.id}/extend`, { as: who, body: { duration: "4h" } }), ctx({ passId: p.id }))).status).toBe(404);
    }
    expect((await read()).status).toBe(200);
    const r = await revoke(request(`/api/passes/${p.id}/revoke`, { as: users.ownerDriver, body: {} }), ctx({ passId: p.id }));
    expect(r.status).toBe(200);
    const refused = await read();
    expect(refused.status).toBe(403);
    expect((await refused.json()).error).toMatchObject({ code: "pass_ended", message: expect.stringContaining("withdrew this pass") });
  });

  it("and when its time runs out between two requests", async () => {
    const p = await insertPass({ driver: users.ownerDriver, shopId: shopA, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) });
    const read = () => readLogbook(request(`/api/passes/${p.id}/vehicles/${car.vehicle.id}`, { as: users.tech }), ctx({ passId: p.id, vehicleId: car.vehicle.id }));
    expect((await read()).status).toBe(200);
    // The clock moves past the end: the same as setting the end into the past.
    await db.update(shopPass).set({ endsAt: new Date(Date.now() - 1000) }).where(eq(shopPass.id, p.id));
    const refused = await read();
    expect(refused.status).toBe(403);
    expect((await refused.json()).error.message).toMatch(/Ask the driver for a new pass/);
  });
});

describe("owner-only shop actions", () => {
  it.each([
    ["shopOwner", 200],
    ["tech", 403],
    ["techOtherShop", 404],
    ["ownerDriver", 404],
    ["admin", 404],
    ["signedOut", 401],
  ] as [Actor, number][])("profile and staff as %s: %i", async (actor, status) => {
    const res = await shopGet(request(`/api/shops/${shopA}`, { as: as(actor) }), ctx({ shopId: shopA }));
    expect(res.status).toBe(status);
    const text = await res.text();
    if (status !== 200) expect(text).not.toContain(users.tech.email);
    else expect(text).toContain(users.tech.email);

    const [before] = await db.select().from(organization).where(eq(organization.id, shopA));
    const patch = await shopPatch(
      request(`/api/shops/${shopA}`, { as: as(actor), method: "PATCH", body: { name: `Ferncastle Wheelhouse ${actor}`, town: "Ferncastle" } }),
      ctx({ shopId: shopA }),
    );
    expect(patch.status).toBe(status);
    const [after] = await db.select().from(organization).where(eq(organization.id, shopA));
    expect(after.name).toBe(status === 200 ? `Ferncastle Wheelhouse ${actor}` : before.name);

    const invitedEmail = `new-tech-${actor.toLowerCase()}@example.test`;
    const inv = await invite(request(`/api/shops/${shopA}/invitations`, { as: as(actor), body: { email: invitedEmail } }), ctx({ shopId: shopA }));
    expect(inv.status).toBe(status === 200 ? 201 : status);
    const rows = await db.select().from(invitation).where(eq(invitation.email, invitedEmail));
    expect(rows).toHaveLength(status === 200 ? 1 : 0);
    expect(await mailsTo(invitedEmail)).toHaveLength(status === 200 ? 1 : 0);

    const work = await shopWork(request(`/api/shops/${shopA}/work`, { as: as(actor) }), ctx({ shopId: shopA }));
    // The shop's own record of work is for all its staff.
    expect(work.status).toBe(actor === "tech" ? 200 : status);
  });

  it("only the owner removes a technician, and never the owner", async () => {
    const extra = await signUp();
    await db.insert(member).values({ id: `${shopA}_extra`, organizationId: shopA, userId: extra.id, role: "technician" });
    const del = (who: Actor, memberId: string) => removeStaff(request(`/api/shops/${shopA}/staff/${memberId}`, { as: as(who), method: "DELETE" }), ctx({ shopId: shopA, memberId }));
    expect((await del("tech", `${shopA}_extra`)).status).toBe(403);
    expect((await del("techOtherShop", `${shopA}_extra`)).status).toBe(404);
    expect((await del("signedOut", `${shopA}_extra`)).status).toBe(401);
    expect(await db.select().from(member).where(eq(member.id, `${shopA}_extra`))).toHaveLength(1);
    expect((await del("shopOwner", `${shopA}_owner`)).status).toBe(409);
    expect((await del("shopOwner", `${shopA}_extra`)).status).toBe(200);
    expect(await db.select().from(member).where(eq(member.id, `${shopA}_extra`))).toHaveLength(0);
    // Removed staff lose the shop's passes at once.
    const p = passes.active;
    const res = await readLogbook(request(`/api/passes/${p}/vehicles/${car.vehicle.id}`, { as: extra }), ctx({ passId: p, vehicleId: car.vehicle.id }));
    expect(res.status).toBe(404);
    void shopB;
  });
});
