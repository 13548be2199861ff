import "server-only";
// Maps a driver's logbook rows into the plain `LogbookInput` of lib/tires,
// the one shape conditions, projections and reminders are computed from.
// Database enums are snake_case; the core's are kebab-case.
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { odometerReading, serviceEntry, tire, tireSet, treadCheck, treadReading, vehicle } from "@/db/schema";
import { driverVehicles } from "./access";
import type { LogbookInput, OdometerEntry, SetInput, SetKind, TireInput, VehicleInput } from "@/lib/tires";

type Position = TireInput["position"];

export const toCoreKind = (k: (typeof tireSet.$inferSelect)["kind"]): SetKind => k.replace("_", "-") as SetKind;
export const toCorePosition = (p: (typeof tire.$inferSelect)["position"]): Position => p.replace("_", "-") as Position;

/** The rows a logbook computation starts from; loaded once, used by the overview and the reminders alike. */
export type LogbookRows = Awaited<ReturnType<typeof loadLogbookRows>>;

/**
 * The rows of one driver's logbook (all vehicles they own or co-keep) or of the given vehicles.
 * Retired sets come without tires and readings: nothing computed from a
 * logbook looks at them. Callers authorise first: this reads whatever it is asked for.
 */
export async function loadLogbookRows(scope: { ownerId: string } | { vehicleIds: string[] }) {
  const vehicles = await db
    .select({ id: vehicle.id, nickname: vehicle.nickname })
    .from(vehicle)
    .where("ownerId" in scope ? driverVehicles(scope.ownerId) : inArray(vehicle.id, scope.vehicleIds.length ? scope.vehicleIds : ["00000000-0000-0000-0000-000000000000"]))
    .orderBy(asc(vehicle.createdAt));
  if (vehicles.length === 0) return { vehicles, sets: [], tires: [], readings: [], odometers: [], services: [] };
  const vehicleIds = vehicles.map((v) => v.id);
  const sets = await db.select().from(tireSet).where(inArray(tireSet.vehicleId, vehicleIds)).orderBy(asc(tireSet.createdAt));
  const liveSetIds = sets.filter((s) => s.state !== "retired").map((s) => s.id);
  const none = ["00000000-0000-0000-0000-000000000000"];
  const [tires, readings, odometers, services] = await Promise.all([
    db
      .select({ t: tire, vehicleId: tireSet.vehicleId })
      .from(tire)
      .innerJoin(tireSet, eq(tire.setId, tireSet.id))
      .where(inArray(tire.setId, liveSetIds.length ? liveSetIds : none)),
    db
      .select({
        checkId: treadReading.checkId,
        tireId: treadReading.tireId,
        checkedOn: treadCheck.checkedOn,
        odometerKm: treadCheck.odometerKm,
        innerMm: treadReading.innerMm,
        centreMm: treadReading.centreMm,
        outerMm: treadReading.outerMm,
        pressureKpa: treadReading.pressureKpa,
        approximate: treadReading.approximate,
      })
      .from(treadReading)
      .innerJoin(treadCheck, eq(treadReading.checkId, treadCheck.id))
      .where(and(inArray(treadCheck.vehicleId, vehicleIds), inArray(treadCheck.setId, liveSetIds.length ? liveSetIds : none)))
      .orderBy(asc(treadCheck.checkedOn)),
    db
      .select({ vehicleId: odometerReading.vehicleId, date: odometerReading.readOn, odometerKm: odometerReading.odometerKm })
      .from(odometerReading)
      .where(inArray(odometerReading.vehicleId, vehicleIds)),
    db
      .select({ setId: serviceEntry.setId, kind: serviceEntry.kind, date: serviceEntry.performedOn, odometerKm: serviceEntry.odometerKm, vehicleId: serviceEntry.vehicleId })
      .from(serviceEntry)
      .where(and(inArray(serviceEntry.vehicleId, vehicleIds), inArray(serviceEntry.kind, ["fitting", "seasonal_swap", "rotation"])))
      .orderBy(asc(serviceEntry.performedOn)),
  ]);
  return { vehicles, sets, tires, readings, odometers, services };
}

/**
 * The logbook of one driver (all vehicles) or of the given vehicles. Callers
 * authorise first: this reads whatever it is asked for.
 */
export async function loadLogbookInput(scope: { ownerId: string } | { vehicleIds: string[] }): Promise<LogbookInput> {
  return toLogbookInput(await loadLogbookRows(scope));
}

/** The core's input from loaded rows. */
export function toLogbookInput({ vehicles, sets, tires, readings, odometers, services }: LogbookRows): LogbookInput {
  if (vehicles.length === 0) return { vehicles: [] };
  const readingsByTire = new Map<string, NonNullable<TireInput["readings"]>[number][]>();
  for (const r of readings) {
    // A check without an odometer cannot place the tire on the wear line.
    if (r.odometerKm == null) continue;
    const list = readingsByTire.get(r.tireId) ?? [];
    list.push({ date: r.checkedOn, odometerKm: r.odometerKm, innerMm: r.innerMm, centreMm: r.centreMm, outerMm: r.outerMm });
    readingsByTire.set(r.tireId, list);
  }

  const odometerByVehicle = new Map<string, OdometerEntry[]>();
  const addOdo = (vehicleId: string, e: { date: string; odometerKm: number | null }) => {
    if (e.odometerKm == null) return;
    const list = odometerByVehicle.get(vehicleId) ?? [];
    list.push({ date: e.date, odometerKm: e.odometerKm });
    odometerByVehicle.set(vehicleId, list);
  };
  for (const o of odometers) addOdo(o.vehicleId, o);
  for (const s of services) addOdo(s.vehicleId, s);

  const lastOf = (setId: string, kinds: string[]) => {
    const hits = services.filter((s) => s.setId === setId && kinds.includes(s.kind) && s.odometerKm != null);
    const last = hits.at(-1);
    return last ? { date: last.date, odometerKm: last.odometerKm! } : null;
  };

  const out: VehicleInput[] = vehicles.map((v) => ({
    id: v.id,
    nickname: v.nickname,
    odometerHistory: (odometerByVehicle.get(v.id) ?? []).sort((a, b) => a.date.localeCompare(b.date)),
    sets: sets
      .filter((s) => s.vehicleId === v.id)
      .map(
        (s): SetInput => ({
          id: s.id,
          name: s.label ?? `${s.size}`,
          kind: toCoreKind(s.kind),
          state: s.state,
          depthLimitMm: s.depthLimitMm,
          ageOverrides: {
            ...(s.ageWatchYears != null ? { watchYears: s.ageWatchYears } : {}),
            ...(s.ageReplaceYears != null ? { replaceYears: s.ageReplaceYears } : {}),
          },
          mountedAt: lastOf(s.id, ["fitting", "seasonal_swap"]),
          lastRotation: lastOf(s.id, ["rotation"]),
          tires: tires
            .filter((t) => t.t.setId === s.id)
            .map((t) => ({
              id: t.t.id,
              position: toCorePosition(t.t.position),
              dotCode: t.t.dotCode,
              manufactureWeekStart: t.t.dotWeekStart,
              readings: readingsByTire.get(t.t.id) ?? [],
            })),
        }),
      ),
  }));
  return { vehicles: out };
}
