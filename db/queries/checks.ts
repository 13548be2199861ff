import "server-only";
// Tread checks: one dated reading of one or more tires of a set.
import { and, desc, eq, inArray, lte } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { tire, tireSet, treadCheck, treadReading } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";
import { coinDepth, tireDepth, unusualDepth, type CoinResult } from "@/lib/tires";
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
  const known = await tx.select({ id: tire.id, newDepthMm: tire.newDepthMm }).from(tire).where(and(eq(tire.setId, set.id), inArray(tire.id, tireIds)));
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
  if (!input.confirmUnusualDepth) await guardDepths(tx, { readings, known, checkedOn: input.checkedOn, prefix });
  await tx.insert(treadReading).values(readings.map((r) => ({ checkId: check.id, ...r })));
  return check.id;
}

/**
 * Tread does not grow back: a reading deeper than new, or clearly deeper than
 * the tire's previous reading, is asked about first (409 with each field named),
 * like a lower odometer. Coin readings are brackets and are not compared.
 */
async function guardDepths(
  tx: Transaction,
  opts: { readings: { tireId: string; innerMm: number | null; centreMm: number | null; outerMm: number | null; approximate: boolean }[]; known: { id: string; newDepthMm: number | null }[]; checkedOn: string; prefix: string },
) {
  const fields: Record<string, string[]> = {};
  for (const [i, r] of opts.readings.entries()) {
    if (r.approximate) continue;
    const d = tireDepth(r);
    if (!d.ok) continue;
    const grooves = [r.innerMm, r.centreMm, r.outerMm].filter((x): x is number => x != null);
    const [prev] = await tx
      .select({ innerMm: treadReading.innerMm, centreMm: treadReading.centreMm, outerMm: treadReading.outerMm })
      .from(treadReading)
      .innerJoin(treadCheck, eq(treadCheck.id, treadReading.checkId))
      .where(and(eq(treadReading.tireId, r.tireId), eq(treadReading.approximate, false), lte(treadCheck.checkedOn, opts.checkedOn)))
      .orderBy(desc(treadCheck.checkedOn), desc(treadCheck.createdAt))
      .limit(1);
    const p = prev ? tireDepth(prev) : null;
    const odd = unusualDepth({
      deepestMm: Math.max(...grooves),
      depthMm: d.depthMm,
      newDepthMm: opts.known.find((k) => k.id === r.tireId)?.newDepthMm ?? null,
      previousMm: p?.ok ? p.depthMm : null,
    });
    if (odd) fields[`${opts.prefix}readings.${i}.centre`] = [`This reading is ${odd.message}. Tread does not grow back: measure again, or confirm to save it anyway.`];
  }
  if (Object.keys(fields).length) {
    throw new AppError("conflict", "Some readings are deeper than the tire can be. Check them, or confirm that they are right.", { ...fields, confirmUnusualDepth: ["Confirm the unusual readings to save them."] });
  }
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
