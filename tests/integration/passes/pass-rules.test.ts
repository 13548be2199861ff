// The pass rules with an injected clock: issue, use, expire, extend, revoke,
// and the e-mails each step sends.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { driverProfile, shopPass } from "@/db/schema";
import { assertVehicleAccess } from "@/db/queries/access";
import {
  extendPass,
  issuePass,
  listAccessLog,
  listDriverPasses,
  listShopPasses,
  resolvePassAccess,
  revokePass,
  sendDuePassEndedNotices,
} from "@/db/queries/passes";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { formatTimeLeft, passState } from "@/lib/validation/passes";
import { makeShop, signUp } from "../../support/users";
import { HOUR, mailsTo, makeVehicle, sessionOf } from "./helpers";

const T0 = new Date("2026-03-02T09:00:00Z");
const at = (hours: number) => new Date(T0.getTime() + hours * HOUR);

async function world() {
  const driver = await signUp({ name: "Maren Quist" });
  const owner = await signUp({ name: "Bram Tolley" });
  const tech = await signUp({ name: "Ivo Penrake" });
  const shop = await makeShop({ name: "Marrowgate Tyre Bay", owner, technicians: [tech] });
  const car = await makeVehicle(driver, "The blue Korvan");
  const other = await makeVehicle(driver, "The old Velora");
  return { driver, owner, tech, shop, car, other };
}

describe("issuing a pass", () => {
  it("covers only the chosen vehicles, ends after the chosen length, and tells the shop's staff", async () => {
    const w = await world();
    const { id, endsAt } = await issuePass({
      session: await sessionOf(w.driver),
      input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view_add", duration: "8h", note: "Noise from the rear" },
      now: T0,
    });
    expect(endsAt.toISOString()).toBe(at(8).toISOString());
    const access = await resolvePassAccess({ session: await sessionOf(w.tech), passId: id, now: at(1) });
    expect(access).toMatchObject({ kind: "pass", shopId: w.shop.id, scope: "view_add", vehicleIds: [w.car.vehicle.id], userName: "Ivo Penrake" });
    // The other vehicle of the same driver is not part of the pass.
    await expect(assertVehicleAccess(access, { vehicleId: w.other.vehicle.id, action: "read", now: at(1) })).rejects.toMatchObject({ code: "not_found" });

    for (const u of [w.owner, w.tech]) {
      const [mail] = await mailsTo(u.email).then((m) => m.filter((x) => x.subject.includes("shared a logbook")));
      expect(mail?.subject).toBe("Maren Quist shared a logbook with Marrowgate Tyre Bay");
      expect(mail?.text).toContain("The blue Korvan");
      expect(mail?.text).toContain("Noise from the rear");
      expect(mail?.text).toContain(`/shop/passes/${id}`);
      expect(mail?.tags).toEqual([{ name: "kind", value: "pass-received" }]);
    }
  });

  it("the shop's e-mail gives the pass's end in the driver's stored time zone, with the zone's name", async () => {
    const w = await world();
    await db
      .insert(driverProfile)
      .values({ userId: w.driver.id, timezone: "Europe/Berlin" })
      .onConflictDoUpdate({ target: driverProfile.userId, set: { timezone: "Europe/Berlin" } });
    await issuePass({ session: await sessionOf(w.driver), input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "8h" }, now: T0 });
    const [mail] = await mailsTo(w.owner.email).then((m) => m.filter((x) => x.subject.includes("shared a logbook")));
    // T0 + 8 h = 17:00 UTC on Monday 2 March 2026, 18:00 in Berlin (CET, UTC+1, before the EU change on 29 March; Directive 2000/84/EC).
    expect(mail?.text).toContain("Monday 2 March at 18:00 CET");
    expect(mail?.text).not.toContain("UTC");
  });

  it("refuses another driver's vehicle as not found and writes no pass", async () => {
    const w = await world();
    const stranger = await signUp();
    const before = await db.select().from(shopPass);
    await expect(
      issuePass({ session: await sessionOf(stranger), input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "4h" }, now: T0 }),
    ).rejects.toMatchObject({ code: "not_found" });
    await expect(
      issuePass({ session: await sessionOf(w.driver), input: { shopId: "shop_that_is_not", vehicleIds: [w.car.vehicle.id], scope: "view", duration: "4h" }, now: T0 }),
    ).rejects.toMatchObject({ code: "not_found" });
    expect(await db.select().from(shopPass)).toHaveLength(before.length);
  });
});

