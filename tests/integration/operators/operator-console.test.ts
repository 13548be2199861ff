// The operators' console: only operators get in, lists page by cursor and
// stay small, disabling an account ends its sessions, sign-in, passes and
// feed, and every action lands in an audit log the database will not let
// anyone change.
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { operatorAudit, session as sessionTable, user } from "@/db/schema";
import { PAGE_SIZE, operatorCounts, readAudit, searchAccounts, searchShops, setAccountDisabled } from "@/db/queries/admin";
import { GET as passRead } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/route";
import { GET as feedRoute } from "@/app/api/feed/[token]/route";
import { regenerateFeed } from "@/db/queries/reminders";
import { auth } from "@/lib/auth/server";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { HOUR, insertPass, makeVehicle, sessionOf } from "../passes/helpers";

let op: TestUser, driver: TestUser, tech: TestUser;
let opSession: Awaited<ReturnType<typeof sessionOf>>;

beforeAll(async () => {
  op = await signUp({ name: "Olive Operator", admin: true });
  driver = await signUp({ name: "Dara Quench" });
  tech = await signUp({ name: "Tobin Lathe" });
  opSession = await sessionOf(op);
  // Enough accounts for three pages.
  for (let i = 0; i < PAGE_SIZE * 2 + 3; i++) await db.insert(user).values({ id: `bulk-${i}`, name: `Bulk Person ${i}`, email: `bulk${i}@example.test`, createdAt: new Date(Date.UTC(2026, 0, 1, 0, 0, i)) });
});

describe("operators' console", () => {
  it("refuses drivers, technicians and the signed-out", async () => {
    for (const u of [driver, tech]) {
      const s = await sessionOf(u);
      await expect(searchAccounts({ actor: s })).rejects.toMatchObject({ code: "forbidden" });
      await expect(readAudit({ actor: s })).rejects.toMatchObject({ code: "forbidden" });
      await expect(setAccountDisabled({ actor: s, userId: op.id, disable: true })).rejects.toMatchObject({ code: "forbidden" });
    }
    await expect(searchShops({ actor: null })).rejects.toMatchObject({ code: "unauthenticated" });
    await expect(operatorCounts({ actor: null })).rejects.toMatchObject({ code: "unauthenticated" });
  });

  it("pages accounts by cursor: every account once, pages never larger than the page size, search narrows", async () => {
    const seen: string[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const page: Awaited<ReturnType<typeof searchAccounts>> = await searchAccounts({ actor: opSession, cursor });
      expect(page.rows.length).toBeLessThanOrEqual(PAGE_SIZE);
      // Metadata only: no logbook fields travel with an account row.
      expect(Object.keys(page.rows[0] ?? {}).sort()).toEqual(["banned", "createdAt", "email", "id", "name", "plan", "role", "shops", "vehicles"]);
      seen.push(...page.rows.map((r) => r.id));
      cursor = page.next;
      pages += 1;
    } while (cursor && pages < 10);
    const [{ n }] = await db.select({ n: sql<number>`count(*)::int` }).from(user);
    expect(seen.length).toBe(n);
    expect(new Set(seen).size).toBe(n);
    expect(pages).toBe(Math.ceil(n / PAGE_SIZE));
    const found = await searchAccounts({ actor: opSession, q: "DARA" });
    expect(found.rows.map((r) => r.email)).toEqual([driver.email]);
    // Wildcards typed by an operator are letters.
    expect((await searchAccounts({ actor: opSession, q: "%" })).rows).toEqual([]);
    await expect(searchAccounts({ actor: opSession, cursor: "not-a-cursor" })).rejects.toMatchObject({ code: "invalid" });
  });

  it("disabling ends sessions, sign-in, the passes the driver gave and the calendar feed; re-enabling lets them back; both are audited", async () => {
    const shopId = (await makeShop({ owner: await signUp(), technicians: [tech] })).id;
    const car = await makeVehicle(driver);
    const pass = await insertPass({ driver, shopId, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) });
    const token = await regenerateFeed({ userId: driver.id });
    const readPass = () => passRead(request(`/api/passes/${pass.id}/vehicles/${car.vehicle.id}`, { as: tech }), ctx({ passId: pass.id, vehicleId: car.vehicle.id }));
    const feed = () => feedRoute(request(`/api/feed/${token}.ics`), ctx({ token: `${token}.ics` }));
    expect((await readPass()).status).toBe(200);
    expect((await feed()).status).toBe(200);

    await setAccountDisabled({ actor: opSession, userId: driver.id, disable: true });
    expect(await db.select().from(sessionTable).where(eq(sessionTable.userId, driver.id))).toHaveLength(0);
    expect(await sessionOf(driver)).toBeNull();
    await expect(auth.api.signInEmail({ body: { email: driver.email, password: "correct-horse-battery" } })).rejects.toThrow();
    expect((await readPass()).status).toBe(403);
    expect((await feed()).status).toBe(404);

    await setAccountDisabled({ actor: opSession, userId: driver.id, disable: false });
    const back = await auth.api.signInEmail({ body: { email: driver.email, password: "correct-horse-battery" } });
    expect(back.user.id).toBe(driver.id);
    expect((await readPass()).status).toBe(200);

    const audit = await readAudit({ actor: opSession });
    expect(audit.rows.slice(0, 2).map((r) => [r.action, r.actorEmail, r.targetLabel])).toEqual([
      ["enable_account", op.email, driver.email],
      ["disable_account", op.email, driver.email],
    ]);
    expect((await operatorCounts({ actor: opSession })).disabled).toBe(0);
  });

  it("an operator cannot disable themselves", async () => {
    await expect(setAccountDisabled({ actor: opSession, userId: op.id, disable: true })).rejects.toMatchObject({ code: "conflict" });
  });

  it("the audit log refuses changes and removals, even from the app's own database user", async () => {
    const [row] = await db.select().from(operatorAudit).limit(1);
    await expect(db.update(operatorAudit).set({ detail: "edited" }).where(eq(operatorAudit.id, row.id))).rejects.toThrow();
    await expect(db.delete(operatorAudit).where(eq(operatorAudit.id, row.id))).rejects.toThrow();
    const [again] = await db.select().from(operatorAudit).where(eq(operatorAudit.id, row.id));
    expect(again.detail).toBe(row.detail);
  });
});
