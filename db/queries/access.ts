import "server-only";
// The one check in front of every logbook read and write. A driver sees only
// the vehicles they own or keep with the owner as an active co-keeper
// (another driver's vehicle is "not found", never "forbidden", so its
// existence is not revealed); owner-only actions refuse a co-keeper. A pass holder sees only the
// vehicles of the pass, only while it lasts, writes only with `view_add`, and
// every read and write under a pass lands in the vehicle's access log.
import { and, eq, inArray, or, type SQL } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { accessLog, vehicle, vehicleKeeper } from "@/db/schema";
import { canWrite, type LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";

export type VehicleCheck = {
  vehicleId: string;
  write?: boolean;
  /** Set for what only the vehicle's owner may do (delete it, hand it on, manage co-keepers, give passes). */
  ownerOnly?: boolean;
  action: string;
  detail?: string;
  now?: Date;
};

/** How the acting driver relates to the vehicle: "owner", "keeper" (co-keeper), or "pass" (a shop). */
export type VehicleRole = "owner" | "keeper" | "pass";

export async function assertVehicleAccess(access: LogbookAccess, check: VehicleCheck, tx: Transaction | typeof db = db): Promise<VehicleRole> {
  if (!/^[0-9a-f-]{36}$/i.test(check.vehicleId)) throw notFound("That vehicle");
  if (access.kind === "owner") {
    const [row] = await tx
      .select({ ownerId: vehicle.ownerId, keeperId: vehicleKeeper.id })
      .from(vehicle)
      .leftJoin(
        vehicleKeeper,
        and(eq(vehicleKeeper.vehicleId, vehicle.id), eq(vehicleKeeper.userId, access.userId), eq(vehicleKeeper.state, "active")),
      )
      .where(and(eq(vehicle.id, check.vehicleId), or(eq(vehicle.ownerId, access.userId), eq(vehicleKeeper.state, "active"))))
      .limit(1);
    if (!row) throw notFound("That vehicle");
    if (row.ownerId === access.userId) return "owner";
    if (check.ownerOnly) throw new AppError("forbidden", "Only the vehicle's owner can do that; co-keepers keep the logbook.");
    return "keeper";
  }
  if (check.ownerOnly) throw new AppError("forbidden", "Only the vehicle's owner can do that.");
  if (!access.vehicleIds.includes(check.vehicleId)) throw notFound("That vehicle");
  if ((check.now ?? new Date()) >= access.endsAt) {
    throw new AppError("pass_ended", "The driver's pass for this vehicle has ended. Ask the driver for a new pass.");
  }
  if (check.write && !canWrite(access)) {
    throw new AppError("forbidden", "This pass lets the shop read the logbook, not add to it.");
  }
  await tx.insert(accessLog).values({
    passId: access.passId,
    vehicleId: check.vehicleId,
    shopId: access.shopId,
    actorUserId: access.userId,
    actorName: access.userName,
    action: check.action,
    detail: check.detail,
  });
  return "pass";
}

/** The vehicles a driver keeps with their owner (active co-keeper arrangements). */
export function keptVehicleIds(userId: string) {
  return db
    .select({ id: vehicleKeeper.vehicleId })
    .from(vehicleKeeper)
    .where(and(eq(vehicleKeeper.userId, userId), eq(vehicleKeeper.state, "active")));
}

/** The filter of a driver's vehicle lists: owned, or kept as a co-keeper. */
export function driverVehicles(userId: string): SQL {
  return or(eq(vehicle.ownerId, userId), inArray(vehicle.id, keptVehicleIds(userId)))!;
}
