import "server-only";
// Reading a driver's logbook: the vehicles overview, one vehicle's whole
// logbook, one set. Every read goes through assertVehicleAccess first.
import { and, asc, desc, eq, inArray, isNotNull, ne, sql } from "drizzle-orm";
import { z } from "zod";
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
import { decodeCursor, encodeCursor } from "@/lib/api/cursor";
import { AppError, notFound } from "@/lib/errors";
import { axlePattern, distancePerDay, type Jurisdiction, type OdometerEntry, type ReminderItem } from "@/lib/tires";
import { remindersFor } from "./reminders";
import { loadLogbookRows, toLogbookInput } from "./logbook-input";
import { assertVehicleAccessWithStamp, driverVehicles, type VehicleRole } from "./access";
import { underStamp } from "@/db/revision";
import { CAUTION, jurisdictionOf, limitFor, setCondition, tireView, type LimitView, type ReadingRow, type TireCondition, type TireView } from "./logbook-view";

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
  condition: TireCondition | null;
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
  /** Recorded under the pass the reader is using: a shop may change or delete only these. */
  byThisPass: boolean;
  /** The service entry it was taken with, if any (it shares that entry's date and odometer). */
  serviceEntryId: string | null;
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
  /** Recorded under the pass the reader is using. */
  byThisPass: boolean;
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
  /** Older checks: GET /api/vehicles/:id/checks?cursor=… */
  checksNextCursor: string | null;
  service: ServiceView[];
  /** Older service entries: GET /api/vehicles/:id/service-entries?cursor=… */
  serviceNextCursor: string | null;
  attachments: AttachmentView[];
  odometer: { date: string; odometerKm: number; source: "reading" | "check" | "service" }[];
  lastOdometer: { date: string; odometerKm: number } | null;
  /** The newest rows; the whole log pages through GET /api/passes/access-log. */
  accessLog: { id: string; at: string; actorName: string; action: string; detail: string | null; count: number; lastAt: string | null; shopName: string }[];
  caution: string;
};

/** How many checks and service entries a logbook answer carries; older ones come page by page. */
export const HISTORY_PAGE = 50;

const historyCursor = z.object({ t: z.string().regex(/^\d{4}-\d{2}-\d{2}$/), c: z.string().min(1).max(40), id: z.string().uuid() });

type LoadOptions = {
  /** Only these sets' tires, readings and projections (the set page). */
  setId?: string;
  /** Retired sets are listed without a wear projection unless asked for. */
  includeRetired?: boolean;
  /** Checks and service entries in the answer (newest first); HISTORY_PAGE by default. */
  historyLimit?: number;
};

/**
 * One vehicle's logbook as its pages show it: every set with each tire's
 * condition computed by lib/tires (one parsed odometer history for the whole
 * vehicle), and the newest page of checks and service entries with cursors
 * for older ones.
 */
export async function getVehicleLogbook({
  access,
  vehicleId,
  today,
  action = "read_logbook",
  ...opts
}: {
  access: LogbookAccess;
  vehicleId: string;
  today: string;
  action?: string;
} & LoadOptions): Promise<VehicleLogbook> {
  // The stamp is read with (or, under a pass, after) the access check: a pass's read is counted into the access log, which the owner's logbook shows.
  const { role, stamp } = await assertVehicleAccessWithStamp(access, { vehicleId, action });
  const passId = access.kind === "pass" ? access.passId : "";
  const key = ["book", vehicleId, access.userId, role, passId, opts.setId ?? "", opts.includeRetired ? 1 : 0, opts.historyLimit ?? HISTORY_PAGE, today].join("|");
  return underStamp(key, stamp, () => computeLogbook({ access, role, vehicleId, today, ...opts }));
}

