import "server-only";
// Tire sets: a purchase (the set, its tires, what becomes of the set it
// replaces and the fitting entry, in one transaction), seasonal swaps,
// edits and deletion.
import { and, eq, inArray, ne, sql } from "drizzle-orm";
import { db } from "@/db";
import { attachment, serviceEntry, tire, tireSet, treadCheck, treadReading } from "@/db/schema";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { AppError, notFound } from "@/lib/errors";
import { decodeDotCode, parseTireSize } from "@/lib/tires";
import { removeStoredFile } from "@/lib/uploads";
import { depthToMm } from "@/lib/units";
import { odometerKmOf, SET_KIND_LABELS, todayIso, type SetPurchaseInput, type SetUpdateInput, type SwapInput, type TireUpdateInput } from "@/lib/validation/logbook";
import { assertVehicleAccess } from "./access";
import { vehicleIdOfSet } from "./logbook";
import { authorship, guardOdometer, requireOwner } from "./logbook-writes";

const setName = (s: { label: string | null; kind: keyof typeof SET_KIND_LABELS }) => s.label ?? `${SET_KIND_LABELS[s.kind].toLowerCase()} set`;

export async function createSetWithTires({
  access,
  vehicleId,
  input,
  today = todayIso(),
}: {
  access: LogbookAccess;
  vehicleId: string;
  input: SetPurchaseInput;
  today?: string;
}): Promise<{ setId: string; serviceEntryId: string | null; replaced: { id: string; fate: "stored" | "retired" }[] }> {
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "add_set", detail: `${input.size} (${input.tires.length} tires)` }, tx);
    const odometerKm = odometerKmOf(input);
    await guardOdometer(tx, { vehicleId, km: odometerKm, confirmed: input.confirmLowerOdometer });

    const replaced: { id: string; fate: "stored" | "retired" }[] = [];
    if (input.mountNow) {
      const onCar = await tx
        .select({ id: tireSet.id, label: tireSet.label, kind: tireSet.kind })
        .from(tireSet)
        .where(and(eq(tireSet.vehicleId, vehicleId), eq(tireSet.state, "mounted")));
      if (onCar.length > 0 && !input.replacedFate) {
        throw new AppError("invalid", "Say what becomes of the set on the car now.", {
          replacedFate: ["Choose whether the set coming off is stored or retired."],
        });
      }
      for (const old of onCar) {
        await tx
          .update(tireSet)
          .set({
            state: input.replacedFate!,
            storageLocation: input.replacedFate === "stored" ? (input.replacedStorage ?? null) : null,
            updatedAt: new Date(),
          })
          .where(and(eq(tireSet.id, old.id), eq(tireSet.vehicleId, vehicleId)));
        replaced.push({ id: old.id, fate: input.replacedFate! });
      }
    }

    const parsed = parseTireSize(input.size);
    const size = parsed.ok ? parsed.size : null;
    const [set] = await tx
      .insert(tireSet)
      .values({
        vehicleId,
        label: input.label ?? null,
        kind: input.kind,
        size: input.size.trim(),
        loadIndex: size?.loadIndex ?? null,
        speedSymbol: size?.speedSymbol ?? null,
        purchasedOn: input.purchasedOn ?? null,
        priceCents: input.price !== undefined ? Math.round(input.price * 100) : null,
        currency: input.currency,
        seller: input.seller ?? null,
        state: input.mountNow ? "mounted" : "stored",
        storageLocation: input.mountNow ? null : (input.storageLocation ?? null),
        fittedByShopId: access.kind === "pass" ? access.shopId : null,
      })
      .returning({ id: tireSet.id });

    await tx.insert(tire).values(
      input.tires.map((t) => {
        const d = t.dotCode ? decodeDotCode(t.dotCode, { today }) : null;
        // The schema refused undecodable codes; a code that fails here (a clock edge) is kept as typed.
        return {
          setId: set.id,
          position: t.position,
          dotCode: t.dotCode ?? null,
          dotWeek: d?.ok ? d.week : null,
          dotYear: d?.ok ? d.year : null,
          dotWeekStart: d?.ok ? d.weekStart : null,
          dotPrecision: d?.ok ? d.precision : null,
          newDepthMm: t.newDepth !== undefined ? depthToMm(t.newDepth, input.depthUnit) : null,
        };
      }),
    );

    let serviceEntryId: string | null = null;
    if (input.mountNow) {
      const fate = replaced.length
        ? input.replacedFate === "stored"
          ? ` The set that came off is stored at ${input.replacedStorage}.`
          : " The set that came off is retired."
        : "";
      const [entry] = await tx
        .insert(serviceEntry)
        .values({
          vehicleId,
          setId: set.id,
          kind: "fitting",
          performedOn: input.purchasedOn ?? today,
          odometerKm,
          costCents: input.price !== undefined ? Math.round(input.price * 100) : null,
          notes: `New ${SET_KIND_LABELS[input.kind].toLowerCase()} set ${input.size.trim()} fitted${input.seller ? `, bought from ${input.seller}` : ""}.${fate}`,
          ...authorship(access),
        })
        .returning({ id: serviceEntry.id });
      serviceEntryId = entry.id;
    }
    return { setId: set.id, serviceEntryId, replaced };
  });
}

