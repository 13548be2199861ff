// Display units. The database keeps millimetres, kilometres and kilopascals;
// a driver chooses metric or imperial (and a pressure unit) in the account.
// The module itself, not the lib/tires index: the index would bring every tire rule to each page that formats a depth.
import { mmToThirtySeconds, thirtySecondsToMm } from "@/lib/tires/depth";

export type UnitSystem = "metric" | "imperial";
export type DepthUnit = "mm" | "32nds";
export type DistanceUnit = "km" | "mi";
export type PressureUnit = "kpa" | "psi" | "bar";

/** 1 mi = 1.609344 km exactly (international mile). */
export const KM_PER_MILE = 1.609344;
/** 1 psi = 6.894757293168 kPa (pound-force per square inch, exact from the pound and inch). */
export const KPA_PER_PSI = 6.894757293168;
export const KPA_PER_BAR = 100;

export const depthUnitFor = (u: UnitSystem): DepthUnit => (u === "imperial" ? "32nds" : "mm");
export const distanceUnitFor = (u: UnitSystem): DistanceUnit => (u === "imperial" ? "mi" : "km");

export function depthToMm(value: number, unit: DepthUnit): number {
  return unit === "32nds" ? thirtySecondsToMm(value) : value;
}
export function mmToDepth(mm: number, unit: DepthUnit): number {
  return unit === "32nds" ? mmToThirtySeconds(mm) : mm;
}
export function distanceToKm(value: number, unit: DistanceUnit): number {
  return unit === "mi" ? value * KM_PER_MILE : value;
}
export function kmToDistance(km: number, unit: DistanceUnit): number {
  return unit === "mi" ? km / KM_PER_MILE : km;
}
export function pressureToKpa(value: number, unit: PressureUnit): number {
  if (unit === "psi") return value * KPA_PER_PSI;
  if (unit === "bar") return value * KPA_PER_BAR;
  return value;
}
export function kpaToPressure(kpa: number, unit: PressureUnit): number {
  if (unit === "psi") return kpa / KPA_PER_PSI;
  if (unit === "bar") return kpa / KPA_PER_BAR;
  return kpa;
}

// Text for these values comes from lib/format (Intl, the viewer's locale).
export const depthUnitLabel = (u: DepthUnit) => (u === "32nds" ? "32nds of an inch" : "mm");
export const pressureUnitLabel = (u: PressureUnit) => ({ kpa: "kPa", psi: "psi", bar: "bar" })[u];