/** The logbook itself, for a reader whose access was checked. */
async function computeLogbook({ access, role, vehicleId, today, ...opts }: { access: LogbookAccess; role: VehicleRole; vehicleId: string; today: string } & LoadOptions): Promise<VehicleLogbook> {
  const limit = opts.historyLimit ?? HISTORY_PAGE;
  const [v] = await db.select().from(vehicle).where(eq(vehicle.id, vehicleId)).limit(1);
  if (!v) throw notFound("That vehicle");
  const [owner, viewer] = await Promise.all([driverPrefs({ userId: v.ownerId }), driverPrefs({ userId: access.userId })]);

  const setScope = opts.setId ? and(eq(tireSet.vehicleId, vehicleId), eq(tireSet.id, opts.setId)) : eq(tireSet.vehicleId, vehicleId);
  const [sets, tires, readings, checkPage, servicePage, files, odos, checkOdos, serviceOdos] = await Promise.all([
    db.select().from(tireSet).where(setScope).orderBy(asc(tireSet.createdAt)),
    db.select({ t: tire }).from(tire).innerJoin(tireSet, eq(tire.setId, tireSet.id)).where(setScope),
    // Readings of the computed sets only, through the checks of those sets.
    db
      .select({ r: treadReading, checkedOn: treadCheck.checkedOn, odometerKm: treadCheck.odometerKm })
      .from(treadReading)
      .innerJoin(treadCheck, eq(treadReading.checkId, treadCheck.id))
      .where(opts.setId ? and(eq(treadCheck.vehicleId, vehicleId), eq(treadCheck.setId, opts.setId)) : eq(treadCheck.vehicleId, vehicleId)),
    pageChecks({ vehicleId, setId: opts.setId, limit, viewer: { userId: access.userId, role, passId: access.kind === "pass" ? access.passId : undefined } }),
    opts.setId ? Promise.resolve({ service: [], nextCursor: null }) : pageService({ vehicleId, limit, viewer: { userId: access.userId, role, passId: access.kind === "pass" ? access.passId : undefined } }),
    db
      .select()
      .from(attachment)
      .where(opts.setId ? and(eq(attachment.vehicleId, vehicleId), eq(attachment.setId, opts.setId)) : eq(attachment.vehicleId, vehicleId))
      .orderBy(desc(attachment.createdAt)),
    db.select().from(odometerReading).where(eq(odometerReading.vehicleId, vehicleId)),
    // The odometer history needs every dated odometer, not the rest of the rows.
    db.select({ date: treadCheck.checkedOn, odometerKm: treadCheck.odometerKm }).from(treadCheck).where(and(eq(treadCheck.vehicleId, vehicleId), isNotNull(treadCheck.odometerKm))),
    db.select({ date: serviceEntry.performedOn, odometerKm: serviceEntry.odometerKm }).from(serviceEntry).where(and(eq(serviceEntry.vehicleId, vehicleId), isNotNull(serviceEntry.odometerKm))),
  ]);

  const readingRows: ReadingRow[] = readings.map(toReadingRow);
  const readingsByTire = groupBy(readingRows, (r) => r.tireId);
  const tiresBySet = groupBy(tires.map((t) => t.t), (t) => t.setId);

  const odometer: VehicleLogbook["odometer"] = [
    ...odos.map((o) => ({ date: o.readOn, odometerKm: o.odometerKm, source: "reading" as const })),
    ...checkOdos.map((c) => ({ date: c.date, odometerKm: c.odometerKm as number, source: "check" as const })),
    ...serviceOdos.map((s) => ({ date: s.date, odometerKm: s.odometerKm as number, source: "service" as const })),
  ].sort((a, b) => a.date.localeCompare(b.date) || a.odometerKm - b.odometerKm);
  const history: OdometerEntry[] = odometer.map((o) => ({ date: o.date, odometerKm: o.odometerKm }));
  // Parsed once for the vehicle; every tire's projection uses it.
  const distance = distancePerDay(history.filter((h) => h.date <= today));
  const last = odometer.reduce<{ date: string; odometerKm: number } | null>((m, o) => (!m || o.odometerKm > m.odometerKm ? { date: o.date, odometerKm: o.odometerKm } : m), null);

  const setViews: SetView[] = sets.map((s) => {
    const limit = limitFor(s, owner.jurisdiction, today);
    const project = s.state !== "retired" || opts.includeRetired === true;
    const views = (tiresBySet.get(s.id) ?? [])
      .map((t) => tireView({ tire: t, set: s, readings: readingsByTire.get(t.id) ?? [], limitMm: limit.minMm, odometerHistory: history, distance, project, today }))
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
    role === "owner" && !opts.setId
      ? await db
          .select({ id: accessLog.id, at: accessLog.at, actorName: accessLog.actorName, action: accessLog.action, detail: accessLog.detail, count: accessLog.count, lastAt: accessLog.lastAt, shopName: sql<string>`coalesce(${organization.name}, ${accessLog.shopName}, 'A closed shop')` })
          .from(accessLog)
          .leftJoin(organization, eq(accessLog.shopId, organization.id))
          .where(eq(accessLog.vehicleId, vehicleId))
          .orderBy(desc(accessLog.at), desc(accessLog.id))
          .limit(HISTORY_PAGE)
      : [];

  return {
    vehicle: v,
    role,
    viewer: { units: viewer.units, pressureUnit: viewer.pressureUnit, jurisdiction: owner.jurisdiction },
    sets: setViews,
    checks: checkPage.checks,
    checksNextCursor: checkPage.nextCursor,
    service: servicePage.service,
    serviceNextCursor: servicePage.nextCursor,
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
    accessLog: log.map((l) => ({ ...l, at: l.at.toISOString(), lastAt: l.lastAt?.toISOString() ?? null })),
    caution: CAUTION,
  };
}

function groupBy<T>(rows: T[], key: (row: T) => string): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const r of rows) {
    const k = key(r);
    const list = out.get(k);
    if (list) list.push(r);
    else out.set(k, [r]);
  }
  return out;
}

