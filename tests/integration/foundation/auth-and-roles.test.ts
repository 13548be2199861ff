import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { driverProfile, fakeOutbox, user } from "@/db/schema";
import { GET as start } from "@/app/start/route";
import { planOf } from "@/db/queries/billing";
import { homeFor, isAdmin, membershipsOf, requireAdmin, requireSession, requireShopMember } from "@/lib/auth/roles";
import { sessionFromRequest } from "@/lib/auth/session";
import { auth } from "@/lib/auth/server";
import { makeShop, request, signUp } from "../../support/users";

describe("sign-up side effects", () => {
  it("creates a driver profile and sends a welcome e-mail through the resend SDK into the fake outbox", async () => {
    const u = await signUp({ name: "Pip Ostrander" });
    const [profile] = await db.select().from(driverProfile).where(eq(driverProfile.userId, u.id));
    expect(profile).toMatchObject({ units: "metric" });
    expect(await planOf({ userId: u.id })).toBe("free");
    const mails = await db.select().from(fakeOutbox);
    // Sent once the address is confirmed (the helper follows the verification link).
    const welcome = mails.find((m) => m.toAddresses.includes(u.email) && m.tags?.some((t) => t.value === "welcome"));
    expect(welcome?.subject).toBe("Your Fourpatch logbook is ready");
    expect(welcome?.text).toContain("Pip Ostrander");
    expect(welcome?.tags).toEqual([{ name: "kind", value: "welcome" }]);
  });

  it("makes no second account with the same e-mail, and answers as for a new one (no enumeration)", async () => {
    const u = await signUp();
    const again = await auth.api.signUpEmail({ body: { name: "Again", email: u.email, password: "another-long-pass" } });
    expect(again.token).toBeNull();
    expect(again.user.id).not.toBe(u.id);
    expect(await db.$count(user, eq(user.email, u.email))).toBe(1);
  });

  it("refuses a password shorter than 10 characters", async () => {
    await expect(auth.api.signUpEmail({ body: { name: "Short", email: "short@example.test", password: "123456789" } })).rejects.toThrow();
  });
});

describe("sessions and homes", () => {
  it("reads the session from the cookie and sends each role to its own home", async () => {
    const driver = await signUp();
    const owner = await signUp();
    const tech = await signUp();
    const admin = await signUp({ admin: true });
    await makeShop({ owner, technicians: [tech] });

    const home = async (as?: Awaited<ReturnType<typeof signUp>>) => {
      const res = await start(request("/start", { as }));
      return new URL(res.headers.get("location")!).pathname;
    };
    expect(await home(driver)).toBe("/vehicles");
    expect(await home(owner)).toBe("/shop");
    expect(await home(tech)).toBe("/shop");
    expect(await home(admin)).toBe("/admin");
    expect(await home(undefined)).toBe("/sign-in");

    const s = await sessionFromRequest(request("/", { as: tech }));
    expect(s?.user.id).toBe(tech.id);
    expect(await homeFor(s!)).toBe("/shop");
  });

  it("a forged cookie is no session", async () => {
    const s = await sessionFromRequest(request("/", { headers: { cookie: "better-auth.session_token=forged.value" } }));
    expect(s).toBeNull();
  });
});

describe("role checks on the server", () => {
  it("admin checks refuse drivers and accept operators", async () => {
    const driver = await sessionFromRequest(request("/", { as: await signUp() }));
    const admin = await sessionFromRequest(request("/", { as: await signUp({ admin: true }) }));
    expect(isAdmin(driver)).toBe(false);
    expect(isAdmin(admin)).toBe(true);
    expect(() => requireAdmin(driver)).toThrow(/operators/);
    expect(() => requireAdmin(null)).toThrow(/sign in/i);
    expect(requireAdmin(admin).user.id).toBe(admin!.user.id);
  });

  it("shop checks: members pass, owners-only actions refuse technicians, strangers see no shop", async () => {
    const owner = await signUp();
    const tech = await signUp();
    const stranger = await signUp();
    const shop = await makeShop({ owner, technicians: [tech] });
    const s = async (u: Awaited<ReturnType<typeof signUp>>) => sessionFromRequest(request("/", { as: u }));

    expect((await requireShopMember(await s(owner), { shopId: shop.id, role: "owner" })).membership.role).toBe("owner");
    expect((await requireShopMember(await s(tech), { shopId: shop.id })).membership.role).toBe("technician");
    await expect(requireShopMember(await s(tech), { shopId: shop.id, role: "owner" })).rejects.toMatchObject({ code: "forbidden" });
    await expect(requireShopMember(await s(stranger), { shopId: shop.id })).rejects.toMatchObject({ code: "not_found" });
    expect(await membershipsOf({ userId: stranger.id })).toEqual([]);
  });

  it("a disabled (banned) account is refused", async () => {
    const u = await signUp();
    const { user: userTable } = await import("@/db/schema");
    const live = await sessionFromRequest(request("/", { as: u }));
    expect(live?.user.id).toBe(u.id);
    await db.update(userTable).set({ banned: true }).where(eq(userTable.id, u.id));
    const s = await sessionFromRequest(request("/", { as: u }));
    expect(() => requireSession(s)).toThrow(/disabled|sign in/i);
    await expect(auth.api.signInEmail({ body: { email: u.email, password: "correct-horse-battery" } })).rejects.toThrow();
  });
});
