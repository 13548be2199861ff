import { eq } from "drizzle-orm";
import { unzipSync } from "fflate";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { session as sessionTable, tire, tireSet, user, vehicle } from "@/db/schema";
import { DELETE } from "@/app/api/account/route";
import { GET as exportGet } from "@/app/api/account/export/route";
import { makeShop, request, signUp, type TestUser } from "../../support/users";

async function giveVehicle(owner: TestUser, nickname: string) {
  const [v] = await db.insert(vehicle).values({ ownerId: owner.id, nickname, make: "Velora", model: "Sprite" }).returning();
  const [s] = await db.insert(tireSet).values({ vehicleId: v.id, kind: "summer", size: "205/55R16 91V" }).returning();
  await db.insert(tire).values({ setId: s.id, position: "front_left", dotCode: "DOT XYZ 2523" });
  return v;
}

describe("export of all of a driver's data", () => {
  it("downloads the account's own logbook as a zip, and nothing of anyone else's", async () => {
    const me = await signUp({ name: "Ines Calloway" });
    const other = await signUp();
    await giveVehicle(me, "Blue runabout");
    await giveVehicle(other, "Not mine");

    const res = await exportGet(request("/api/account/export", { as: me }), { params: Promise.resolve({}) });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="fourpatch-logbook-\d{4}-\d{2}-\d{2}\.zip"/);
    const entries = unzipSync(new Uint8Array(await res.arrayBuffer()));
    const data = JSON.parse(new TextDecoder().decode(entries["fourpatch-export.json"]));
    expect(data.format).toBe("fourpatch-logbook-export");
    expect(data.account.email).toBe(me.email);
    expect(data.vehicles.map((v: { nickname: string }) => v.nickname)).toEqual(["Blue runabout"]);
    expect(data.tires).toHaveLength(1);
    expect(data.tires[0].dotCode).toBe("DOT XYZ 2523");
    expect(JSON.stringify(data)).not.toContain("Not mine");
    expect(JSON.stringify(data)).not.toMatch(/password|token_hash|tokenHash/);
  });

  it("refuses a signed-out request", async () => {
    const res = await exportGet(request("/api/account/export"), { params: Promise.resolve({}) });
    expect(res.status).toBe(401);
  });
});

describe("deleting an account", () => {
  it("needs the word DELETE and the right password; a wrong one deletes nothing", async () => {
    const me = await signUp();
    await giveVehicle(me, "Keep me");
    const noWord = await DELETE(request("/api/account", { method: "DELETE", as: me, body: { confirm: "yes", password: "correct-horse-battery" } }), { params: Promise.resolve({}) });
    expect(noWord.status).toBe(422);
    expect((await noWord.json()).error.fields.confirm).toBeDefined();
    const wrong = await DELETE(request("/api/account", { method: "DELETE", as: me, body: { confirm: "DELETE", password: "wrong-password" } }), { params: Promise.resolve({}) });
    expect(wrong.status).toBe(422);
    expect((await wrong.json()).error.fields.password).toEqual(["That password is not right."]);
    expect(await db.select().from(vehicle).where(eq(vehicle.ownerId, me.id))).toHaveLength(1);
  });

  it("removes the account, its sessions and its whole logbook in one go", async () => {
    const me = await signUp();
    const other = await signUp();
    const v = await giveVehicle(me, "Goes away");
    await giveVehicle(other, "Stays");
    const res = await DELETE(request("/api/account", { method: "DELETE", as: me, body: { confirm: "DELETE", password: "correct-horse-battery" } }), { params: Promise.resolve({}) });
    expect(res.status).toBe(200);
    expect(await db.select().from(user).where(eq(user.id, me.id))).toHaveLength(0);
    expect(await db.select().from(sessionTable).where(eq(sessionTable.userId, me.id))).toHaveLength(0);
    expect(await db.select().from(vehicle).where(eq(vehicle.id, v.id))).toHaveLength(0);
    expect(await db.select().from(tireSet).where(eq(tireSet.vehicleId, v.id))).toHaveLength(0);
    expect(await db.select().from(vehicle).where(eq(vehicle.ownerId, other.id))).toHaveLength(1);
    // The old cookie no longer opens anything.
    const after = await exportGet(request("/api/account/export", { as: me }), { params: Promise.resolve({}) });
    expect(after.status).toBe(401);
  });

  it("refuses while the account owns a shop, and says what to do", async () => {
    const owner = await signUp();
    await makeShop({ owner, name: "Fernhollow Tyre Bench" });
    const res = await DELETE(request("/api/account", { method: "DELETE", as: owner, body: { confirm: "DELETE", password: "correct-horse-battery" } }), { params: Promise.resolve({}) });
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toContain("Fernhollow Tyre Bench");
    expect(await db.select().from(user).where(eq(user.id, owner.id))).toHaveLength(1);
  });
});