/**
 * A page of a vehicle's tread checks with their readings, newest first
 * (check date, then entry time, then id). Callers authorise first.
 */
/** Who reads the page: entries they wrote show as "You" (`byViewer`). */
type PageViewer = { userId: string; role: VehicleRole; passId?: string };
const underThisPass = (passId: string | null, viewer?: PageViewer) => !!viewer?.passId && passId === viewer.passId;
const writtenBy = (authorUserId: string | null, viewer?: PageViewer) => (viewer ? (authorUserId ? authorUserId === viewer.userId : viewer.role === "owner") : false);

export async function pageChecks({ vehicleId, setId, cursor, limit = HISTORY_PAGE, viewer }: { vehicleId: string; setId?: string; cursor?: string | null; limit?: number; viewer?: PageViewer }): Promise<{ checks: CheckView[]; nextCursor: string | null }> {
  const after = decodeCursor(cursor, historyCursor);
  const c = after ? new Date(after.c) : null;
  if (c && Number.isNaN(c.getTime())) throw badCursor();
  const rows = await db
    .select({ c: treadCheck, shopName: organization.name, authorName: user.name })
    .from(treadCheck)
    .leftJoin(organization, eq(treadCheck.shopId, organization.id))
    .leftJoin(user, eq(treadCheck.authorUserId, user.id))
    .where(
      and(
        eq(treadCheck.vehicleId, vehicleId),
        setId ? eq(treadCheck.setId, setId) : undefined,
        after && c
          ? sql`(${treadCheck.checkedOn}, ${treadCheck.createdAt}, ${treadCheck.id}) < (${after.t}::date, ${c.toISOString()}::timestamptz, ${after.id}::uuid)`
          : undefined,
      ),
    )
    .orderBy(desc(treadCheck.checkedOn), desc(treadCheck.createdAt), desc(treadCheck.id))
    .limit(limit + 1);
  const page = rows.slice(0, limit);
  const readings = page.length
    ? await db
        .select({ r: treadReading, checkedOn: treadCheck.checkedOn, odometerKm: treadCheck.odometerKm })
        .from(treadReading)
        .innerJoin(treadCheck, eq(treadReading.checkId, treadCheck.id))
        .where(inArray(treadReading.checkId, page.map((p) => p.c.id)))
    : [];
  const byCheck = groupBy(readings.map(toReadingRow), (r) => r.checkId);
  const lastRow = page.at(-1);
  return {
    checks: page.map(({ c: k, shopName, authorName }) => ({
      id: k.id,
      setId: k.setId,
      checkedOn: k.checkedOn,
      odometerKm: k.odometerKm,
      measuredBy: k.measuredBy,
      method: k.method,
      shopName,
      authorName,
      byViewer: writtenBy(k.authorUserId, viewer),
      byThisPass: underThisPass(k.passId, viewer),
      serviceEntryId: k.serviceEntryId,
      notes: k.notes,
      readings: byCheck.get(k.id) ?? [],
    })),
    nextCursor: rows.length > limit && lastRow ? encodeCursor({ t: lastRow.c.checkedOn, c: lastRow.c.createdAt.toISOString(), id: lastRow.c.id }) : null,
  };
}

