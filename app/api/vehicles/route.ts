// The signed-in driver's vehicles: list (with conditions and next reminders) and add a vehicle.
import { created, parseJson, route } from "@/lib/api/handler";
import { listVehicleSummaries } from "@/db/queries/logbook";
import { createVehicle } from "@/db/queries/vehicles";
import { todayIso, vehicleSchema } from "@/lib/validation/logbook";

export const GET = route(async ({ session }) => listVehicleSummaries({ userId: session!.user.id, today: todayIso() }));

export const POST = route(async ({ req, session }) => {
  const input = await parseJson(req, vehicleSchema);
  const v = await createVehicle({ userId: session!.user.id, input });
  return created({ vehicle: v });
});
