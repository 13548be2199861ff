// Handing a vehicle on, through the real route handlers: who may make and
// take a link, a link used twice, expired, or raced by two accounts (exactly
// one wins, nothing duplicated), and what the seller keeps afterwards.
import { randomBytes } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { db } from "@/db";
import { attachment, serviceEntry, shopPass, tire, tireSet, treadCheck, vehicle, vehicleHandOn, vehicleKeeper, vehicleSnapshot } from "@/db/schema";
import { POST as makeLink, GET as openLink } from "@/app/api/vehicles/[vehicleId]/hand-on/route";
import { POST as acceptRoute } from "@/app/api/hand-ons/accept/route";
import { DELETE as cancelRoute } from "@/app/api/hand-ons/[handOnId]/route";
import { GET as readVehicle } from "@/app/api/vehicles/[vehicleId]/route";
import { GET as passRead } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/route";
import { handOnView } from "@/db/queries/hand-on";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { HOUR, insertPass, mailsTo, makeVehicle } from "../passes/helpers";

let seller: TestUser, buyer: TestUser, rival: TestUser, keeper: TestUser, tech: TestUser, admin: TestUser;
let car: Awaited<ReturnType<typeof makeVehicle>>;
let passId: string;

const tokenOf = (url: string) => /\/take-on\/([A-Za-z0-9_-]{43})$/.exec(url)![1];
const link = async (as: TestUser | undefined, body: Record<string, unknown> = {}) =>
  makeLink(request(`/api/vehicles/${car.vehicle.id}/hand-on`, { as, body }), ctx({ vehicleId: car.vehicle.id }));
const accept = (as: TestUser | undefined, token: string) => acceptRoute(request("/api/hand-ons/accept", { as, body: { token } }), ctx({}));
const read = (as: TestUser) => readVehicle(request(`/api/vehicles/${car.vehicle.id}`, { as }), ctx({ vehicleId: car.vehicle.id }));
const rows = async () => ({
  vehicles: (await db.select({ n: sql<number>`count(*)::int` }).from(vehicle))[0].n,
  sets: (await db.select({ n: sql<number>`count(*)::int` }).from(tireSet))[0].n,
  tires: (await db.select({ n: sql<number>`count(*)::int` }).from(tire))[0].n,
  checks: (await db.select({ n: sql<number>`count(*)::int` }).from(treadCheck))[0].n,
});

beforeEach(async () => {
  seller = await signUp({ name: "Orla Fenwright" });
  buyer = await signUp({ name: "Teodor Brack" });
  rival = await signUp({ name: "Wilma Sprocket" });
  keeper = await signUp({ name: "Nils Fenwright" });
  tech = await signUp({ name: "Gus Tallow" });
  admin = await signUp({ name: "Op Erator", admin: true });
  const shopId = (await makeShop({ owner: await signUp(), technicians: [tech] })).id;
  car = await makeVehicle(seller, "Orla's van");
  await db.update(tireSet).set({ priceCents: 48_000 }).where(eq(tireSet.id, car.set.id));
  await db.insert(treadCheck).values({ vehicleId: car.vehicle.id, setId: car.set.id, checkedOn: "2026-01-10", authorUserId: seller.id });
  await db.insert(serviceEntry).values({ vehicleId: car.vehicle.id, setId: car.set.id, kind: "rotation", performedOn: "2026-02-01", costCents: 3500, authorUserId: seller.id });
  await db.insert(attachment).values({ ownerId: seller.id, vehicleId: car.vehicle.id, setId: car.set.id, kind: "receipt", fileName: "receipt.pdf", storedName: `${randomBytes(18).toString("base64url")}.pdf`, mimeType: "application/pdf", sizeBytes: 10 });
  await db.insert(vehicleKeeper).values({ vehicleId: car.vehicle.id, email: keeper.email, userId: keeper.id, tokenHash: `k${Math.random()}`, state: "active", expiresAt: new Date(), acceptedAt: new Date() });
  passId = (await insertPass({ driver: seller, shopId, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + 8 * HOUR) })).id;
});

