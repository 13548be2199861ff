import "server-only";
// The one check in front of every logbook read and write. A driver sees only
// the vehicles they own or keep with the owner as an active co-keeper
// (another driver's vehicle is "not found", never "forbidden", so its
// existence is not revealed); owner-only actions refuse a co-keeper. A pass holder sees only the
// vehicles of the pass, only while it lasts, writes only with `view_add`, and
// every read and write under a pass lands in the vehicle's access log: a
// write as a row of its own, reads counted into one row per visit window.
import { and, eq, inArray, or, sql, type SQL } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { accessLog, member, shopPass, shopPassVehicle, vehicle, vehicleKeeper } from "@/db/schema";
import { stampOfVehicle, vehicleStamp } from "@/db/revision";
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

/** Reads under a pass within one such window (aligned to the clock) make one access-log row with a count. */
export const ACCESS_VISIT_MS = 30 * 60 * 1000;

export function visitStartOf(at: Date): Date {
  return new Date(Math.floor(at.getTime() / ACCESS_VISIT_MS) * ACCESS_VISIT_MS);
}

/** How the acting driver relates to the vehicle: "owner", "keeper" (co-keeper), or "pass" (a shop). */
export type VehicleRole = "owner" | "keeper" | "pass";

export async function assertVehicleAccess(access: LogbookAccess, check: VehicleCheck, tx: Transaction | typeof db = db): Promise<VehicleRole> {
  return (await checkVehicleAccess(access, check, tx)).role;
}

/**
 * assertVehicleAccess, and the vehicle's stamp (db/revision.ts) read after
 * the check: for a driver in the same query, under a pass after the read was
 * counted into the access log (which the owner's logbook shows).
 */
export async function assertVehicleAccessWithStamp(access: LogbookAccess, check: VehicleCheck): Promise<{ role: VehicleRole; stamp: string }> {
  const { role, stamp } = await checkVehicleAccess(access, check, db);
  return { role, stamp: stamp ?? (await vehicleStamp(check.vehicleId)) };
}

async function checkVehicleAccess(access: LogbookAccess, check: VehicleCheck, tx: Transaction | typeof db): Promise<{ role: VehicleRole; stamp?: string }> {
  if (!/^[0-9a-f-]{36}$/i.test(check.vehicleId)) throw notFound("That vehicle");
  if (access.kind === "owner") {
    const [row] = await tx
      .select({ ownerId: vehicle.ownerId, keeperId: vehicleKeeper.id, stamp: stampOfVehicle })
      .from(vehicle)
      .leftJoin(
        vehicleKeeper,
        and(eq(vehicleKeeper.vehicleId, vehicle.id), eq(vehicleKeeper.userId, access.userId), eq(vehicleKeeper.state, "active")),
      )
      .where(and(eq(vehicle.id, check.vehicleId), or(eq(vehicle.ownerId, access.userId), eq(vehicleKeeper.state, "active"))))
      .limit(1);
    if (!row) throw notFound("That vehicle");
    if (row.ownerId === access.userId) return { role: "owner", stamp: row.stamp };
    if (check.ownerOnly) throw new AppError("forbidden", "Only the vehicle's owner can do that; co-keepers keep the logbook.");
    return { role: "keeper", stamp: row.stamp };
  }
  return { role: await passAccess(access, check, tx) };
}

async function passAccess(access: Extract<LogbookAccess, { kind: "pass" }>, check: VehicleCheck, tx: Transaction | typeof db): Promise<VehicleRole> {
  if (check.ownerOnly) throw new AppError("forbidden", "Only the vehicle's owner can do that.");
  if (!access.vehicleIds.includes(check.vehicleId)) throw notFound("That vehicle");
  const now = check.now ?? new Date();
  if (now >= access.endsAt) {
    throw new AppError("pass_ended", "The driver's pass for this vehicle has ended. Ask the driver for a new pass.");
  }
  // The pass was resolved before the request body was read; a slow body can
  // outlive a withdrawal or a staff removal. So the pass, the membership and
  // the vehicle are read again here, inside the write's transaction, with the
  // pass row locked against a concurrent revoke until the write commits.
  const [pass] = await tx
    .select({ shopId: shopPass.shopId, startsAt: shopPass.startsAt, endsAt: shopPass.endsAt, revokedAt: shopPass.revokedAt })
    .from(shopPass)
    .where(eq(shopPass.id, access.passId))
    .limit(1)
    .for("share");
  if (!pass || pass.shopId !== access.shopId) throw notFound("That pass");
  if (pass.revokedAt && pass.revokedAt <= now) {
    throw new AppError("pass_ended", "The driver withdrew this pass, so the logbook is closed to the shop. Entries already saved stay in the driver's logbook.");
  }
  if (now >= pass.endsAt) throw new AppError("pass_ended", "The driver's pass for this vehicle has ended. Ask the driver for a new pass.");
  if (now < pass.startsAt) throw new AppError("forbidden", "This pass has not started yet.");
  const [stillMember] = await tx
    .select({ id: member.id })
    .from(member)
    .where(and(eq(member.organizationId, access.shopId), eq(member.userId, access.userId)))
    .limit(1);
  if (!stillMember) throw notFound("That pass");
  const [covered] = await tx
    .select({ id: shopPassVehicle.vehicleId })
    .from(shopPassVehicle)
    .where(and(eq(shopPassVehicle.passId, access.passId), eq(shopPassVehicle.vehicleId, check.vehicleId)))
    .limit(1);
  if (!covered) throw notFound("That vehicle");
  if (check.write && !canWrite(access)) {
    throw new AppError("forbidden", "This pass lets the shop read the logbook, not add to it.");
  }
  const row = {
    passId: access.passId,
    vehicleId: check.vehicleId,
    shopId: access.shopId,
    shopName: access.shopName,
    actorUserId: access.userId,
    actorName: access.userName,
    action: check.action,
    detail: check.detail,
    at: now,
  };
  if (check.write) {
    await tx.insert(accessLog).values(row);
    return "pass";
  }
  // One statement, so two concurrent reads of the same visit count twice into one row.
  await tx
    .insert(accessLog)
    .values({ ...row, visitStart: visitStartOf(now), lastAt: now })
    .onConflictDoUpdate({
      target: [accessLog.passId, accessLog.vehicleId, accessLog.actorUserId, accessLog.action, accessLog.visitStart],
      set: { count: sql`${accessLog.count} + 1`, lastAt: now },
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