describe("the clock decides", () => {
  it("works up to the last millisecond, then says it ended, in words", async () => {
    const w = await world();
    const { id } = await issuePass({
      session: await sessionOf(w.driver),
      input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "4h" },
      now: T0,
    });
    const tech = await sessionOf(w.tech);
    const justBefore = new Date(at(4).getTime() - 1);
    const access = await resolvePassAccess({ session: tech, passId: id, now: justBefore });
    await assertVehicleAccess(access, { vehicleId: w.car.vehicle.id, action: "read logbook", now: justBefore });
    await expect(resolvePassAccess({ session: tech, passId: id, now: at(4) })).rejects.toMatchObject({
      code: "pass_ended",
      message: expect.stringMatching(/ended on .* Ask the driver for a new pass/),
    });
    // Said in the technician's own zone and locale, not UTC: 13:00 UTC on 2 March 2026 is 14:00 CET in Berlin
    // (UTC+1 before the EU change on 29 March; Directive 2000/84/EC).
    const inBerlin = resolvePassAccess({ session: tech, passId: id, now: at(5), prefs: { locale: "en-GB", timeZone: "Europe/Berlin" } });
    await expect(inBerlin).rejects.toMatchObject({ code: "pass_ended", message: expect.stringContaining("2 Mar 2026, 14:00 CET") });
    await expect(inBerlin).rejects.toMatchObject({ message: expect.not.stringContaining("UTC") });
    // An access resolved before the end is still refused once the end passes (a page left open).
    await expect(assertVehicleAccess(access, { vehicleId: w.car.vehicle.id, action: "read logbook", now: at(4) })).rejects.toMatchObject({ code: "pass_ended" });
  });

  it("lists the shop's passes active first, soonest to end first, and drops ended ones after 48 hours", async () => {
    const w = await world();
    const d = await sessionOf(w.driver);
    const long = await issuePass({ session: d, input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "7d" }, now: T0 });
    const short = await issuePass({ session: d, input: { shopId: w.shop.id, vehicleIds: [w.other.vehicle.id], scope: "view_add", duration: "4h" }, now: T0 });
    const ended = await issuePass({ session: d, input: { shopId: w.shop.id, vehicleIds: [w.other.vehicle.id], scope: "view", duration: "4h" }, now: at(-10) });
    const tech = await sessionOf(w.tech);

    const list = await listShopPasses({ session: tech, now: at(1) });
    expect(list.map((p) => p.id)).toEqual([short.id, long.id, ended.id]);
    expect(list.map((p) => p.state)).toEqual(["active", "active", "expired"]);
    expect(list[0]).toMatchObject({ driverName: "Maren Quist", scope: "view_add", msLeft: 3 * HOUR });
    expect(list[0].vehicles.map((v) => v.nickname)).toEqual(["The old Velora"]);

    // The ended pass stopped at T0-6h: still shown, greyed, 47 h after that; gone after 48 h.
    expect((await listShopPasses({ session: tech, now: at(-6 + 47) })).map((p) => p.id)).toEqual([long.id, short.id, ended.id]);
    expect((await listShopPasses({ session: tech, now: at(-6 + 48) })).map((p) => p.id)).toEqual([long.id, short.id]);
    // The short one ended at T0+4h; at T0+52h only the 7-day pass is left.
    expect((await listShopPasses({ session: tech, now: at(52) })).map((p) => p.id)).toEqual([long.id]);
    // A stranger to the shop sees none of it.
    expect(await listShopPasses({ session: await sessionOf(await signUp()), now: at(1) })).toEqual([]);
  });

  it("computes states for the driver: active, expired, revoked", async () => {
    expect(passState({ startsAt: T0, endsAt: at(4), revokedAt: null }, at(1))).toBe("active");
    expect(passState({ startsAt: T0, endsAt: at(4), revokedAt: null }, at(4))).toBe("expired");
    expect(passState({ startsAt: T0, endsAt: at(4), revokedAt: at(2) }, at(3))).toBe("revoked");
    expect(passState({ startsAt: at(1), endsAt: at(4), revokedAt: null }, T0)).toBe("scheduled");
    expect(formatTimeLeft(26 * HOUR + 5 * 60_000)).toBe("1 day 2 hours");
    expect(formatTimeLeft(3 * HOUR + 10 * 60_000)).toBe("3 hours 10 min");
    expect(formatTimeLeft(59_000)).toBe("less than a minute");
    expect(formatTimeLeft(0)).toBe("ended");
  });
});

