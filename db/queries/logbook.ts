import "server-only";
// Reading a driver's logbook: the vehicles overview, one vehicle's whole
// logbook, one set. Every read goes through assertVehicleAccess first.
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import {
  accessLog,
  attachment,
  driverProfile,
  odometerReading,
  serviceEntry,
  tire,
  tireSet,
  treadCheck,
  treadReading,
  vehicle,
  organization,
  user,
} from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { notFound } from "@/lib/errors";
import { axlePattern, type Jurisdiction, type OdometerEntry, type ReminderItem } from "@/lib/tires";
import { remindersFor } from "./reminders";
import { assertVehicleAccess, driverVehicles, type VehicleRole } from "./access";
import { CAUTION, jurisdictionOf, limitFor, setCondition, tireView, type LimitView, type ReadingRow, type TireView } from "./logbook-view";
import type { Condition } from "@/lib/tires";

type Db = Transaction | typeof db;

export type Prefs = { units: "metric" | "imperial"; pressureUnit: "kpa" | "psi" | "bar"; jurisdiction: Jurisdiction };

export async function driverPrefs({ userId }: { userId: string }, tx: Db = db): Promise<Prefs & { reminderSettings: unknown }> {
  const [p] = await tx.select().from(driverProfile).where(eq(driverProfile.userId, userId)).limit(1);
  return {
    units: p?.units ?? "metric",
    pressureUnit: p?.pressureUnit ?? "kpa",
    jurisdiction: jurisdictionOf(p?.jurisdiction),
    reminderSettings: p?.reminderSettings ?? {},
  };
}

/** The vehicle a set belongs to, for the access check; unknown sets are "not found". */
export async function vehicleIdOfSet({ setId }: { setId: string }, tx: Db = db): Promise<string> {
  if (!/^[0-9a-f-]{36}$/i.test(setId)) throw notFound("That set");
  const [row] = await tx.select({ vehicleId: tireSet.vehicleId }).from(tireSet).where(eq(tireSet.id, setId)).limit(1);
  if (!row) throw notFound("That set");
  return row.vehicleId;
}

export type SetView = {
  id: string;
  label: string | null;
  kind: (typeof tireSet.$inferSelect)["kind"];
  size: string;
  loadIndex: number | null;
  speedSymbol: string | null;
  purchasedOn: string | null;
  priceCents: number | null;
  currency: string;
  seller: string | null;
  state: (typeof tireSet.$inferSelect)["state"];
  storageLocation: string | null;
  depthLimitMm: number | null;
  ageWatchYears: number | null;
  ageReplaceYears: number | null;
  limit: LimitView;
  condition: Condition | null;
  tires: TireView[];
  axleAdvice: string[];
};

export type CheckView = {
  id: string;
  setId: string;
  checkedOn: string;
  odometerKm: number | null;
  measuredBy: "driver" | "shop";
  method: "gauge" | "coin";
  shopName: string | null;
  authorName: string | null;
  /** Written by the reader (or, with no author kept, by the owner reading it): shown as "You". */
  byViewer: boolean;
  notes: string | null;
  readings: ReadingRow[];
};

export type ServiceView = {
  id: string;
  kind: (typeof serviceEntry.$inferSelect)["kind"];
  setId: string | null;
  performedOn: string;
  odometerKm: number | null;
  costCents: number | null;
  notes: string | null;
  shopName: string | null;
  authorName: string | null;
  byViewer: boolean;
};

export type AttachmentView = {
  id: string;
  kind: "receipt" | "photo" | "document";
  fileName: string;
  mimeType: string;
  sizeBytes: number;
  setId: string | null;
  serviceEntryId: string | null;
  createdAt: string;
};