/** Seasonal swap: the chosen set goes on the car, the one on it goes into storage, and a swap entry is written. */
export async function swapSet({ access, vehicleId, input, today = todayIso() }: { access: LogbookAccess; vehicleId: string; input: SwapInput; today?: string }) {
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "swap_set" }, tx);
    const [target] = await tx.select().from(tireSet).where(and(eq(tireSet.id, input.setId), eq(tireSet.vehicleId, vehicleId))).limit(1);
    if (!target) throw notFound("That set");
    if (target.state === "mounted") throw new AppError("conflict", "This set is already on the car.", { setId: ["Already on the car."] });
    if (target.state === "retired") throw new AppError("conflict", "A retired set cannot go back on the car.", { setId: ["This set is retired."] });
    const odometerKm = odometerKmOf(input);
    await guardOdometer(tx, { vehicleId, km: odometerKm, confirmed: input.confirmLowerOdometer });
    const off = await tx.select().from(tireSet).where(and(eq(tireSet.vehicleId, vehicleId), eq(tireSet.state, "mounted"), ne(tireSet.id, target.id)));
    for (const o of off) {
      await tx.update(tireSet).set({ state: "stored", storageLocation: input.storageLocation, updatedAt: new Date() }).where(eq(tireSet.id, o.id));
    }
    await tx.update(tireSet).set({ state: "mounted", storageLocation: null, updatedAt: new Date() }).where(eq(tireSet.id, target.id));
    const offText = off.length ? `; ${off.map(setName).join(", ")} stored at ${input.storageLocation}` : "";
    const [entry] = await tx
      .insert(serviceEntry)
      .values({
        vehicleId,
        setId: target.id,
        kind: "seasonal_swap",
        performedOn: input.date ?? today,
        odometerKm,
        notes: `${setName(target)} on the car${offText}.`,
        ...authorship(access),
      })
      .returning({ id: serviceEntry.id });
    return { serviceEntryId: entry.id, stored: off.map((o) => o.id) };
  });
}

export async function updateSet({ access, setId, input }: { access: LogbookAccess; setId: string; input: SetUpdateInput }) {
  requireOwner(access, "change a set");
  const vehicleId = await vehicleIdOfSet({ setId });
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "update_set" }, tx);
    const [row] = await tx
      .update(tireSet)
      .set({
        label: input.label ?? null,
        seller: input.seller ?? null,
        storageLocation: input.storageLocation ?? null,
        depthLimitMm: input.depthLimitMm ?? null,
        ageWatchYears: input.ageWatchYears ?? null,
        ageReplaceYears: input.ageReplaceYears ?? null,
        ...(input.retire ? { state: "retired" as const } : {}),
        updatedAt: new Date(),
      })
      .where(and(eq(tireSet.id, setId), eq(tireSet.vehicleId, vehicleId)))
      .returning();
    return row;
  });
}

