import "server-only";
// Tread checks: one dated reading of one or more tires of a set.
import { and, eq, inArray } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { tire, tireSet, treadCheck, treadReading } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";
import { coinDepth, type CoinResult } from "@/lib/tires";
import { odometerKmOf, toStoredReadings, todayIso, type TreadCheckRequest } from "@/lib/validation/logbook";
import { assertVehicleAccess } from "./access";
import { authorship, guardOdometer, requireOwner } from "./logbook-writes";

const coinMm = (c: CoinResult) => {
  const r = coinDepth(c);
  if (!r.ok) throw new AppError("invalid", r.error, { coin: [r.error] });
  return r.depthMm;
};

/** Writes one check inside the caller's transaction (also used by service entries). */
export async function insertCheck(
  tx: Transaction,
  opts: {
    access: LogbookAccess;
    vehicleId: string;
    input: Omit<TreadCheckRequest, "checkedOn" | "odometer"> & { checkedOn: string; odometerKm: number | null };
    serviceEntryId?: string | null;
    fieldPrefix?: string;
  },
) {
  const { access, vehicleId, input } = opts;
  const prefix = opts.fieldPrefix ?? "";
  const [set] = await tx
    .select({ id: tireSet.id })
    .from(tireSet)
    .where(and(eq(tireSet.id, input.setId), eq(tireSet.vehicleId, vehicleId)))
    .limit(1);
  if (!set) throw new AppError("invalid", "That set is not on this vehicle.", { [`${prefix}setId`]: ["Choose a set of this vehicle."] });
  const tireIds = input.readings.map((r) => r.tireId);
  const known = await tx.select({ id: tire.id }).from(tire).where(and(eq(tire.setId, set.id), inArray(tire.id, tireIds)));
  const knownIds = new Set(known.map((k) => k.id));
  const fields: Record<string, string[]> = {};
  input.readings.forEach((r, i) => {
    if (!knownIds.has(r.tireId)) fields[`${prefix}readings.${i}.tireId`] = ["This tire is not part of the set."];
  });
  if (Object.keys(fields).length) throw new AppError("invalid", "Some tires are not part of this set.", fields);

  const who = authorship(access);
  const [check] = await tx
    .insert(treadCheck)
    .values({
      vehicleId,
      setId: set.id,
      checkedOn: input.checkedOn,
      odometerKm: input.odometerKm,
      measuredBy: access.kind === "pass" ? "shop" : "driver",
      method: input.method,
      notes: input.notes ?? null,
      serviceEntryId: opts.serviceEntryId ?? null,
      ...who,
    })
    .returning({ id: treadCheck.id });
  const readings = toStoredReadings(input as TreadCheckRequest, coinMm);
  await tx.insert(treadReading).values(readings.map((r) => ({ checkId: check.id, ...r })));
  return check.id;
}

export async function addTreadCheck({ access, vehicleId, input, today = todayIso() }: { access: LogbookAccess; vehicleId: string; input: TreadCheckRequest; today?: string }) {
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "add_check", detail: `Tread check of ${input.readings.length} tire(s)` }, tx);
    const odometerKm = odometerKmOf(input);
    await guardOdometer(tx, { vehicleId, km: odometerKm, confirmed: input.confirmLowerOdometer });
    const checkId = await insertCheck(tx, { access, vehicleId, input: { ...input, checkedOn: input.checkedOn ?? today, odometerKm } });
    return { id: checkId };
  });
}

export async function deleteTreadCheck({ access, checkId }: { access: LogbookAccess; checkId: string }) {
  requireOwner(access, "delete a tread check");
  if (!/^[0-9a-f-]{36}$/i.test(checkId)) throw notFound("That check");
  return db.transaction(async (tx) => {
    const [row] = await tx.select({ vehicleId: treadCheck.vehicleId }).from(treadCheck).where(eq(treadCheck.id, checkId)).limit(1);
    if (!row) throw notFound("That check");
    await assertVehicleAccess(access, { vehicleId: row.vehicleId, write: true, action: "delete_check" }, tx);
    await tx.delete(treadCheck).where(eq(treadCheck.id, checkId));
    return { deleted: true };
  });
}
