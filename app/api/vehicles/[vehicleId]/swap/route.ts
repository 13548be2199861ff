// Seasonal swap: put a stored set on the car and store the one coming off.
import { parseJson, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { swapSet } from "@/db/queries/sets";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { swapSchema, todayIso } from "@/lib/validation/logbook";

export const POST = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "swap_set" });
  const input = await parseJson(req, swapSchema);
  return swapSet({ access, vehicleId: params.vehicleId, input, today: todayIso() });
});
