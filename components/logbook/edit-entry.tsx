"use client";
// Changing a saved tread check or service entry with the same forms that
// record new ones: the stored values (mm, km, kPa, cents) turned back into
// what the forms take, in the reader's units. The driver's page and the
// technician's view under a pass both use it; only the address differs.
import type { CheckView, ServiceView, SetView } from "@/db/queries/logbook";
import { COIN_RESULTS, coinDepth } from "@/lib/tires/coin";
import { kmToDistance, kpaToPressure, mmToDepth, type DepthUnit, type PressureUnit } from "@/lib/units";
import { CheckForm, type CheckFormValues, type CheckSetChoice } from "./check-form";
import { ServiceEntryForm, type ServiceFormValues } from "./service-entry-form";
import { setTitle } from "./format";

/** A number as a form field shows it: at most two decimals, no trailing zeros. */
const field = (n: number | null | undefined) => (n == null ? "" : String(Math.round(n * 100) / 100));

export function checkFormValues(check: CheckView, units: { depthUnit: DepthUnit; pressureUnit: PressureUnit; odometerUnit: "km" | "mi" }): CheckFormValues {
  const depth = (mm: number | null) => (mm == null ? "" : field(mmToDepth(mm, units.depthUnit)));
  // A coin reading is stored as its bracket's lower edge: find the bracket again.
  const coinOf = (mm: number | null) => COIN_RESULTS.find((c) => { const d = coinDepth(c); return d.ok && mm != null && Math.abs(d.depthMm - mm) < 0.01; }) ?? "";
  return {
    setId: check.setId,
    checkedOn: check.checkedOn,
    odometer: check.odometerKm == null ? "" : field(kmToDistance(check.odometerKm, units.odometerUnit)),
    odometerUnit: units.odometerUnit,
    confirmLowerOdometer: false,
    confirmUnusualDepth: false,
    method: check.method,
    depthUnit: units.depthUnit,
    pressureUnit: units.pressureUnit,
    notes: check.notes ?? "",
    readings: check.readings.map((r) => ({
      tireId: r.tireId,
      inner: check.method === "coin" ? "" : depth(r.innerMm),
      centre: check.method === "coin" ? "" : depth(r.centreMm),
      outer: check.method === "coin" ? "" : depth(r.outerMm),
      coin: check.method === "coin" ? coinOf(r.centreMm) : "",
      pressure: r.pressureKpa == null ? "" : field(kpaToPressure(r.pressureKpa, units.pressureUnit)),
    })),
  };
}

export function serviceFormValues(entry: ServiceView, odometerUnit: "km" | "mi"): ServiceFormValues {
  return {
    kind: entry.kind,
    setId: entry.setId ?? "",
    performedOn: entry.performedOn,
    odometer: entry.odometerKm == null ? "" : field(kmToDistance(entry.odometerKm, odometerUnit)),
    odometerUnit,
    confirmLowerOdometer: false,
    cost: entry.costCents == null ? "" : field(entry.costCents / 100),
    notes: entry.notes ?? "",
  };
}

/** The sets a check may be moved between: the live ones, and its own even when retired. */
export function checkSetChoices(sets: SetView[], keep?: string): CheckSetChoice[] {
  return sets
    .filter((s) => s.state !== "retired" || s.id === keep)
    .map((s) => ({ id: s.id, label: s.label, kind: s.kind, size: s.size, state: s.state, tires: s.tires.map((t) => ({ id: t.id, position: t.position })) }));
}

type Common = {
  vehicle: { id: string; nickname: string; odometerUnit: "km" | "mi" };
  sets: SetView[];
  depthUnit: DepthUnit;
  pressureUnit: PressureUnit;
  onDone: () => void;
};

export function EditCheck({ check, url, ...c }: Common & { check: CheckView; url: string }) {
  return (
    <CheckForm
      vehicle={c.vehicle}
      sets={checkSetChoices(c.sets, check.setId)}
      lastOdometer={null}
      depthUnit={c.depthUnit}
      pressureUnit={c.pressureUnit}
      edit={{ url, values: checkFormValues(check, { depthUnit: c.depthUnit, pressureUnit: c.pressureUnit, odometerUnit: c.vehicle.odometerUnit }), onDone: c.onDone, onCancel: c.onDone }}
    />
  );
}

export function EditServiceEntry({ entry, url, ...c }: Common & { entry: ServiceView; url: string }) {
  return (
    <ServiceEntryForm
      vehicleId={c.vehicle.id}
      sets={c.sets.filter((s) => s.state !== "retired" || s.id === entry.setId).map((s) => ({ id: s.id, name: setTitle(s) }))}
      odometerUnit={c.vehicle.odometerUnit}
      edit={{ url, values: serviceFormValues(entry, c.vehicle.odometerUnit), onDone: c.onDone, onCancel: c.onDone }}
    />
  );
}
