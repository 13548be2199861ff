import "server-only";
// Builds the export document of one account (lib/export/document.ts) and
// the list of files that go into the zip with it. Only the vehicles the
// account owns are exported: co-kept vehicles belong to their owner.
import { asc, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import {
  accessLog,
  attachment,
  driverProfile,
  odometerReading,
  organization,
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
import { EXPORT_FORMAT, EXPORT_VERSION, type ExportDocument } from "@/lib/export/document";
import { displayFileName } from "@/lib/uploads";

const NONE = ["00000000-0000-0000-0000-000000000000"];
const iso = (d: Date) => d.toISOString();
const isoOrNull = (d: Date | null) => (d ? d.toISOString() : null);

export type ExportFile = { path: string; storedName: string; sizeBytes: number; sha256: string | null };

/** The logbook of the given vehicles in export form (also the hand-on summary and the seller's snapshot). */
export async function exportVehicles({ accountId, vehicleIds }: { accountId: string | null; vehicleIds: string[] }) {
  const vIds = vehicleIds.length ? vehicleIds : NONE;
  const author = alias(user, "author");
  const [vehicles, sets, tires, checks, readings, services, odometers, files] = await Promise.all([
    db.select().from(vehicle).where(inArray(vehicle.id, vIds)).orderBy(asc(vehicle.createdAt), asc(vehicle.id)),
    db
      .select({ s: tireSet, shopName: organization.name })
      .from(tireSet)
      .leftJoin(organization, eq(organization.id, tireSet.fittedByShopId))
      .where(inArray(tireSet.vehicleId, vIds))
      .orderBy(asc(tireSet.createdAt), asc(tireSet.id)),
    db
      .select({ t: tire })
      .from(tire)
      .innerJoin(tireSet, eq(tire.setId, tireSet.id))
      .where(inArray(tireSet.vehicleId, vIds))
      .orderBy(asc(tire.createdAt), asc(tire.position)),
    db
      .select({ c: treadCheck, shopName: organization.name, authorName: author.name })
      .from(treadCheck)
      .leftJoin(organization, eq(organization.id, treadCheck.shopId))
      .leftJoin(author, eq(author.id, treadCheck.authorUserId))
      .where(inArray(treadCheck.vehicleId, vIds))
      .orderBy(asc(treadCheck.checkedOn), asc(treadCheck.createdAt), asc(treadCheck.id)),
    db
      .select({ r: treadReading })
      .from(treadReading)
      .innerJoin(treadCheck, eq(treadReading.checkId, treadCheck.id))
      .where(inArray(treadCheck.vehicleId, vIds)),
    db
      .select({ s: serviceEntry, shopName: organization.name, authorName: author.name })
      .from(serviceEntry)
      .leftJoin(organization, eq(organization.id, serviceEntry.shopId))
      .leftJoin(author, eq(author.id, serviceEntry.authorUserId))
      .where(inArray(serviceEntry.vehicleId, vIds))
      .orderBy(asc(serviceEntry.performedOn), asc(serviceEntry.createdAt), asc(serviceEntry.id)),
    db.select().from(odometerReading).where(inArray(odometerReading.vehicleId, vIds)).orderBy(asc(odometerReading.readOn), asc(odometerReading.odometerKm)),
    db.select().from(attachment).where(inArray(attachment.vehicleId, vIds)).orderBy(asc(attachment.createdAt), asc(attachment.id)),
  ]);

  const authorOf = (row: { shopId: string | null; authorUserId: string | null }, shopName: string | null, authorName: string | null) =>
    row.shopId
      ? { by: "shop" as const, name: authorName, shop: { id: row.shopId, name: shopName ?? "" } }
      : row.authorUserId && row.authorUserId !== accountId
        ? { by: "other" as const, name: authorName, shop: null }
        : { by: "account" as const, name: null, shop: null };

  const fileList: ExportFile[] = [];
  const doc = {
    vehicles: vehicles.map((v) => ({
      id: v.id,
      nickname: v.nickname,
      make: v.make,
      model: v.model,
      year: v.year,
      vin: v.vin,
      plate: v.plate,
      placardFrontSize: v.placardFrontSize,
      placardRearSize: v.placardRearSize,
      placardFrontKpa: v.placardFrontKpa,
      placardRearKpa: v.placardRearKpa,
      odometerUnit: v.odometerUnit,
      createdAt: iso(v.createdAt),
      updatedAt: iso(v.updatedAt),
    })),
    odometerReadings: odometers.map((o) => ({ id: o.id, vehicleId: o.vehicleId, readOn: o.readOn, odometerKm: o.odometerKm, createdAt: iso(o.createdAt) })),
    sets: sets.map(({ s, shopName }) => ({
      id: s.id,
      vehicleId: s.vehicleId,
      label: s.label,
      kind: s.kind,
      size: s.size,
      loadIndex: s.loadIndex,
      speedSymbol: s.speedSymbol,
      purchasedOn: s.purchasedOn,
      priceCents: s.priceCents,
      currency: s.currency,
      seller: s.seller,
      state: s.state,
      storageLocation: s.storageLocation,
      depthLimitMm: s.depthLimitMm,
      ageReplaceYears: s.ageReplaceYears,
      ageWatchYears: s.ageWatchYears,
      fittedByShop: s.fittedByShopId ? { id: s.fittedByShopId, name: shopName ?? "" } : null,
      createdAt: iso(s.createdAt),
      updatedAt: iso(s.updatedAt),
    })),
    tires: tires.map(({ t }) => ({
      id: t.id,
      setId: t.setId,
      position: t.position,
      dotCode: t.dotCode,
      dotWeek: t.dotWeek,
      dotYear: t.dotYear,
      dotWeekStart: t.dotWeekStart,
      dotPrecision: t.dotPrecision,
      newDepthMm: t.newDepthMm,
      createdAt: iso(t.createdAt),
    })),
    treadChecks: checks.map(({ c, shopName, authorName }) => ({
      id: c.id,
      vehicleId: c.vehicleId,
      setId: c.setId,
      checkedOn: c.checkedOn,
      odometerKm: c.odometerKm,
      measuredBy: c.measuredBy,
      method: c.method,
      author: authorOf(c, shopName, authorName),
      serviceEntryId: c.serviceEntryId,
      notes: c.notes,
      createdAt: iso(c.createdAt),
    })),
    treadReadings: readings
      .map(({ r }) => ({
        id: r.id,
        checkId: r.checkId,
        tireId: r.tireId,
        innerMm: r.innerMm,
        centreMm: r.centreMm,
        outerMm: r.outerMm,
        pressureKpa: r.pressureKpa,
        approximate: r.approximate,
      }))
      .sort((a, b) => a.checkId.localeCompare(b.checkId) || a.tireId.localeCompare(b.tireId)),
    serviceEntries: services.map(({ s, shopName, authorName }) => ({
      id: s.id,
      vehicleId: s.vehicleId,
      setId: s.setId,
      kind: s.kind,
      performedOn: s.performedOn,
      odometerKm: s.odometerKm,
      costCents: s.costCents,
      notes: s.notes,
      author: authorOf(s, shopName, authorName),
      createdAt: iso(s.createdAt),
    })),
    attachments: files.map((f) => {
      const path = `files/${f.id}-${displayFileName(f.fileName).replace(/[^A-Za-z0-9._-]+/g, "_")}`.slice(0, 206);
      fileList.push({ path, storedName: f.storedName, sizeBytes: f.sizeBytes, sha256: null });
      return {
        id: f.id,
        vehicleId: f.vehicleId,
        setId: f.setId,
        serviceEntryId: f.serviceEntryId,
        kind: f.kind,
        fileName: f.fileName,
        mimeType: f.mimeType as ExportDocument["attachments"][number]["mimeType"],
        sizeBytes: f.sizeBytes,
        // Filled in while the files are read (lib/export/zip.ts).
        sha256: "",
        path,
        createdAt: iso(f.createdAt),
      };
    }),
  };
  return { doc, files: fileList };
}

/** Everything the account holds, as the export document (sha256 of files still to fill in). */
export async function buildAccountExport({ userId, now = new Date() }: { userId: string; now?: Date }) {
  const [account] = await db.select({ id: user.id, name: user.name, email: user.email }).from(user).where(eq(user.id, userId));
  if (!account) throw new AppError("not_found", "That account was not found.");
  const [profile] = await db.select().from(driverProfile).where(eq(driverProfile.userId, userId));
  const owned = await db.select({ id: vehicle.id }).from(vehicle).where(eq(vehicle.ownerId, userId));
  const { doc, files } = await exportVehicles({ accountId: userId, vehicleIds: owned.map((v) => v.id) });
  const passes = await db
    .select({ p: shopPass, shopName: organization.name })
    .from(shopPass)
    .innerJoin(organization, eq(organization.id, shopPass.shopId))
    .where(eq(shopPass.driverId, userId))
    .orderBy(asc(shopPass.createdAt), asc(shopPass.id));
  const passIds = passes.length ? passes.map((p) => p.p.id) : NONE;
  const [passVehicles, log] = await Promise.all([
    db.select().from(shopPassVehicle).where(inArray(shopPassVehicle.passId, passIds)),
    db
      .select({ l: accessLog, shopName: organization.name })
      .from(accessLog)
      .innerJoin(organization, eq(organization.id, accessLog.shopId))
      .where(inArray(accessLog.passId, passIds))
      .orderBy(asc(accessLog.at), asc(accessLog.id)),
  ]);
  const document: ExportDocument = {
    format: EXPORT_FORMAT,
    version: EXPORT_VERSION,
    exportedAt: iso(now),
    account,
    profile: profile
      ? {
          units: profile.units,
          pressureUnit: profile.pressureUnit,
          timezone: profile.timezone,
          jurisdiction: profile.jurisdiction,
          reminderSettings: (profile.reminderSettings ?? {}) as Record<string, unknown>,
          emailReminders: profile.emailReminders,
        }
      : null,
    ...doc,
    shopPasses: passes.map(({ p, shopName }) => ({
      id: p.id,
      shop: { id: p.shopId, name: shopName },
      scope: p.scope,
      startsAt: iso(p.startsAt),
      endsAt: iso(p.endsAt),
      revokedAt: isoOrNull(p.revokedAt),
      note: p.note,
      vehicleIds: passVehicles.filter((pv) => pv.passId === p.id).map((pv) => pv.vehicleId).sort(),
    })),
    accessLog: log.map(({ l, shopName }) => ({
      passId: l.passId,
      vehicleId: l.vehicleId,
      shopName,
      actorName: l.actorName,
      action: l.action,
      detail: l.detail,
      at: iso(l.at),
    })),
  };
  return { document, files };
}
