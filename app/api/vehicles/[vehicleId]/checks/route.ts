// Record a tread check of one set.
import { created, parseJson, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { addTreadCheck } from "@/db/queries/checks";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { todayIso, treadCheckSchema } from "@/lib/validation/logbook";

export const POST = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "add_check" });
  const input = await parseJson(req, treadCheckSchema);
  return created(await addTreadCheck({ access, vehicleId: params.vehicleId, input, today: todayIso() }));
});
