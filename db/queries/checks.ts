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
import { authorship, guardOdometer, logDate, requireEditable } from "./logbook-writes";

const coinMm = (c: CoinResult) => {
  const r = coinDepth(c);
  if (!r.ok) throw new AppError("invalid", r.error, { coin: [r.error] });
  return r.depthMm;
};

type CheckInput = Omit<TreadCheckRequest, "checkedOn" | "odometer"> & { checkedOn: string; odometerKm: number | null };

/** The set must be the vehicle's and each reading's tire the set's; returns the tires' depths when new. */
async function setAndTires(tx: Transaction, vehicleId: string, input: Pick<TreadCheckRequest, "setId" | "readings">, prefix: string) {
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
  return { setId: set.id, known };
}

/** Writes one check inside the caller's transaction (also used by service entries). */
export async function insertCheck(
  tx: Transaction,
  opts: {
    access: LogbookAccess;
    vehicleId: string;
    input: CheckInput;
    serviceEntryId?: string | null;
    fieldPrefix?: string;
  },
) {
  const { access, vehicleId, input } = opts;
  const prefix = opts.fieldPrefix ?? "";
  const { setId, known } = await setAndTires(tx, vehicleId, input, prefix);
  const who = authorship(access);
  const [check] = await tx
    .insert(treadCheck)
    .values({
      vehicleId,
      setId,
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
  opts: {
    readings: { tireId: string; innerMm: number | null; centreMm: number | null; outerMm: number | null; approximate: boolean }[];
    known: { id: string; newDepthMm: number | null }[];
    checkedOn: string;
    prefix: string;
    /** An edit: readings kept exactly as they were stored were asked about (or not) when first saved. */
    unchanged?: (r: { tireId: string; innerMm: number | null; centreMm: number | null; outerMm: number | null; approximate: boolean }) => boolean;
  },
) {
  const fields: Record<string, string[]> = {};
  for (const [i, r] of opts.readings.entries()) {
    if (r.approximate || opts.unchanged?.(r)) continue;
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

/**
 * The check being changed or deleted, authorised inside the transaction: the
 * vehicle's drivers, or the shop under the pass the check was recorded under
 * (the access-log row is written by assertVehicleAccess and rolls back with
 * any refusal). `vehicleId` is the one in a pass route's path.
 */
async function editableCheck(tx: Transaction, opts: { access: LogbookAccess; checkId: string; vehicleId?: string; action: string; verb: string }) {
  const [row] = await tx.select().from(treadCheck).where(eq(treadCheck.id, opts.checkId)).limit(1);
  if (!row || (opts.vehicleId && row.vehicleId !== opts.vehicleId)) throw notFound("That check");
  await assertVehicleAccess(opts.access, { vehicleId: row.vehicleId, write: true, action: opts.action, detail: `Tread check of ${logDate(row.checkedOn)}` }, tx);
  requireEditable(opts.access, row, opts.verb);
  return row;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Changes a check in place: its set, date, odometer, method, notes and every
 * reading (replaced as a whole). The same rules as a new check apply, asked
 * about afresh only for what changed: an odometer lower than what was read
 * on or before the check's date (the check itself left out), and a reading
 * deeper than new or than the tire's previous reading.
 */
export async function updateTreadCheck({ access, checkId, vehicleId, input, today = todayIso() }: { access: LogbookAccess; checkId: string; vehicleId?: string; input: TreadCheckRequest; today?: string }) {
  if (!UUID.test(checkId)) throw notFound("That check");
  return db.transaction(async (tx) => {
    const row = await editableCheck(tx, { access, checkId, vehicleId, action: "edit_check", verb: "change a tread check" });
    const { setId, known } = await setAndTires(tx, row.vehicleId, input, "");
    const checkedOn = input.checkedOn ?? row.checkedOn ?? today;
    const odometerKm = odometerKmOf(input);
    if (odometerKm !== row.odometerKm || checkedOn !== row.checkedOn) {
      await guardOdometer(tx, { vehicleId: row.vehicleId, km: odometerKm, confirmed: input.confirmLowerOdometer, scope: { upTo: checkedOn, excludeCheckId: checkId } });
    }
    const before = await tx.select().from(treadReading).where(eq(treadReading.checkId, checkId));
    await tx.delete(treadReading).where(eq(treadReading.checkId, checkId));
    await tx
      .update(treadCheck)
      .set({ setId, checkedOn, odometerKm, method: input.method, notes: input.notes ?? null })
      .where(eq(treadCheck.id, checkId));
    const readings = toStoredReadings(input, coinMm);
    if (!input.confirmUnusualDepth) {
      const same = (a: number | null, b: number | null) => (a == null ? b == null : b != null && Math.abs(a - b) < 1e-9);
      const unchanged = (r: { tireId: string; innerMm: number | null; centreMm: number | null; outerMm: number | null; approximate: boolean }) =>
        checkedOn === row.checkedOn &&
        before.some((b) => b.tireId === r.tireId && b.approximate === r.approximate && same(b.innerMm, r.innerMm) && same(b.centreMm, r.centreMm) && same(b.outerMm, r.outerMm));
      await guardDepths(tx, { readings, known, checkedOn, prefix: "", unchanged });
    }
    await tx.insert(treadReading).values(readings.map((r) => ({ checkId, ...r })));
    return { id: checkId };
  });
}

export async function deleteTreadCheck({ access, checkId, vehicleId }: { access: LogbookAccess; checkId: string; vehicleId?: string }) {
  if (!UUID.test(checkId)) throw notFound("That check");
  return db.transaction(async (tx) => {
    await editableCheck(tx, { access, checkId, vehicleId, action: "delete_check", verb: "delete a tread check" });
    await tx.delete(treadCheck).where(eq(treadCheck.id, checkId));
    return { deleted: true };
  });
}
