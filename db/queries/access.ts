import "server-only";
// The one check in front of every logbook read and write. An owner sees only
// their own vehicles (another driver's vehicle is "not found", never
// "forbidden", so its existence is not revealed). A pass holder sees only the
// vehicles of the pass, only while it lasts, writes only with `view_add`, and
// every read and write under a pass lands in the vehicle's access log: a
// write as a row of its own, reads counted into one row per visit window.
import { and, eq, sql } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { accessLog, vehicle } from "@/db/schema";
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
  if ((check.now ?? new Date()) >= access.endsAt) {
    throw new AppError("pass_ended", "The driver's pass for this vehicle has ended. Ask the driver for a new pass.");
  }
  if (check.write && !canWrite(access)) {
    throw new AppError("forbidden", "This pass lets the shop read the logbook, not add to it.");
  }
  const now = check.now ?? new Date();
  const row = {
    passId: access.passId,
    vehicleId: check.vehicleId,
    shopId: access.shopId,
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
