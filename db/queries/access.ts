import "server-only";
// The one check in front of every logbook read and write. An owner sees only
// their own vehicles (another driver's vehicle is "not found", never
// "forbidden", so its existence is not revealed). A pass holder sees only the
// vehicles of the pass, only while it lasts, writes only with `view_add`, and
// every read and write under a pass lands in the vehicle's access log: a
// write as a row of its own, reads counted into one row per visit window.
import { and, eq, sql } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { accessLog, member, shopPass, shopPassVehicle, vehicle } from "@/db/schema";
import { canWrite, type LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";

export type VehicleCheck = { vehicleId: string; write?: boolean; action: string; detail?: string; now?: Date };

/** Reads under a pass within one such window (aligned to the clock) make one access-log row with a count. */
export const ACCESS_VISIT_MS = 30 * 60 * 1000;

export function visitStartOf(at: Date): Date {
  return new Date(Math.floor(at.getTime() / ACCESS_VISIT_MS) * ACCESS_VISIT_MS);
}

export async function assertVehicleAccess(access: LogbookAccess, check: VehicleCheck, tx: Transaction | typeof db = db) {
  if (!/^[0-9a-f-]{36}$/i.test(check.vehicleId)) throw notFound("That vehicle");
  if (access.kind === "owner") {
    const [row] = await tx
      .select({ id: vehicle.id })
      .from(vehicle)
      .where(and(eq(vehicle.id, check.vehicleId), eq(vehicle.ownerId, access.userId)))
      .limit(1);
    if (!row) throw notFound("That vehicle");
    return;
  }
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
    return;
  }
  // One statement, so two concurrent reads of the same visit count twice into one row.
  await tx
    .insert(accessLog)
    .values({ ...row, visitStart: visitStartOf(now), lastAt: now })
    .onConflictDoUpdate({
      target: [accessLog.passId, accessLog.vehicleId, accessLog.actorUserId, accessLog.action, accessLog.visitStart],
      set: { count: sql`${accessLog.count} + 1`, lastAt: now },
    });
}
