// Shared set-up for the pass tests: invented drivers, vehicles and shops.
import { eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { accessLog, fakeOutbox, organization, serviceEntry, shopPass, shopPassVehicle, tire, tireSet, treadCheck, treadReading, vehicle } from "@/db/schema";
import { sessionFromRequest } from "@/lib/auth/session";
import { request, type TestUser } from "../../support/users";

export const HOUR = 60 * 60 * 1000;

export async function sessionOf(u: TestUser | undefined) {
  return u ? sessionFromRequest(request("/", { as: u })) : null;
}

let n = 0;
/** A vehicle of an invented make with one mounted set of four tires. */
export async function makeVehicle(owner: TestUser, nickname = `Test car ${++n}`) {
  const [v] = await db.insert(vehicle).values({ ownerId: owner.id, nickname, make: "Velora", model: "Strand", year: 2019 }).returning();
  const [set] = await db.insert(tireSet).values({ vehicleId: v.id, kind: "summer", size: "205/55R16", state: "mounted", label: "Summer set" }).returning();
  const tires = await db
    .insert(tire)
    .values(
      (["front_left", "front_right", "rear_left", "rear_right"] as const).map((position) => ({
        setId: set.id,
        position,
        dotCode: "DOT XJ7K ABCD 3422",
        dotWeek: 34,
        dotYear: 2022,
        dotWeekStart: "2022-08-21",
        dotPrecision: "week",
        newDepthMm: 8,
      })),
    )
    .returning();
  return { vehicle: v, set, tires };
}

/** A pass written straight into the table, for states a driver cannot reach by clicking. */
export async function insertPass(opts: {
  driver: TestUser;
  shopId: string;
  vehicleIds: string[];
  scope?: "view" | "view_add";
  startsAt: Date;
  endsAt: Date;
  revokedAt?: Date | null;
}) {
  const [p] = await db
    .insert(shopPass)
    .values({
      driverId: opts.driver.id,
      shopId: opts.shopId,
      shopName: (await db.select({ name: organization.name }).from(organization).where(eq(organization.id, opts.shopId)))[0]?.name,
      scope: opts.scope ?? "view_add",
      startsAt: opts.startsAt,
      endsAt: opts.endsAt,
      revokedAt: opts.revokedAt ?? null,
    })
    .returning();
  await db.insert(shopPassVehicle).values(opts.vehicleIds.map((vehicleId) => ({ passId: p.id, vehicleId })));
  return p;
}

/** Row counts of everything a shop could write, to prove a refusal wrote nothing. */
export async function counts() {
  const c = async (t: typeof accessLog | typeof serviceEntry | typeof treadCheck | typeof treadReading | typeof tireSet | typeof tire | typeof shopPass) =>
    (await db.select({ n: sql<number>`count(*)::int` }).from(t))[0].n;
  return {
    accessLog: await c(accessLog),
    serviceEntry: await c(serviceEntry),
    treadCheck: await c(treadCheck),
    treadReading: await c(treadReading),
    tireSet: await c(tireSet),
    tire: await c(tire),
    shopPass: await c(shopPass),
  };
}

export async function mailsTo(email: string) {
  const rows = await db.select().from(fakeOutbox);
  return rows.filter((m) => m.toAddresses.includes(email.toLowerCase()));
}

export async function logRows(vehicleId: string) {
  return db.select().from(accessLog).where(eq(accessLog.vehicleId, vehicleId));
}