/** A page of a vehicle's service entries, newest first. Callers authorise first. */
export async function pageService({ vehicleId, cursor, limit = HISTORY_PAGE, viewer }: { vehicleId: string; cursor?: string | null; limit?: number; viewer?: PageViewer }): Promise<{ service: ServiceView[]; nextCursor: string | null }> {
  const after = decodeCursor(cursor, historyCursor);
  const c = after ? new Date(after.c) : null;
  if (c && Number.isNaN(c.getTime())) throw badCursor();
  const rows = await db
    .select({ s: serviceEntry, shopName: organization.name, authorName: user.name })
    .from(serviceEntry)
    .leftJoin(organization, eq(serviceEntry.shopId, organization.id))
    .leftJoin(user, eq(serviceEntry.authorUserId, user.id))
    .where(
      and(
        eq(serviceEntry.vehicleId, vehicleId),
        after && c
          ? sql`(${serviceEntry.performedOn}, ${serviceEntry.createdAt}, ${serviceEntry.id}) < (${after.t}::date, ${c.toISOString()}::timestamptz, ${after.id}::uuid)`
          : undefined,
      ),
    )
    .orderBy(desc(serviceEntry.performedOn), desc(serviceEntry.createdAt), desc(serviceEntry.id))
    .limit(limit + 1);
  const page = rows.slice(0, limit);
  const lastRow = page.at(-1);
  return {
    service: page.map(({ s, shopName, authorName }) => ({
      id: s.id,
      kind: s.kind,
      setId: s.setId,
      performedOn: s.performedOn,
      odometerKm: s.odometerKm,
      costCents: s.costCents,
      notes: s.notes,
      shopName,
      authorName,
      byViewer: writtenBy(s.authorUserId, viewer),
      byThisPass: underThisPass(s.passId, viewer),
    })),
    nextCursor: rows.length > limit && lastRow ? encodeCursor({ t: lastRow.s.performedOn, c: lastRow.s.createdAt.toISOString(), id: lastRow.s.id }) : null,
  };
}

const badCursor = () => new AppError("invalid", "The page cursor is not valid. Start again from the first page.", { cursor: ["Not a cursor of this list."] });

const POSITION_ORDER = { front_left: 0, front_right: 1, rear_left: 2, rear_right: 3, spare: 4 } as const;
const STATE_ORDER = { mounted: 0, stored: 1, retired: 2 } as const;

