// Log a set purchase: the set, its tires, the fate of the set it replaces and the fitting entry, in one transaction.
import { created, parseJson, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { createSetWithTires } from "@/db/queries/sets";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { setPurchaseSchema, todayIso } from "@/lib/validation/logbook";

export const POST = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "add_set" });
  const input = await parseJson(req, setPurchaseSchema);
  return created(await createSetWithTires({ access, vehicleId: params.vehicleId, input, today: todayIso() }));
});
