// Opening a shop, the directory, invitations that work once and expire,
// the e-mail to the driver when the shop adds to the logbook, and the demo seed part.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { accessLog, invitation, member, organization, serviceEntry, shopPass, shopProfile } from "@/db/schema";
import { GET as directory, POST as createShop } from "@/app/api/shops/route";
import { POST as invite } from "@/app/api/shops/[shopId]/invitations/route";
import { POST as join } from "@/app/api/shops/join/[invitationId]/route";
import { POST as addService } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/route";
import { POST as issue } from "@/app/api/passes/route";
import { POST as addCheck } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/route";
import { POST as revoke } from "@/app/api/passes/[passId]/revoke/route";
import { getInvitation } from "@/db/queries/shops";
import { listShopPasses } from "@/db/queries/passes";
import { seedPasses } from "@/db/seed/passes";
import { ctx, makeShop, request, signUp } from "../../support/users";
import { counts, HOUR, mailsTo, makeVehicle, sessionOf } from "./helpers";

describe("opening a shop", () => {
  it("makes the creator its owner, with a profile, findable by name and by town", async () => {
    const u = await signUp({ name: "Corin Maybury" });
    const res = await createShop(request("/api/shops", { as: u, body: { name: "Hatherleigh Tyre Loft", town: "Wyvern Cross", phone: "+00 555 0199" } }), ctx({}));
    expect(res.status).toBe(201);
    const { shop } = await res.json();
    const [m] = await db.select().from(member).where(eq(member.organizationId, shop.id));
    expect(m).toMatchObject({ userId: u.id, role: "owner" });
    const [p] = await db.select().from(shopProfile).where(eq(shopProfile.shopId, shop.id));
    expect(p).toMatchObject({ town: "Wyvern Cross", phone: "+00 555 0199" });

    const driver = await signUp();
    const find = async (q: string) => (await (await directory(request(`/api/shops?q=${encodeURIComponent(q)}`, { as: driver }), ctx({}))).json()).shops.map((s: { id: string }) => s.id);
    expect(await find("tyre loft")).toContain(shop.id);
    expect(await find("wyvern")).toContain(shop.id);
    expect(await find("nowhere-at-all")).not.toContain(shop.id);
    // A LIKE wildcard typed by someone matches only itself.
    expect(await find("%")).toEqual([]);
    expect((await directory(request("/api/shops?q=tyre"), ctx({}))).status).toBe(401);
  });

  it("refuses a shop without a town, naming the field, and writes nothing", async () => {
    const u = await signUp();
    const before = (await db.select().from(organization)).length;
    const res = await createShop(request("/api/shops", { as: u, body: { name: "Nameonly Wheels", town: "" } }), ctx({}));
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields.town[0]).toMatch(/town/);
    expect((await db.select().from(organization)).length).toBe(before);
  });
});

describe("invitations", () => {
  async function invited(email: string) {
    const owner = await signUp({ name: "Ottoline Sparrow" });
    const shop = await makeShop({ name: "Kestrel Lane Tyres", owner });
    const res = await invite(request(`/api/shops/${shop.id}/invitations`, { as: owner, body: { email } }), ctx({ shopId: shop.id }));
    expect(res.status).toBe(201);
    const { invitation: inv } = await res.json();
    return { owner, shop, id: inv.id as string };
  }

  it("sends a link to /join/<id> that works once, for the invited address only", async () => {
    const email = `tech-${Date.now()}@example.test`;
    const { shop, id } = await invited(email);
    const [mail] = await mailsTo(email);
    expect(mail.subject).toBe("Ottoline Sparrow invited you to Kestrel Lane Tyres on Fourpatch");
    expect(mail.text).toContain(`/join/${id}`);

    const wrong = await signUp();
    const r1 = await join(request(`/api/shops/join/${id}`, { as: wrong, body: {} }), ctx({ invitationId: id }));
    expect(r1.status).toBe(403);
    expect((await r1.json()).error.message).toContain(email);
    expect((await join(request(`/api/shops/join/${id}`, { body: {} }), ctx({ invitationId: id }))).status).toBe(401);

    const tech = await signUp({ email });
    const ok = await join(request(`/api/shops/join/${id}`, { as: tech, body: {} }), ctx({ invitationId: id }));
    expect(ok.status, await ok.clone().text()).toBe(200);
    const [m] = await db.select().from(member).where(eq(member.userId, tech.id));
    expect(m).toMatchObject({ organizationId: shop.id, role: "technician" });

    const again = await join(request(`/api/shops/join/${id}`, { as: tech, body: {} }), ctx({ invitationId: id }));
    expect(again.status).toBe(409);
    expect((await again.json()).error.message).toMatch(/already used/);
    expect((await getInvitation({ invitationId: id, now: new Date() }))?.state).toBe("used");
  });

  it("says an expired link has expired, and joins no one", async () => {
    const email = `late-${Date.now()}@example.test`;
    const { id } = await invited(email);
    expect((await getInvitation({ invitationId: id, now: new Date(Date.now() + 4 * 24 * HOUR) }))?.state).toBe("expired");
    await db.update(invitation).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitation.id, id));
    const tech = await signUp({ email });
    const res = await join(request(`/api/shops/join/${id}`, { as: tech, body: {} }), ctx({ invitationId: id }));
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/expired/);
    expect(await db.select().from(member).where(eq(member.userId, tech.id))).toHaveLength(0);
    expect(await getInvitation({ invitationId: "not-a-real-invitation", now: new Date() })).toBeNull();
  });
});