describe("extending and revoking", () => {
  it("extends an active pass, refuses to reach past 30 days ahead, and refuses an ended one", async () => {
    const w = await world();
    const d = await sessionOf(w.driver);
    const { id } = await issuePass({ session: d, input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "24h" }, now: T0 });
    const ext = await extendPass({ session: d, passId: id, input: { duration: "3d" }, now: at(2) });
    expect(ext.endsAt.toISOString()).toBe(at(24 + 72).toISOString());
    await expect(extendPass({ session: d, passId: id, input: { duration: "custom", customDays: 30 }, now: at(2) })).rejects.toMatchObject({ code: "invalid" });
    await expect(extendPass({ session: await sessionOf(w.tech), passId: id, input: { duration: "4h" }, now: at(2) })).rejects.toMatchObject({ code: "not_found" });
    await expect(extendPass({ session: d, passId: id, input: { duration: "4h" }, now: at(200) })).rejects.toMatchObject({ code: "conflict" });
  });

  it("a revoke ends the pass at once, tells the driver once, and the daily job does not repeat it", async () => {
    const w = await world();
    const d = await sessionOf(w.driver);
    const { id } = await issuePass({ session: d, input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view_add", duration: "7d" }, now: T0 });
    const r = await revokePass({ session: d, passId: id, now: at(1) });
    expect(r.state).toBe("revoked");
    await expect(resolvePassAccess({ session: await sessionOf(w.tech), passId: id, now: at(1) })).rejects.toMatchObject({
      code: "pass_ended",
      message: expect.stringContaining("withdrew"),
    });
    const notices = async () => (await mailsTo(w.driver.email)).filter((m) => m.subject.includes("can no longer open"));
    expect(await notices()).toHaveLength(1);
    expect((await notices())[0].text).toContain("You withdrew the pass");
    await revokePass({ session: d, passId: id, now: at(2) });
    await sendDuePassEndedNotices({ now: at(300) });
    expect(await notices()).toHaveLength(1);
    expect((await listDriverPasses({ session: d, now: at(2) })).find((p) => p.id === id)?.state).toBe("revoked");
  });

  it("the daily job tells the driver about a pass that ran out, once", async () => {
    const w = await world();
    const d = await sessionOf(w.driver);
    const { id } = await issuePass({ session: d, input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "4h" }, now: T0 });
    expect(await sendDuePassEndedNotices({ now: at(3) })).toMatchObject({ sent: 0 });
    const first = await sendDuePassEndedNotices({ now: at(30) });
    expect(first.sent).toBeGreaterThanOrEqual(1);
    await sendDuePassEndedNotices({ now: at(54) });
    const notices = (await mailsTo(w.driver.email)).filter((m) => m.subject === "Marrowgate Tyre Bay can no longer open your logbook");
    expect(notices).toHaveLength(1);
    expect(notices[0].text).toContain("has ended by itself");
    const [row] = await db.select().from(shopPass).where(eq(shopPass.id, id));
    expect(row.endNoticeSentAt?.toISOString()).toBe(at(30).toISOString());
  });
});

describe("the access log", () => {
  it("records each use under a pass with shop and person, and only the owner reads it", async () => {
    const w = await world();
    const { id } = await issuePass({
      session: await sessionOf(w.driver),
      input: { shopId: w.shop.id, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "4h" },
      now: T0,
    });
    const access = await resolvePassAccess({ session: await sessionOf(w.tech), passId: id, now: at(1) });
    await assertVehicleAccess(access, { vehicleId: w.car.vehicle.id, action: "read logbook", now: at(1) });
    const driverSession = (await sessionOf(w.driver))!;
    const log = await listAccessLog({ access: ownerAccess(driverSession), vehicleId: w.car.vehicle.id });
    expect(log).toHaveLength(1);
    expect(log[0]).toMatchObject({ actorName: "Ivo Penrake", shopName: "Marrowgate Tyre Bay", action: "read logbook", vehicleNickname: "The blue Korvan" });
    await expect(listAccessLog({ access, vehicleId: w.car.vehicle.id })).rejects.toMatchObject({ code: "forbidden" });
    const stranger = (await sessionOf(await signUp()))!;
    await expect(listAccessLog({ access: ownerAccess(stranger), vehicleId: w.car.vehicle.id })).rejects.toMatchObject({ code: "not_found" });
    expect(await listAccessLog({ access: ownerAccess(stranger) })).toEqual([]);
  });
});
