// One service entry: changed, or deleted with its files, by the vehicle's
// drivers (a shop uses /api/passes/:passId/vehicles/:vehicleId/service/:entryId).
import { deleteServiceEntry, updateServiceEntry } from "@/db/queries/service";
import { parseJson, route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { serviceEntryUpdateSchema } from "@/lib/validation/logbook";

export const PATCH = route<{ entryId: string }>(async ({ req, params, session }) => {
  const input = await parseJson(req, serviceEntryUpdateSchema);
  return { entry: await updateServiceEntry({ access: ownerAccess(session!), entryId: params.entryId, input }) };
});

export const DELETE = route<{ entryId: string }>(async ({ params, session }) => deleteServiceEntry({ access: ownerAccess(session!), entryId: params.entryId }));
