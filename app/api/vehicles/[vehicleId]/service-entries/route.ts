// Add a service entry, optionally with the tread checks taken during the work.
import { created, parseJson, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { addServiceEntry } from "@/db/queries/service";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { serviceEntrySchema, todayIso } from "@/lib/validation/logbook";

export const POST = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "add_service" });
  const input = await parseJson(req, serviceEntrySchema);
  return created(await addServiceEntry({ access, vehicleId: params.vehicleId, input, today: todayIso() }));
});