export type VehicleLogbook = {
  vehicle: typeof vehicle.$inferSelect;
  /** How the reader relates to the vehicle; co-keepers and shops see no access log and no owner-only controls. */
  role: VehicleRole;
  viewer: Prefs;
  sets: SetView[];
  checks: CheckView[];
  service: ServiceView[];
  attachments: AttachmentView[];
  odometer: { date: string; odometerKm: number; source: "reading" | "check" | "service" }[];
  lastOdometer: { date: string; odometerKm: number } | null;
  accessLog: { id: string; at: string; actorName: string; action: string; detail: string | null; shopName: string }[];
  caution: string;
};

/** The whole logbook of one vehicle, with every tire's condition computed by lib/tires. */
export async function getVehicleLogbook({
  access,
  vehicleId,
  today,
  action = "read_logbook",
}: {
  access: LogbookAccess;
  vehicleId: string;
  today: string;
  action?: string;
}): Promise<VehicleLogbook> {
  const role = await assertVehicleAccess(access, { vehicleId, action });
  const [v] = await db.select().from(vehicle).where(eq(vehicle.id, vehicleId)).limit(1);
  if (!v) throw notFound("That vehicle");
  const [owner, viewer] = await Promise.all([driverPrefs({ userId: v.ownerId }), driverPrefs({ userId: access.userId })]);

  const [sets, tires, checks, readings, services, files, odos] = await Promise.all([
    db.select().from(tireSet).where(eq(tireSet.vehicleId, vehicleId)).orderBy(asc(tireSet.createdAt)),
    db.select({ t: tire }).from(tire).innerJoin(tireSet, eq(tire.setId, tireSet.id)).where(eq(tireSet.vehicleId, vehicleId)),
    db
      .select({ c: treadCheck, shopName: organization.name, authorName: user.name })
      .from(treadCheck)
      .leftJoin(organization, eq(treadCheck.shopId, organization.id))
      .leftJoin(user, eq(treadCheck.authorUserId, user.id))
      .where(eq(treadCheck.vehicleId, vehicleId))
      .orderBy(desc(treadCheck.checkedOn), desc(treadCheck.createdAt)),
    db
      .select({ r: treadReading, checkedOn: treadCheck.checkedOn, odometerKm: treadCheck.odometerKm })
      .from(treadReading)
      .innerJoin(treadCheck, eq(treadReading.checkId, treadCheck.id))
      .where(eq(treadCheck.vehicleId, vehicleId)),
    db
      .select({ s: serviceEntry, shopName: organization.name, authorName: user.name })
      .from(serviceEntry)
      .leftJoin(organization, eq(serviceEntry.shopId, organization.id))
      .leftJoin(user, eq(serviceEntry.authorUserId, user.id))
      .where(eq(serviceEntry.vehicleId, vehicleId))
      .orderBy(desc(serviceEntry.performedOn), desc(serviceEntry.createdAt)),
    db.select().from(attachment).where(eq(attachment.vehicleId, vehicleId)).orderBy(desc(attachment.createdAt)),
    db.select().from(odometerReading).where(eq(odometerReading.vehicleId, vehicleId)),
  ]);

  const readingRows: ReadingRow[] = readings.map(toReadingRow);

  const odometer: VehicleLogbook["odometer"] = [
    ...odos.map((o) => ({ date: o.readOn, odometerKm: o.odometerKm, source: "reading" as const })),
    ...checks.filter((c) => c.c.odometerKm != null).map((c) => ({ date: c.c.checkedOn, odometerKm: c.c.odometerKm as number, source: "check" as const })),
    ...services.filter((s) => s.s.odometerKm != null).map((s) => ({ date: s.s.performedOn, odometerKm: s.s.odometerKm as number, source: "service" as const })),
  ].sort((a, b) => a.date.localeCompare(b.date) || a.odometerKm - b.odometerKm);
  const history: OdometerEntry[] = odometer.map((o) => ({ date: o.date, odometerKm: o.odometerKm }));
  const last = odometer.reduce<{ date: string; odometerKm: number } | null>((m, o) => (!m || o.odometerKm > m.odometerKm ? { date: o.date, odometerKm: o.odometerKm } : m), null);

  const setViews: SetView[] = sets.map((s) => {
    const limit = limitFor(s, owner.jurisdiction, today);
    const views = tires
      .filter((t) => t.t.setId === s.id)
      .map((t) => tireView({ tire: t.t, set: s, readings: readingRows, limitMm: limit.minMm, odometerHistory: history, today }))
      .sort((a, b) => POSITION_ORDER[a.position] - POSITION_ORDER[b.position]);
    const axle = axlePattern({
      tires: views
        .filter((t) => t.latest && !t.latest.approximate)
        .map((t) => ({ position: t.position.replace("_", "-") as never, innerMm: t.latest!.innerMm, centreMm: t.latest!.centreMm, outerMm: t.latest!.outerMm })),
    });
    return {
      id: s.id,
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
      ageWatchYears: s.ageWatchYears,
      ageReplaceYears: s.ageReplaceYears,
      limit,
      condition: setCondition(views),
      tires: views,
      axleAdvice: axle.ok ? axle.advice : [],
    };
  });
  // Mounted first, then stored, then retired.
  setViews.sort((a, b) => STATE_ORDER[a.state] - STATE_ORDER[b.state]);

  const log =
    role === "owner"
      ? await db
          .select({ id: accessLog.id, at: accessLog.at, actorName: accessLog.actorName, action: accessLog.action, detail: accessLog.detail, shopName: organization.name })
          .from(accessLog)
          .innerJoin(organization, eq(accessLog.shopId, organization.id))
          .where(eq(accessLog.vehicleId, vehicleId))
          .orderBy(desc(accessLog.at))
          .limit(200)
      : [];

  return {
    vehicle: v,
    role,
    viewer: { units: viewer.units, pressureUnit: viewer.pressureUnit, jurisdiction: owner.jurisdiction },
    sets: setViews,
    checks: checks.map(({ c, shopName, authorName }) => ({
      id: c.id,
      setId: c.setId,
      checkedOn: c.checkedOn,
      odometerKm: c.odometerKm,
      measuredBy: c.measuredBy,
      method: c.method,
      shopName,
      authorName,
      byViewer: c.authorUserId ? c.authorUserId === access.userId : role === "owner",
      notes: c.notes,
      readings: readingRows.filter((r) => r.checkId === c.id),
    })),
    service: services.map(({ s, shopName, authorName }) => ({
      id: s.id,
      kind: s.kind,
      setId: s.setId,
      performedOn: s.performedOn,
      odometerKm: s.odometerKm,
      costCents: s.costCents,
      notes: s.notes,
      shopName,
      authorName,
      byViewer: s.authorUserId ? s.authorUserId === access.userId : role === "owner",
    })),
    attachments: files.map((f) => ({
      id: f.id,
      kind: f.kind,
      fileName: f.fileName,
      mimeType: f.mimeType,
      sizeBytes: f.sizeBytes,
      setId: f.setId,
      serviceEntryId: f.serviceEntryId,
      createdAt: f.createdAt.toISOString(),
    })),
    odometer,
    lastOdometer: last,
    accessLog: log.map((l) => ({ ...l, at: l.at.toISOString() })),
    caution: CAUTION,
  };
}

