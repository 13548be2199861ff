// One tread check: changed or deleted by the vehicle's drivers (a shop uses
// /api/passes/:passId/vehicles/:vehicleId/checks/:checkId for its own).
import { deleteTreadCheck, updateTreadCheck } from "@/db/queries/checks";
import { parseJson, route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { treadCheckSchema } from "@/lib/validation/logbook";

export const PATCH = route<{ checkId: string }>(async ({ req, params, session }) => {
  const input = await parseJson(req, treadCheckSchema);
  return { check: await updateTreadCheck({ access: ownerAccess(session!), checkId: params.checkId, input }) };
});

export const DELETE = route<{ checkId: string }>(async ({ params, session }) => deleteTreadCheck({ access: ownerAccess(session!), checkId: params.checkId }));