describe("e-mails to the driver", () => {
  it("a pass issued through the route, then work added by the shop, tells the driver what was added", async () => {
    const driver = await signUp({ name: "Juno Ashgrove" });
    const owner = await signUp();
    const tech = await signUp({ name: "Rafe Cullis" });
    const shop = await makeShop({ name: "Brackenfold Tyres", owner, technicians: [tech] });
    const car = await makeVehicle(driver, "Juno's little Korvan");
    const bad = await issue(request("/api/passes", { as: driver, body: { shopId: shop.id, vehicleIds: [], scope: "view_add", duration: "custom" } }), ctx({}));
    expect(bad.status).toBe(422);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(["customDays", "vehicleIds"]);
    const res = await issue(request("/api/passes", { as: driver, body: { shopId: shop.id, vehicleIds: [car.vehicle.id], scope: "view_add", duration: "4h" } }), ctx({}));
    expect(res.status).toBe(201);
    const { pass } = await res.json();
    const add = await addService(
      request(`/api/passes/${pass.id}/vehicles/${car.vehicle.id}/service`, {
        as: tech,
        body: { kind: "rotation", checks: [{ setId: car.set.id, readings: car.tires.map((t) => ({ tireId: t.id, centre: "6" })) }] },
      }),
      ctx({ passId: pass.id, vehicleId: car.vehicle.id }),
    );
    expect(add.status).toBe(201);
    const [mail] = (await mailsTo(driver.email)).filter((m) => m.subject.startsWith("Brackenfold Tyres added"));
    expect(mail.subject).toBe("Brackenfold Tyres added to the logbook of Juno's little Korvan");
    expect(mail.text).toContain("Rafe Cullis at Brackenfold Tyres added to the logbook of Juno's little Korvan: rotation with a tread check of 4 tires.");
    expect(mail.text).toContain("qualified tire technician decide");
    expect(mail.tags).toEqual([{ name: "kind", value: "shop-entry" }]);

    // A second entry in the same visit sends no second e-mail; the pass-ended notice counts both.
    const check = await addCheck(
      request(`/api/passes/${pass.id}/vehicles/${car.vehicle.id}/checks`, { as: tech, body: { setId: car.set.id, readings: [{ tireId: car.tires[0].id, centre: "5.9" }] } }),
      ctx({ passId: pass.id, vehicleId: car.vehicle.id }),
    );
    expect(check.status).toBe(201);
    expect((await mailsTo(driver.email)).filter((m) => m.subject.startsWith("Brackenfold Tyres added"))).toHaveLength(1);
    await revoke(request(`/api/passes/${pass.id}/revoke`, { as: driver, body: {} }), ctx({ passId: pass.id }));
    const [ended] = (await mailsTo(driver.email)).filter((m) => m.subject === "Brackenfold Tyres can no longer open your logbook");
    expect(ended.text).toContain("The shop added 2 entries under this pass; they stay in your logbook.");
  });
});

describe("the demo seed part", () => {
  it("adds nothing without vehicles, and an open and an ended pass with access-log rows when there are", async () => {
    const ada = await signUp({ name: "Demo Driver" });
    const wren = await signUp();
    const jo = await signUp();
    const shop = await makeShop({ owner: wren, technicians: [jo] });
    const today = new Date().toISOString().slice(0, 10);
    const ids = { ada: ada.id, tomas: ada.id, wren: wren.id, jo: jo.id, ops: wren.id, shopId: shop.id };
    const before = await counts();
    expect(await seedPasses({ ids, today })).toEqual({});
    expect(await counts()).toEqual(before);

    await makeVehicle(ada, "first");
    await makeVehicle(ada, "second");
    const made = await seedPasses({ ids, today });
    expect(made.active && made.expired).toBeTruthy();
    // Loading twice adds nothing more.
    expect(await seedPasses({ ids, today })).toEqual({});

    const list = await listShopPasses({ session: await sessionOf(jo), now: new Date(`${today}T12:00:00Z`) });
    expect(list.map((p) => [p.id, p.state])).toEqual([
      [made.active, "active"],
      [made.expired, "expired"],
    ]);
    expect(await db.select().from(accessLog).where(eq(accessLog.passId, made.active!))).toHaveLength(2);
    expect(await db.select().from(accessLog).where(eq(accessLog.passId, made.expired!))).toHaveLength(3);
    expect(await db.select().from(serviceEntry).where(eq(serviceEntry.passId, made.expired!))).toHaveLength(1);
    const [expired] = await db.select().from(shopPass).where(eq(shopPass.id, made.expired!));
    expect(expired.endNoticeSentAt).not.toBeNull();
  });
});