const POSITION_ORDER = { front_left: 0, front_right: 1, rear_left: 2, rear_right: 3, spare: 4 } as const;
const STATE_ORDER = { mounted: 0, stored: 1, retired: 2 } as const;

/** One set with its vehicle's summary; the set page's data. */
export async function getSetDetail({ access, setId, today }: { access: LogbookAccess; setId: string; today: string }) {
  const vehicleId = await vehicleIdOfSet({ setId });
  const book = await getVehicleLogbook({ access, vehicleId, today, action: "read_set" });
  const set = book.sets.find((s) => s.id === setId);
  if (!set) throw notFound("That set");
  return {
    vehicle: { id: book.vehicle.id, nickname: book.vehicle.nickname, make: book.vehicle.make, model: book.vehicle.model, odometerUnit: book.vehicle.odometerUnit },
    viewer: book.viewer,
    set,
    otherSets: book.sets.filter((s) => s.id !== setId && s.state !== "retired").map((s) => ({ id: s.id, label: s.label, kind: s.kind, state: s.state })),
    checks: book.checks.filter((c) => c.setId === setId),
    attachments: book.attachments.filter((a) => a.setId === setId),
    lastOdometer: book.lastOdometer,
    caution: book.caution,
  };
}
export type SetDetail = Awaited<ReturnType<typeof getSetDetail>>;

