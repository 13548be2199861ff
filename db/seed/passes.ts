// The demo's shop passes: Ada has given Quillby Tread Works an open
// "read and add" pass for her first vehicle, and an earlier pass for the
// other one has run out. A few access-log rows show what the shop did.
// Needs the logbook part's vehicles; without them it adds nothing.
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { accessLog, serviceEntry, shopPass, shopPassVehicle, vehicle } from "@/db/schema";
import { DEMO_SHOP, demoAccounts } from "./demo-accounts";
import type { SeedContext } from "../seed";

const HOUR = 60 * 60 * 1000;

/** A moment on `today` (UTC) shifted by whole days and hours. */
function on(today: string, days: number, hour: number) {
  const d = new Date(`${today}T00:00:00Z`);
  return new Date(d.getTime() + days * 24 * HOUR + hour * HOUR);
}

export async function seedPasses(ctx: SeedContext): Promise<{ active?: string; expired?: string }> {
  const { ids, today } = ctx;
  const vehicles = await db.select({ id: vehicle.id }).from(vehicle).where(eq(vehicle.ownerId, ids.ada)).orderBy(asc(vehicle.createdAt));
  if (vehicles.length === 0) return {};
  const existing = await db.select({ id: shopPass.id }).from(shopPass).where(and(eq(shopPass.driverId, ids.ada), eq(shopPass.shopId, ids.shopId))).limit(1);
  if (existing.length > 0) return {};

  const [first, second] = vehicles;
  const jo = demoAccounts.jo.name;

  return db.transaction(async (tx) => {
    const [active] = await tx
      .insert(shopPass)
      .values({
        driverId: ids.ada,
        shopId: ids.shopId, shopName: DEMO_SHOP.name,
        scope: "view_add",
        startsAt: on(today, -1, 8),
        endsAt: on(today, 3, 17),
        note: "The rear left seems to wear on its inside edge. The winter set is in your storage.",
      })
      .returning({ id: shopPass.id });
    await tx.insert(shopPassVehicle).values({ passId: active.id, vehicleId: first.id });
    await tx.insert(accessLog).values([
      { passId: active.id, vehicleId: first.id, shopId: ids.shopId, shopName: DEMO_SHOP.name, actorUserId: ids.jo, actorName: jo, action: "read_logbook", at: on(today, -1, 9) },
      { passId: active.id, vehicleId: first.id, shopId: ids.shopId, shopName: DEMO_SHOP.name, actorUserId: ids.wren, actorName: demoAccounts.wren.name, action: "read_logbook", at: on(today, -1, 11) },
    ]);

    let expiredId: string | undefined;
    if (second) {
      const [expired] = await tx
        .insert(shopPass)
        .values({
          driverId: ids.ada,
          shopId: ids.shopId, shopName: DEMO_SHOP.name,
          scope: "view_add",
          startsAt: on(today, -2, 8),
          endsAt: on(today, -1, 8),
          // The demo's notice counts as sent: loading it sends no e-mail.
          endNoticeSentAt: on(today, -1, 8),
        })
        .returning({ id: shopPass.id });
      await tx.insert(shopPassVehicle).values({ passId: expired.id, vehicleId: second.id });
      await tx.insert(serviceEntry).values({
        vehicleId: second.id,
        kind: "inspection",
        performedOn: on(today, -2, 0).toISOString().slice(0, 10),
        notes: "Looked over all four before the long drive; no damage found.",
        shopId: ids.shopId,
        authorUserId: ids.jo,
        passId: expired.id,
      });
      await tx.insert(accessLog).values([
        { passId: expired.id, vehicleId: second.id, shopId: ids.shopId, shopName: DEMO_SHOP.name, actorUserId: ids.jo, actorName: jo, action: "read_logbook", at: on(today, -2, 10) },
        { passId: expired.id, vehicleId: second.id, shopId: ids.shopId, shopName: DEMO_SHOP.name, actorUserId: ids.jo, actorName: jo, action: "add_service", detail: "inspection", at: on(today, -2, 11) },
        { passId: expired.id, vehicleId: second.id, shopId: ids.shopId, shopName: DEMO_SHOP.name, actorUserId: ids.jo, actorName: jo, action: "read_logbook", at: on(today, -2, 15) },
      ]);
      expiredId = expired.id;
    }
    return { active: active.id, expired: expiredId };
  });
}