/**
 * A tire's DOT code and position, corrected later. Moving a tire to a
 * position another tire of the set holds swaps the two, as a rotation does.
 */
export async function updateTire({ access, tireId, input, today = todayIso() }: { access: LogbookAccess; tireId: string; input: TireUpdateInput; today?: string }) {
  requireOwner(access, "change a tire");
  if (!/^[0-9a-f-]{36}$/i.test(tireId)) throw notFound("That tire");
  const [found] = await db.select({ setId: tire.setId }).from(tire).where(eq(tire.id, tireId)).limit(1);
  if (!found) throw notFound("That tire");
  const vehicleId = await vehicleIdOfSet({ setId: found.setId });
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "update_set" }, tx);
    const [current] = await tx.select().from(tire).where(eq(tire.id, tireId)).limit(1);
    if (!current) throw notFound("That tire");
    if (input.position !== current.position) {
      await tx
        .update(tire)
        .set({ position: current.position })
        .where(and(eq(tire.setId, current.setId), eq(tire.position, input.position), ne(tire.id, tireId)));
    }
    const d = input.dotCode ? decodeDotCode(input.dotCode, { today }) : null;
    const [row] = await tx
      .update(tire)
      .set({
        position: input.position,
        dotCode: input.dotCode ?? null,
        dotWeek: d?.ok ? d.week : null,
        dotYear: d?.ok ? d.year : null,
        dotWeekStart: d?.ok ? d.weekStart : null,
        dotPrecision: d?.ok ? d.precision : null,
      })
      .where(and(eq(tire.id, tireId), eq(tire.setId, current.setId)))
      .returning({ id: tire.id, position: tire.position, dotCode: tire.dotCode });
    return row;
  });
}

/**
 * Deletes one tire (a tire taken out of a set, or logged by mistake) with
 * its readings, in one transaction; a check that measured only this tire is
 * left with nothing and goes too. The set, its other tires and the service
 * history stay. Drivers of the vehicle only, like the tire's other changes.
 */
export async function deleteTire({ access, tireId }: { access: LogbookAccess; tireId: string }) {
  requireOwner(access, "delete a tire");
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(tireId)) throw notFound("That tire");
  const [found] = await db.select({ setId: tire.setId }).from(tire).where(eq(tire.id, tireId)).limit(1);
  if (!found) throw notFound("That tire");
  const vehicleId = await vehicleIdOfSet({ setId: found.setId });
  return db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "delete_tire" }, tx);
    const touched = await tx.select({ checkId: treadReading.checkId }).from(treadReading).where(eq(treadReading.tireId, tireId));
    const [gone] = await tx.delete(tire).where(and(eq(tire.id, tireId), eq(tire.setId, found.setId))).returning({ id: tire.id });
    if (!gone) throw notFound("That tire");
    const checkIds = [...new Set(touched.map((t) => t.checkId))];
    const emptied = checkIds.length
      ? await tx
          .delete(treadCheck)
          .where(and(inArray(treadCheck.id, checkIds), sql`not exists (select 1 from ${treadReading} where ${treadReading.checkId} = ${treadCheck.id})`))
          .returning({ id: treadCheck.id })
      : [];
    return { deleted: true, readings: touched.length, checksRemoved: emptied.length };
  });
}

export async function deleteSet({ access, setId }: { access: LogbookAccess; setId: string }) {
  requireOwner(access, "delete a set");
  const vehicleId = await vehicleIdOfSet({ setId });
  const files = await db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, action: "delete_set" }, tx);
    const files = await tx.select({ storedName: attachment.storedName }).from(attachment).where(eq(attachment.setId, setId));
    await tx.delete(tireSet).where(and(eq(tireSet.id, setId), eq(tireSet.vehicleId, vehicleId)));
    return files;
  });
  await Promise.all(files.map((f) => removeStoredFile(f.storedName)));
  return { deleted: true };
}