export type VehicleSummary = {
  id: string;
  nickname: string;
  /** The owner's name when the driver keeps this vehicle as a co-keeper. */
  keptWith: string | null;
  make: string;
  model: string;
  year: number | null;
  odometerUnit: "km" | "mi";
  mountedSet: { id: string; label: string | null; kind: SetView["kind"]; size: string; condition: Condition | null } | null;
  storedSets: { id: string; label: string | null; kind: SetView["kind"]; storageLocation: string | null; condition: Condition | null }[];
  nextReminder: Pick<ReminderItem, "date" | "subject" | "severity" | "overdue" | "kind"> | null;
  lastCheck: { date: string; odometerKm: number | null } | null;
};

/** The signed-in driver's own vehicles, each with its mounted set's condition, next reminder and last check. */
export async function listVehicleSummaries({ userId, today }: { userId: string; today: string }): Promise<{ vehicles: VehicleSummary[]; prefs: Prefs; caution: string }> {
  const prefs = await driverPrefs({ userId });
  const vehicles = await db
    .select({ v: vehicle, ownerName: user.name })
    .from(vehicle)
    .innerJoin(user, eq(user.id, vehicle.ownerId))
    .where(driverVehicles(userId))
    .orderBy(asc(vehicle.createdAt))
    .then((rows) => rows.map((r) => ({ ...r.v, ownerName: r.ownerName })));
  if (vehicles.length === 0) return { vehicles: [], prefs, caution: CAUTION };
  const ids = vehicles.map((v) => v.id);
  const [sets, tires, readings, lastChecks, reminders] = await Promise.all([
    db.select().from(tireSet).where(and(inArray(tireSet.vehicleId, ids), inArray(tireSet.state, ["mounted", "stored"]))),
    db.select({ t: tire }).from(tire).innerJoin(tireSet, eq(tire.setId, tireSet.id)).where(inArray(tireSet.vehicleId, ids)),
    db
      .select({ r: treadReading, checkedOn: treadCheck.checkedOn, odometerKm: treadCheck.odometerKm })
      .from(treadReading)
      .innerJoin(treadCheck, eq(treadReading.checkId, treadCheck.id))
      .where(inArray(treadCheck.vehicleId, ids)),
    db
      .selectDistinctOn([treadCheck.vehicleId], { vehicleId: treadCheck.vehicleId, date: treadCheck.checkedOn, odometerKm: treadCheck.odometerKm })
      .from(treadCheck)
      .where(inArray(treadCheck.vehicleId, ids))
      .orderBy(treadCheck.vehicleId, desc(treadCheck.checkedOn), desc(treadCheck.createdAt)),
    // The same items, settings and plan as the reminders page and the feed.
    remindersFor({ userId, today }),
  ]);
  const items = reminders?.items ?? [];
  const rows: ReadingRow[] = readings.map(toReadingRow);

  const condOf = (s: typeof tireSet.$inferSelect) => {
    const limit = limitFor(s, prefs.jurisdiction, today);
    const views = tires
      .filter((t) => t.t.setId === s.id)
      .map((t) => tireView({ tire: t.t, set: s, readings: rows, limitMm: limit.minMm, odometerHistory: [], today }));
    return setCondition(views);
  };

  return {
    prefs,
    caution: CAUTION,
    vehicles: vehicles.map((v) => {
      const mine = sets.filter((s) => s.vehicleId === v.id);
      const mounted = mine.find((s) => s.state === "mounted") ?? null;
      const next = nextReminderOf(items.filter((i) => i.vehicleId === v.id), today);
      const lc = lastChecks.find((c) => c.vehicleId === v.id);
      return {
        id: v.id,
        nickname: v.nickname,
        keptWith: v.ownerId === userId ? null : v.ownerName,
        make: v.make,
        model: v.model,
        year: v.year,
        odometerUnit: v.odometerUnit,
        mountedSet: mounted ? { id: mounted.id, label: mounted.label, kind: mounted.kind, size: mounted.size, condition: condOf(mounted) } : null,
        storedSets: mine
          .filter((s) => s.state === "stored")
          .map((s) => ({ id: s.id, label: s.label, kind: s.kind, storageLocation: s.storageLocation, condition: condOf(s) })),
        nextReminder: next ? { date: next.date, subject: next.subject, severity: next.severity, overdue: next.overdue, kind: next.kind } : null,
        lastCheck: lc ? { date: lc.date, odometerKm: lc.odometerKm } : null,
      };
    }),
  };
}

