import "server-only";
// Service entries (fitting, swap, rotation, …), optionally with the tread
// checks taken during the work, written in one transaction.
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { attachment, serviceEntry, tireSet } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";
import { removeStoredFile } from "@/lib/uploads";
import { odometerKmOf, todayIso, type ServiceEntryInput } from "@/lib/validation/logbook";
import { assertVehicleAccess } from "./access";
import { insertCheck } from "./checks";
import { authorship, guardOdometer, requireOwner } from "./logbook-writes";

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

export async function deleteServiceEntry({ access, entryId }: { access: LogbookAccess; entryId: string }) {
  requireOwner(access, "delete a service entry");
  if (!/^[0-9a-f-]{36}$/i.test(entryId)) throw notFound("That entry");
  const files = await db.transaction(async (tx) => {
    const [row] = await tx.select({ vehicleId: serviceEntry.vehicleId }).from(serviceEntry).where(eq(serviceEntry.id, entryId)).limit(1);
    if (!row) throw notFound("That entry");
    await assertVehicleAccess(access, { vehicleId: row.vehicleId, write: true, action: "delete_service" }, tx);
    const files = await tx.select({ storedName: attachment.storedName }).from(attachment).where(eq(attachment.serviceEntryId, entryId));
    await tx.delete(serviceEntry).where(eq(serviceEntry.id, entryId));
    return files;
  });
  await Promise.all(files.map((f) => removeStoredFile(f.storedName)));
  return { deleted: true };
}
