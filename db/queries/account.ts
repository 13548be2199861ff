import "server-only";
// A driver's right to take all of their data away, and to delete all of it.
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import {
  accessLog,
  attachment,
  driverProfile,
  member,
  odometerReading,
  organization,
  reminderDelivery,
  reminderFeed,
  serviceEntry,
  shopPass,
  shopPassVehicle,
  tire,
  tireSet,
  treadCheck,
  treadReading,
  user,
  vehicle,
} from "@/db/schema";
import { AppError } from "@/lib/errors";

export const EXPORT_FORMAT = "fourpatch-logbook-export";
export const EXPORT_VERSION = 1;

/** Everything Fourpatch keeps about one account, as plain JSON. */
export async function exportAccount({ userId, now = new Date() }: { userId: string; now?: Date }) {
  const [account] = await db
    .select({ id: user.id, name: user.name, email: user.email, createdAt: user.createdAt })
    .from(user)
    .where(eq(user.id, userId));
  if (!account) throw new AppError("not_found", "That account was not found.");
  const [profile] = await db.select().from(driverProfile).where(eq(driverProfile.userId, userId));
  const vehicles = await db.select().from(vehicle).where(eq(vehicle.ownerId, userId));
  const vehicleIds = vehicles.map((v) => v.id);
  const none = ["00000000-0000-0000-0000-000000000000"];
  const vIds = vehicleIds.length ? vehicleIds : none;
  const sets = await db.select().from(tireSet).where(inArray(tireSet.vehicleId, vIds));
  const setIds = sets.length ? sets.map((s) => s.id) : none;
  const checks = await db.select().from(treadCheck).where(inArray(treadCheck.vehicleId, vIds));
  const checkIds = checks.length ? checks.map((c) => c.id) : none;
  const passes = await db.select().from(shopPass).where(eq(shopPass.driverId, userId));
  const passIds = passes.length ? passes.map((p) => p.id) : none;
  const [tires, readings, services, odometers, attachments, passVehicles, log, feeds] = await Promise.all([
    db.select().from(tire).where(inArray(tire.setId, setIds)),
    db.select().from(treadReading).where(inArray(treadReading.checkId, checkIds)),
    db.select().from(serviceEntry).where(inArray(serviceEntry.vehicleId, vIds)),
    db.select().from(odometerReading).where(inArray(odometerReading.vehicleId, vIds)),
    db
      .select({
        id: attachment.id,
        vehicleId: attachment.vehicleId,
        setId: attachment.setId,
        serviceEntryId: attachment.serviceEntryId,
        kind: attachment.kind,
        fileName: attachment.fileName,
        mimeType: attachment.mimeType,
        sizeBytes: attachment.sizeBytes,
        createdAt: attachment.createdAt,
      })
      .from(attachment)
      .where(inArray(attachment.vehicleId, vIds)),
    db.select().from(shopPassVehicle).where(inArray(shopPassVehicle.passId, passIds)),
    db.select().from(accessLog).where(inArray(accessLog.vehicleId, vIds)),
    // The feed's secret is never stored, so there is nothing secret to export.
    db
      .select({ id: reminderFeed.id, createdAt: reminderFeed.createdAt, revokedAt: reminderFeed.revokedAt })
      .from(reminderFeed)
      .where(eq(reminderFeed.userId, userId)),
  ]);
  const deliveries = await db.select().from(reminderDelivery).where(eq(reminderDelivery.userId, userId));
  return {
    format: EXPORT_FORMAT,
    version: EXPORT_VERSION,
    exportedAt: now.toISOString(),
    account,
    profile: profile ?? null,
    vehicles,
    odometerReadings: odometers,
    sets,
    tires,
    treadChecks: checks,
    treadReadings: readings,
    serviceEntries: services,
    attachments,
    shopPasses: passes.map((p) => ({ ...p, vehicleIds: passVehicles.filter((pv) => pv.passId === p.id).map((pv) => pv.vehicleId) })),
    accessLog: log,
    reminderFeeds: feeds,
    reminderDeliveries: deliveries,
  };
}

/**
 * Deletes an account and everything that belongs to it, in one transaction
 * (foreign keys cascade from the user row). Returns the stored names of the
 * uploaded files, which the caller removes from disk after the commit.
 */
export async function deleteAccount({ userId }: { userId: string }): Promise<{ storedFiles: string[] }> {
  return db.transaction(async (tx) => {
    const owned = await tx
      .select({ name: organization.name })
      .from(member)
      .innerJoin(organization, eq(member.organizationId, organization.id))
      .where(and(eq(member.userId, userId), eq(member.role, "owner")));
    if (owned.length > 0) {
      throw new AppError(
        "conflict",
        `This account owns the shop ${owned.map((o) => o.name).join(", ")}. Hand the shop to another owner or close it before deleting the account.`,
      );
    }
    const files = await tx
      .select({ storedName: attachment.storedName })
      .from(attachment)
      .innerJoin(vehicle, eq(attachment.vehicleId, vehicle.id))
      .where(eq(vehicle.ownerId, userId));
    const deleted = await tx.delete(user).where(eq(user.id, userId)).returning({ id: user.id });
    if (deleted.length !== 1) throw new AppError("not_found", "That account was not found.");
    return { storedFiles: files.map((f) => f.storedName) };
  });
}