/**
 * The one reminder the vehicles overview shows per vehicle. Something already due comes
 * before anything upcoming: an overdue "replace" first (it matters most), then
 * the most recent other overdue item (a missed seasonal swap, a rotation),
 * else the soonest upcoming one.
 */
export function nextReminderOf(items: ReminderItem[], today: string): ReminderItem | undefined {
  const byDate = [...items].sort((a, b) => a.date.localeCompare(b.date));
  const overdue = byDate.filter((i) => i.overdue || i.date < today);
  return overdue.find((i) => i.severity === "replace") ?? overdue.at(-1) ?? byDate.find((i) => i.date >= today);
}

/** The driver's vehicles for pickers (purchase and check forms). */
export async function listVehicleChoices({ userId }: { userId: string }) {
  const rows = await db
    .select({ id: vehicle.id, nickname: vehicle.nickname, make: vehicle.make, model: vehicle.model, placardFrontSize: vehicle.placardFrontSize, placardRearSize: vehicle.placardRearSize, odometerUnit: vehicle.odometerUnit })
    .from(vehicle)
    .where(driverVehicles(userId))
    .orderBy(asc(vehicle.createdAt));
  const mounted = rows.length
    ? await db
        .select({ id: tireSet.id, vehicleId: tireSet.vehicleId, label: tireSet.label, kind: tireSet.kind, size: tireSet.size })
        .from(tireSet)
        .where(and(inArray(tireSet.vehicleId, rows.map((r) => r.id)), eq(tireSet.state, "mounted")))
    : [];
  return rows.map((r) => ({ ...r, mountedSet: mounted.find((m) => m.vehicleId === r.id) ?? null }));
}

/** The driver's display units (their own profile only). */
export async function setUnits({ userId, units, pressureUnit }: { userId: string; units: "metric" | "imperial"; pressureUnit: "kpa" | "psi" | "bar" }) {
  await db
    .insert(driverProfile)
    .values({ userId, units, pressureUnit })
    .onConflictDoUpdate({ target: driverProfile.userId, set: { units, pressureUnit, updatedAt: new Date() } });
  return { units, pressureUnit };
}

/** A tread reading joined with its check, as the views use it. */
function toReadingRow({ r, checkedOn, odometerKm }: { r: typeof treadReading.$inferSelect; checkedOn: string; odometerKm: number | null }): ReadingRow {
  return {
    checkId: r.checkId,
    tireId: r.tireId,
    checkedOn,
    odometerKm,
    innerMm: r.innerMm,
    centreMm: r.centreMm,
    outerMm: r.outerMm,
    pressureKpa: r.pressureKpa,
    approximate: r.approximate,
  };
}
