// Shared set-up of the logbook's integration tests: invented vehicles and
// sets made through the real route handlers, DOT codes relative to today.
import { expect } from "vitest";
import { POST as createVehicleRoute } from "@/app/api/vehicles/route";
import { POST as createSetRoute } from "@/app/api/vehicles/[vehicleId]/sets/route";
import { addDays, dotWeekOf, formatDotDateCode } from "@/lib/tires";
import { todayIso } from "@/lib/validation/logbook";
import { ctx, request, type TestUser } from "../../support/users";

/** A 4-digit DOT date code for the week `daysAgo` days before today. */
export function dotCodeDaysAgo(daysAgo: number): string {
  const w = dotWeekOf(addDays(todayIso(), -daysAgo))!;
  return formatDotDateCode(w.week, w.year);
}

export const vehicleBody = {
  nickname: "The blue one",
  make: "Velora",
  model: "Tessel",
  year: "2019",
  placardFrontSize: "205/55 R16 91V",
  placardFrontPressure: "230",
  pressureUnit: "kpa",
  odometerUnit: "km",
};

export async function makeVehicle(as: TestUser, body: Record<string, unknown> = {}): Promise<string> {
  const res = await createVehicleRoute(request("/api/vehicles", { as, body: { ...vehicleBody, ...body } }), ctx({}));
  expect(res.status).toBe(201);
  return ((await res.json()) as { vehicle: { id: string } }).vehicle.id;
}

export const fourTires = (code: string) =>
  (["front_left", "front_right", "rear_left", "rear_right"] as const).map((position) => ({ position, dotCode: `DOT 3QXY ABC ${code}`, newDepth: "8" }));

export function purchaseBody(over: Record<string, unknown> = {}) {
  return {
    kind: "summer",
    size: "205/55 R16 91V",
    purchasedOn: addDays(todayIso(), -300),
    price: "412.50",
    currency: "EUR",
    seller: "Quillby Tread Works",
    depthUnit: "mm",
    odometer: "41000",
    odometerUnit: "km",
    mountNow: true,
    tires: fourTires(dotCodeDaysAgo(400)),
    ...over,
  };
}

export async function makeSet(as: TestUser, vehicleId: string, over: Record<string, unknown> = {}) {
  const res = await createSetRoute(request(`/api/vehicles/${vehicleId}/sets`, { as, body: purchaseBody(over) }), ctx({ vehicleId }));
  const json = (await res.json()) as { setId: string; serviceEntryId: string | null };
  expect(res.status, JSON.stringify(json)).toBe(201);
  return json;
}