describe("handing a vehicle on", () => {
  it("only the owner makes a link: co-keeper 403, other driver / technician / operator 404, signed out 401", async () => {
    expect((await link(keeper)).status).toBe(403);
    for (const as of [buyer, tech, admin]) expect((await link(as)).status).toBe(404);
    expect((await link(undefined)).status).toBe(401);
    expect(await db.select().from(vehicleHandOn)).toHaveLength(0);
    const res = await link(seller);
    expect(res.status).toBe(201);
    const open = await (await openLink(request(`/api/vehicles/${car.vehicle.id}/hand-on`, { as: seller }), ctx({ vehicleId: car.vehicle.id }))).json();
    expect(open.open).toMatchObject({ toEmail: null });
    expect((await openLink(request(`/api/vehicles/${car.vehicle.id}/hand-on`, { as: keeper }), ctx({ vehicleId: car.vehicle.id }))).status).toBe(403);
  });

  it("the summary shows DOT codes and the history but no prices or files unless ticked", async () => {
    const { url } = await (await link(seller)).json();
    const view = await handOnView({ token: tokenOf(url) });
    expect(view.state).toBe("open");
    if (view.state !== "open") return;
    expect(view.summary.history.sets[0].tires.map((t) => t.dotCode)).toContain("DOT XJ7K ABCD 3422");
    expect(view.summary.history.service).toHaveLength(1);
    expect(view.summary.receipts).toBeNull();
    expect(JSON.stringify(view.summary)).not.toMatch(/480\.00|35\.00|receipt\.pdf/);
    const ticked = await (await link(seller, { includeReceipts: true })).json();
    const v2 = await handOnView({ token: tokenOf(ticked.url) });
    expect(v2.state === "open" && v2.summary.receipts?.prices[0].price).toBe("480.00 EUR");
    // The new link replaced the old one.
    expect((await handOnView({ token: tokenOf(url) })).state).toBe("cancelled");
  });

  it("the recipient takes the vehicle with its history; passes and co-keepers end; the seller keeps a read-only copy; both get an e-mail", async () => {
    const before = await rows();
    const { url } = await (await link(seller, { email: buyer.email })).json();
    expect((await mailsTo(buyer.email)).at(-1)?.html).toContain("/take-on/");
    // Sent to an address: another account cannot use it.
    expect((await accept(rival, tokenOf(url))).status).toBe(403);
    const res = await accept(buyer, tokenOf(url));
    expect(res.status).toBe(200);
    expect(await rows()).toEqual(before);
    const [v] = await db.select().from(vehicle).where(eq(vehicle.id, car.vehicle.id));
    expect(v.ownerId).toBe(buyer.id);
    const book = await (await read(buyer)).json();
    expect(book.checks).toHaveLength(1);
    expect(book.sets[0].tires.map((t: { dotCode: string }) => t.dotCode)).toContain("DOT XJ7K ABCD 3422");
    // Without receipts ticked: no prices, no costs, no files.
    expect(book.sets[0].priceCents).toBeNull();
    expect(book.service[0].costCents).toBeNull();
    expect(book.attachments).toEqual([]);
    // The seller, the former co-keeper and the shop are refused now.
    expect((await read(seller)).status).toBe(404);
    expect((await read(keeper)).status).toBe(404);
    expect((await passRead(request(`/api/passes/${passId}/vehicles/${car.vehicle.id}`, { as: tech }), ctx({ passId, vehicleId: car.vehicle.id }))).status).not.toBe(200);
    const [pass] = await db.select().from(shopPass).where(eq(shopPass.id, passId));
    expect(pass.revokedAt).not.toBeNull();
    expect((await db.select().from(vehicleKeeper).where(eq(vehicleKeeper.vehicleId, car.vehicle.id)))[0].state).toBe("ended");
    const snaps = await db.select().from(vehicleSnapshot).where(eq(vehicleSnapshot.ownerId, seller.id));
    expect(snaps).toHaveLength(1);
    expect(JSON.stringify(snaps[0].data)).toContain("DOT XJ7K ABCD 3422");
    expect((await mailsTo(seller.email)).some((m) => m.subject.includes("has a new owner"))).toBe(true);
    expect((await mailsTo(buyer.email)).some((m) => m.subject.includes("is yours"))).toBe(true);
  });

  it("a link used twice says so; an expired or withdrawn link says so; nothing moves", async () => {
    const { url, id } = await (await link(seller)).json();
    expect((await accept(buyer, tokenOf(url))).status).toBe(200);
    const twice = await accept(rival, tokenOf(url));
    expect(twice.status).toBe(409);
    expect((await twice.json()).error.message).toMatch(/already used/);
    expect((await handOnView({ token: tokenOf(url) })).state).toBe("used");
    expect(id).toBeTruthy();

    const other = await makeVehicle(buyer, "Teodor's car");
    const made = await (await makeLink(request(`/api/vehicles/${other.vehicle.id}/hand-on`, { as: buyer, body: {} }), ctx({ vehicleId: other.vehicle.id }))).json();
    await db.update(vehicleHandOn).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(vehicleHandOn.id, made.id));
    const late = await accept(rival, tokenOf(made.url));
    expect(late.status).toBe(409);
    expect((await late.json()).error.message).toMatch(/expired/);
    const fresh = await (await makeLink(request(`/api/vehicles/${other.vehicle.id}/hand-on`, { as: buyer, body: {} }), ctx({ vehicleId: other.vehicle.id }))).json();
    expect((await cancelRoute(request(`/api/hand-ons/${fresh.id}`, { as: rival, method: "DELETE" }), ctx({ handOnId: fresh.id }))).status).toBe(404);
    expect((await cancelRoute(request(`/api/hand-ons/${fresh.id}`, { as: buyer, method: "DELETE" }), ctx({ handOnId: fresh.id }))).status).toBe(200);
    expect((await accept(rival, tokenOf(fresh.url))).status).toBe(409);
    expect((await db.select().from(vehicle).where(eq(vehicle.id, other.vehicle.id)))[0].ownerId).toBe(buyer.id);
  });

  it("two accounts accepting at once: exactly one wins, nothing is duplicated", async () => {
    const before = await rows();
    const { url } = await (await link(seller)).json();
    const results = await Promise.all([accept(buyer, tokenOf(url)), accept(rival, tokenOf(url))]);
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 409]);
    const [v] = await db.select().from(vehicle).where(eq(vehicle.id, car.vehicle.id));
    const winner = results[0].status === 200 ? buyer : rival;
    expect(v.ownerId).toBe(winner.id);
    expect(await rows()).toEqual(before);
    expect(await db.select().from(vehicleSnapshot).where(eq(vehicleSnapshot.ownerId, seller.id))).toHaveLength(1);
  });
});
