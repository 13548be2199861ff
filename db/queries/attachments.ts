import "server-only";
// Receipts and photos: checked by content, stored under random names, and
// only ever read back through the vehicle's access check.
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { attachment, serviceEntry, tireSet, vehicle } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";
import { checkUpload, displayFileName, readStoredFile, removeStoredFile, STORAGE_QUOTA_BYTES, storeFile } from "@/lib/uploads";
import { assertVehicleAccess } from "./access";
import { requireOwner } from "./logbook-writes";

export async function saveAttachment({
  access,
  vehicleId,
  file,
  meta,
}: {
  access: LogbookAccess;
  vehicleId: string;
  file: { name: string; bytes: Uint8Array };
  meta: { kind: "receipt" | "photo" | "document"; setId?: string; serviceEntryId?: string };
}) {
  // Access first, so a stranger learns nothing from the file checks.
  await assertVehicleAccess(access, { vehicleId, write: true, action: "upload", detail: displayFileName(file.name) });
  const { mimeType, ext } = await checkUpload(file.bytes);
  const storedName = await storeFile(file.bytes, ext);
  try {
    return await db.transaction(async (tx) => {
      if (meta.setId) {
        const [s] = await tx.select({ id: tireSet.id }).from(tireSet).where(and(eq(tireSet.id, meta.setId), eq(tireSet.vehicleId, vehicleId))).limit(1);
        if (!s) throw new AppError("invalid", "That set is not on this vehicle.", { setId: ["Choose a set of this vehicle."] });
      }
      if (meta.serviceEntryId) {
        const [s] = await tx
          .select({ id: serviceEntry.id })
          .from(serviceEntry)
          .where(and(eq(serviceEntry.id, meta.serviceEntryId), eq(serviceEntry.vehicleId, vehicleId)))
          .limit(1);
        if (!s) throw new AppError("invalid", "That entry is not in this vehicle's logbook.", { serviceEntryId: ["Choose an entry of this vehicle."] });
      }
      const [owner] = await tx.select({ ownerId: vehicle.ownerId }).from(vehicle).where(eq(vehicle.id, vehicleId)).limit(1);
      // The driver's storage quota, counted inside the write so two uploads at once cannot both slip under it.
      const [used] = await tx
        .select({ bytes: sql<string>`coalesce(sum(${attachment.sizeBytes}), 0)` })
        .from(attachment)
        .where(eq(attachment.ownerId, owner.ownerId));
      if (Number(used.bytes) + file.bytes.byteLength > STORAGE_QUOTA_BYTES) {
        throw new AppError(
          "too_large",
          `This logbook's files would pass the ${STORAGE_QUOTA_BYTES / (1024 * 1024)} MB storage limit. Delete old photos or receipts first.`,
          { file: ["Storage limit reached."] },
        );
      }
      const [row] = await tx
        .insert(attachment)
        .values({
          ownerId: owner.ownerId,
          vehicleId,
          setId: meta.setId ?? null,
          serviceEntryId: meta.serviceEntryId ?? null,
          kind: meta.kind,
          fileName: displayFileName(file.name),
          storedName,
          mimeType,
          sizeBytes: file.bytes.byteLength,
          uploadedByUserId: access.userId,
        })
        .returning();
      return { id: row.id, fileName: row.fileName, mimeType: row.mimeType, sizeBytes: row.sizeBytes, kind: row.kind };
    });
  } catch (e) {
    // Nothing points at the file: remove it.
    await removeStoredFile(storedName);
    throw e;
  }
}

async function attachmentRow(attachmentId: string) {
  if (!/^[0-9a-f-]{36}$/i.test(attachmentId)) throw notFound("That file");
  const [row] = await db.select().from(attachment).where(eq(attachment.id, attachmentId)).limit(1);
  if (!row) throw notFound("That file");
  return row;
}

export async function getAttachmentForDownload({ access, attachmentId }: { access: LogbookAccess; attachmentId: string }) {
  const row = await attachmentRow(attachmentId);
  await assertVehicleAccess(access, { vehicleId: row.vehicleId, action: "download", detail: row.fileName });
  let bytes: Buffer;
  try {
    bytes = await readStoredFile(row.storedName);
  } catch {
    throw notFound("That file");
  }
  return { bytes, mimeType: row.mimeType, fileName: row.fileName };
}

export async function deleteAttachment({ access, attachmentId }: { access: LogbookAccess; attachmentId: string }) {
  requireOwner(access, "delete a file");
  const row = await attachmentRow(attachmentId);
  await db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId: row.vehicleId, write: true, action: "delete_file" }, tx);
    await tx.delete(attachment).where(eq(attachment.id, row.id));
  });
  await removeStoredFile(row.storedName);
  return { deleted: true };
}
