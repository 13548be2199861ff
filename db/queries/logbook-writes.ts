import "server-only";
// Shared pieces of the logbook's writes: who wrote (driver, or a shop under
// a pass), the odometer guard, and the owner-only rule.
import { desc, eq } from "drizzle-orm";
import type { Transaction } from "@/db";
import { odometerReading, serviceEntry, treadCheck, vehicle } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, forbidden } from "@/lib/errors";
import { DEFAULT_PREFS, formatter } from "@/lib/format";

/** The attribution columns of a row written under this access. */
export function authorship(access: LogbookAccess) {
  return access.kind === "pass"
    ? { shopId: access.shopId, authorUserId: access.userId, passId: access.passId }
    : { shopId: null, authorUserId: access.userId, passId: null };
}

export function requireOwner(access: LogbookAccess, what: string) {
  if (access.kind !== "owner") throw forbidden(`Only the vehicle's owner can ${what}.`);
}

/** The highest odometer the logbook knows for a vehicle, with its date. */
export async function lastOdometer(tx: Transaction, vehicleId: string): Promise<{ km: number; date: string } | null> {
  const candidates = await Promise.all([
    tx.select({ km: odometerReading.odometerKm, date: odometerReading.readOn }).from(odometerReading).where(eq(odometerReading.vehicleId, vehicleId)).orderBy(desc(odometerReading.odometerKm)).limit(1),
    tx.select({ km: treadCheck.odometerKm, date: treadCheck.checkedOn }).from(treadCheck).where(eq(treadCheck.vehicleId, vehicleId)).orderBy(desc(treadCheck.odometerKm)).limit(1),
    tx.select({ km: serviceEntry.odometerKm, date: serviceEntry.performedOn }).from(serviceEntry).where(eq(serviceEntry.vehicleId, vehicleId)).orderBy(desc(serviceEntry.odometerKm)).limit(1),
  ]);
  let best: { km: number; date: string } | null = null;
  for (const [row] of candidates) {
    if (row?.km != null && (!best || row.km > best.km)) best = { km: row.km, date: row.date };
  }
  return best;
}

/**
 * An odometer lower than the last one is usually a typo, sometimes a
 * replaced instrument: ask first (409 with the field named), save when confirmed.
 */
export async function guardOdometer(
  tx: Transaction,
  opts: { vehicleId: string; km: number | null; confirmed: boolean },
): Promise<void> {
  if (opts.km == null || opts.confirmed) return;
  const last = await lastOdometer(tx, opts.vehicleId);
  // Half a kilometre of slack: miles typed by hand round differently.
  if (!last || opts.km >= last.km - 0.5) return;
  const [v] = await tx.select({ unit: vehicle.odometerUnit }).from(vehicle).where(eq(vehicle.id, opts.vehicleId)).limit(1);
  const f = formatter(DEFAULT_PREFS);
  const shown = f.distance(last.km, v?.unit ?? "km");
  const message = `This odometer reading is lower than the last one (${shown} on ${f.date(last.date)}). If the odometer was replaced or the earlier reading was wrong, confirm to save anyway.`;
  throw new AppError("conflict", message, { odometer: [message] });
}

