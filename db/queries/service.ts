import "server-only";
// Service entries (fitting, swap, rotation, …), optionally with the tread
// checks taken during the work, written in one transaction.
import { and, eq } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { attachment, serviceEntry, tireSet, treadCheck } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";
import { removeStoredFile } from "@/lib/uploads";
import { odometerKmOf, SERVICE_KIND_LABELS, todayIso, type ServiceEntryInput, type ServiceEntryUpdateInput } from "@/lib/validation/logbook";
import { assertVehicleAccess } from "./access";
import { insertCheck } from "./checks";
import { authorship, guardOdometer, logDate, requireEditable } from "./logbook-writes";

export async function addServiceEntry({ access, vehicleId, input, today = todayIso() }: { access: LogbookAccess; vehicleId: string; input: ServiceEntryInput; today?: string }) {
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "add_service", detail: input.kind }, tx);
    if (input.setId) {
      const [s] = await tx.select({ id: tireSet.id }).from(tireSet).where(and(eq(tireSet.id, input.setId), eq(tireSet.vehicleId, vehicleId))).limit(1);
      if (!s) throw new AppError("invalid", "That set is not on this vehicle.", { setId: ["Choose a set of this vehicle."] });
    }
    const odometerKm = odometerKmOf(input);
    await guardOdometer(tx, { vehicleId, km: odometerKm, confirmed: input.confirmLowerOdometer });
    const performedOn = input.performedOn ?? today;
    const [entry] = await tx
      .insert(serviceEntry)
      .values({
        vehicleId,
        setId: input.setId ?? input.checks[0]?.setId ?? null,
        kind: input.kind,
        performedOn,
        odometerKm,
        costCents: input.cost !== undefined ? Math.round(input.cost * 100) : null,
        notes: input.notes ?? null,
        ...authorship(access),
      })
      .returning({ id: serviceEntry.id });
    const checkIds: string[] = [];
    for (const [i, c] of input.checks.entries()) {
      checkIds.push(
        await insertCheck(tx, {
          access,
          vehicleId,
          input: { ...c, checkedOn: performedOn, odometerKm, odometerUnit: input.odometerUnit, confirmLowerOdometer: true },
          serviceEntryId: entry.id,
          fieldPrefix: `checks.${i}.`,
        }),
      );
    }
    return { id: entry.id, checkIds };
  });
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The entry being changed or deleted, authorised inside the transaction (see editableCheck in checks.ts). */
async function editableEntry(tx: Transaction, opts: { access: LogbookAccess; entryId: string; vehicleId?: string; action: string; verb: string }) {
  const [row] = await tx.select().from(serviceEntry).where(eq(serviceEntry.id, opts.entryId)).limit(1);
  if (!row || (opts.vehicleId && row.vehicleId !== opts.vehicleId)) throw notFound("That entry");
  await assertVehicleAccess(opts.access, { vehicleId: row.vehicleId, write: true, action: opts.action, detail: `${SERVICE_KIND_LABELS[row.kind]} of ${logDate(row.performedOn)}` }, tx);
  requireEditable(opts.access, row, opts.verb);
  return row;
}

/**
 * Changes a service entry: kind, set, date, odometer, cost and notes. The
 * checks taken with it keep its date and odometer (they were saved with them),
 * so they follow; their readings are changed as checks of their own.
 */
export async function updateServiceEntry({ access, entryId, vehicleId, input }: { access: LogbookAccess; entryId: string; vehicleId?: string; input: ServiceEntryUpdateInput }) {
  if (!UUID.test(entryId)) throw notFound("That entry");
  return db.transaction(async (tx) => {
    const row = await editableEntry(tx, { access, entryId, vehicleId, action: "edit_service", verb: "change recorded work" });
    if (input.setId) {
      const [s] = await tx.select({ id: tireSet.id }).from(tireSet).where(and(eq(tireSet.id, input.setId), eq(tireSet.vehicleId, row.vehicleId))).limit(1);
      if (!s) throw new AppError("invalid", "That set is not on this vehicle.", { setId: ["Choose a set of this vehicle."] });
    }
    const performedOn = input.performedOn ?? row.performedOn;
    const odometerKm = odometerKmOf(input);
    if (odometerKm !== row.odometerKm || performedOn !== row.performedOn) {
      await guardOdometer(tx, { vehicleId: row.vehicleId, km: odometerKm, confirmed: input.confirmLowerOdometer, scope: { upTo: performedOn, excludeServiceEntryId: entryId } });
    }
    await tx
      .update(serviceEntry)
      .set({
        kind: input.kind,
        setId: input.setId ?? null,
        performedOn,
        odometerKm,
        costCents: input.cost !== undefined ? Math.round(input.cost * 100) : null,
        notes: input.notes ?? null,
      })
      .where(eq(serviceEntry.id, entryId));
    await tx.update(treadCheck).set({ checkedOn: performedOn, odometerKm }).where(eq(treadCheck.serviceEntryId, entryId));
    return { id: entryId };
  });
}

/** Deletes an entry with its files; the checks taken with it stay, as checks of their own. */
export async function deleteServiceEntry({ access, entryId, vehicleId }: { access: LogbookAccess; entryId: string; vehicleId?: string }) {
  if (!UUID.test(entryId)) throw notFound("That entry");
  const files = await db.transaction(async (tx) => {
    await editableEntry(tx, { access, entryId, vehicleId, action: "delete_service", verb: "delete recorded work" });
    const files = await tx.select({ storedName: attachment.storedName }).from(attachment).where(eq(attachment.serviceEntryId, entryId));
    await tx.delete(serviceEntry).where(eq(serviceEntry.id, entryId));
    return files;
  });
  await Promise.all(files.map((f) => removeStoredFile(f.storedName)));
  return { deleted: true };
}
