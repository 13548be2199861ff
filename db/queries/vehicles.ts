import "server-only";
// Creating, changing and deleting a driver's vehicles (owner only).
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { attachment, vehicle } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { removeStoredFile } from "@/lib/uploads";
import { toVehicleRow, type VehicleInput } from "@/lib/validation/logbook";
import { assertVehicleAccess } from "./access";
import { requireOwner } from "./logbook-writes";

export async function createVehicle({ userId, input }: { userId: string; input: VehicleInput }) {
  const [row] = await db
    .insert(vehicle)
    .values({ ownerId: userId, ...toVehicleRow(input) })
    .returning();
  return row;
}

export async function updateVehicle({ access, vehicleId, input }: { access: LogbookAccess; vehicleId: string; input: VehicleInput }) {
  requireOwner(access, "change the vehicle");
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, ownerOnly: true, action: "update_vehicle" }, tx);
    const [row] = await tx
      .update(vehicle)
      .set({ ...toVehicleRow(input), updatedAt: new Date() })
      .where(and(eq(vehicle.id, vehicleId), eq(vehicle.ownerId, access.userId)))
      .returning();
    return row;
  });
}

/** Deletes the vehicle with everything in its logbook, and its files on disk. */
export async function deleteVehicle({ access, vehicleId }: { access: LogbookAccess; vehicleId: string }) {
  requireOwner(access, "delete the vehicle");
  const files = await db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, ownerOnly: true, action: "delete_vehicle" }, tx);
    const files = await tx.select({ storedName: attachment.storedName }).from(attachment).where(eq(attachment.vehicleId, vehicleId));
    await tx.delete(vehicle).where(and(eq(vehicle.id, vehicleId), eq(vehicle.ownerId, access.userId)));
    return files;
  });
  // Files go after the commit: a failed delete must not leave rows pointing at nothing.
  await Promise.all(files.map((f) => removeStoredFile(f.storedName)));
  return { deleted: true };
}