/** One set with its vehicle's summary; the set page's data. Loads and computes that set only. */
export async function getSetDetail({ access, setId, today }: { access: LogbookAccess; setId: string; today: string }) {
  const vehicleId = await vehicleIdOfSet({ setId });
  const book = await getVehicleLogbook({ access, vehicleId, today, action: "read_set", setId, includeRetired: true });
  const set = book.sets.find((s) => s.id === setId);
  if (!set) throw notFound("That set");
  const others = await db
    .select({ id: tireSet.id, label: tireSet.label, kind: tireSet.kind, state: tireSet.state })
    .from(tireSet)
    .where(and(eq(tireSet.vehicleId, vehicleId), ne(tireSet.id, setId), ne(tireSet.state, "retired")))
    .orderBy(asc(tireSet.createdAt));
  return {
    vehicle: { id: book.vehicle.id, nickname: book.vehicle.nickname, make: book.vehicle.make, model: book.vehicle.model, odometerUnit: book.vehicle.odometerUnit },
    viewer: book.viewer,
    set,
    otherSets: others.sort((a, b) => STATE_ORDER[a.state] - STATE_ORDER[b.state]),
    checks: book.checks,
    checksNextCursor: book.checksNextCursor,
    attachments: book.attachments,
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
  mountedSet: {
    id: string;
    label: string | null;
    kind: SetView["kind"];
    size: string;
    condition: TireCondition | null;
    /** What the overview's tread-profile glyphs need, one per tire. */
    limitMm: number;
    tires: Pick<TireView, "id" | "position" | "newDepthMm" | "latest" | "condition">[];
  } | null;
  storedSets: { id: string; label: string | null; kind: SetView["kind"]; storageLocation: string | null; condition: TireCondition | null }[];
  nextReminder: Pick<ReminderItem, "date" | "subject" | "severity" | "overdue" | "kind"> | null;
  lastCheck: { date: string; odometerKm: number | null } | null;
};

/** The signed-in driver's own vehicles, each with its mounted set's condition, next reminder and last check. */
export async function listVehicleSummaries({ userId, today }: { userId: string; today: string }): Promise<{ vehicles: VehicleSummary[]; prefs: Prefs; caution: string }> {
  const prefs = await driverPrefs({ userId });
  // The whole logbook once: the conditions and the reminders are computed from the same rows.
  const rows = await loadLogbookRows({ ownerId: userId });
  if (rows.vehicles.length === 0) return { vehicles: [], prefs, caution: CAUTION };
  const ids = rows.vehicles.map((v) => v.id);
  const [vehicles, lastChecks, reminders] = await Promise.all([
    // Owned and co-kept vehicles; a co-kept one names its owner.
    db
      .select({ v: vehicle, ownerName: user.name })
      .from(vehicle)
      .innerJoin(user, eq(user.id, vehicle.ownerId))
      .where(driverVehicles(userId))
      .orderBy(asc(vehicle.createdAt))
      .then((found) => found.map((r) => ({ ...r.v, ownerName: r.ownerName }))),
    db
      .selectDistinctOn([treadCheck.vehicleId], { vehicleId: treadCheck.vehicleId, date: treadCheck.checkedOn, odometerKm: treadCheck.odometerKm })
      .from(treadCheck)
      .where(inArray(treadCheck.vehicleId, ids))
      .orderBy(treadCheck.vehicleId, desc(treadCheck.checkedOn), desc(treadCheck.createdAt)),
    // The same items, settings and plan as the reminders page and the feed.
    remindersFor({ userId, today, logbook: toLogbookInput(rows) }),
  ]);
  const items = reminders?.items ?? [];
  const sets = rows.sets.filter((s) => s.state !== "retired");
  const readingsByTire = new Map<string, ReadingRow[]>();
  for (const r of rows.readings) {
    const list = readingsByTire.get(r.tireId);
    if (list) list.push(r);
    else readingsByTire.set(r.tireId, [r]);
  }

  const viewsOf = (s: typeof tireSet.$inferSelect) => {
    const limit = limitFor(s, prefs.jurisdiction, today);
    // The overview shows conditions only: no wear projection.
    const views = rows.tires
      .filter((t) => t.t.setId === s.id)
      .map((t) => tireView({ tire: t.t, set: s, readings: readingsByTire.get(t.t.id) ?? [], limitMm: limit.minMm, odometerHistory: [], project: false, today }));
    return { limitMm: limit.minMm, views };
  };
  const condOf = (s: typeof tireSet.$inferSelect) => setCondition(viewsOf(s).views);
  const mountedOf = (s: typeof tireSet.$inferSelect) => {
    const { limitMm, views } = viewsOf(s);
    const tiresOut = views.map((t) => ({ id: t.id, position: t.position, newDepthMm: t.newDepthMm, latest: t.latest, condition: t.condition }));
    return { id: s.id, label: s.label, kind: s.kind, size: s.size, condition: setCondition(views), limitMm, tires: tiresOut };
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
        mountedSet: mounted ? mountedOf(mounted) : null,
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
