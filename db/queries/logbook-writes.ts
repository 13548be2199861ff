import "server-only";
// Shared pieces of the logbook's writes: who wrote (driver, or a shop under
// a pass), the odometer guard, and the owner-only rule.
import { and, desc, eq, isNull, lte, ne, or, type SQL } from "drizzle-orm";
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

/**
 * Changing or deleting a check or service entry: the vehicle's drivers may
 * touch any; a shop only what was recorded under the pass it is using now
 * (not the driver's own entries, not another shop's, not an earlier pass's).
 * Called after assertVehicleAccess, inside the write's transaction.
 */
export function requireEditable(access: LogbookAccess, row: { passId: string | null }, what: string) {
  if (access.kind === "pass" && row.passId !== access.passId) {
    throw forbidden(`The shop can ${what} only when it was recorded under this pass.`);
  }
}

/** A calendar date as the access log's detail says it (a stored text, so in the product's default locale). */
export function logDate(iso: string): string {
  return formatter(DEFAULT_PREFS).date(iso);
}

/**
 * What an edit compares against: only what was read on or before the edited
 * entry's date, and never the entry itself (nor, for a service entry, the
 * checks taken with it, which carry its odometer).
 */
export type OdometerScope = { upTo?: string; excludeCheckId?: string; excludeServiceEntryId?: string };

/** The highest odometer the logbook knows for a vehicle, with its date. */
export async function lastOdometer(tx: Transaction, vehicleId: string, scope: OdometerScope = {}): Promise<{ km: number; date: string } | null> {
  const checkScope: (SQL | undefined)[] = [
    scope.upTo ? lte(treadCheck.checkedOn, scope.upTo) : undefined,
    scope.excludeCheckId ? ne(treadCheck.id, scope.excludeCheckId) : undefined,
    scope.excludeServiceEntryId ? or(isNull(treadCheck.serviceEntryId), ne(treadCheck.serviceEntryId, scope.excludeServiceEntryId)) : undefined,
  ];
  const serviceScope: (SQL | undefined)[] = [
    scope.upTo ? lte(serviceEntry.performedOn, scope.upTo) : undefined,
    scope.excludeServiceEntryId ? ne(serviceEntry.id, scope.excludeServiceEntryId) : undefined,
  ];
  const candidates = await Promise.all([
    tx.select({ km: odometerReading.odometerKm, date: odometerReading.readOn }).from(odometerReading).where(and(eq(odometerReading.vehicleId, vehicleId), scope.upTo ? lte(odometerReading.readOn, scope.upTo) : undefined)).orderBy(desc(odometerReading.odometerKm)).limit(1),
    tx.select({ km: treadCheck.odometerKm, date: treadCheck.checkedOn }).from(treadCheck).where(and(eq(treadCheck.vehicleId, vehicleId), ...checkScope)).orderBy(desc(treadCheck.odometerKm)).limit(1),
    tx.select({ km: serviceEntry.odometerKm, date: serviceEntry.performedOn }).from(serviceEntry).where(and(eq(serviceEntry.vehicleId, vehicleId), ...serviceScope)).orderBy(desc(serviceEntry.odometerKm)).limit(1),
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
  opts: { vehicleId: string; km: number | null; confirmed: boolean; scope?: OdometerScope },
): Promise<void> {
  if (opts.km == null || opts.confirmed) return;
  const last = await lastOdometer(tx, opts.vehicleId, opts.scope);
  // Half a kilometre of slack: miles typed by hand round differently.
  if (!last || opts.km >= last.km - 0.5) return;
  const [v] = await tx.select({ unit: vehicle.odometerUnit }).from(vehicle).where(eq(vehicle.id, opts.vehicleId)).limit(1);
  const f = formatter(DEFAULT_PREFS);
  const shown = f.distance(last.km, v?.unit ?? "km");
  const message = `This odometer reading is lower than the last one (${shown} on ${f.date(last.date)}). If the odometer was replaced or the earlier reading was wrong, confirm to save anyway.`;
  throw new AppError("conflict", message, { odometer: [message] });
}

