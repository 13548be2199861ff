// A tread check the shop recorded under this pass, changed or deleted while
// the pass lasts (view-and-add only); each is a row of the driver's access log.
import { deleteTreadCheck, updateTreadCheck } from "@/db/queries/checks";
import { resolvePassAccess } from "@/db/queries/passes";
import { parseJson, route } from "@/lib/api/handler";
import { treadCheckSchema } from "@/lib/validation/logbook";

type Params = { passId: string; vehicleId: string; checkId: string };

export const PATCH = route<Params>(async ({ req, session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  const input = await parseJson(req, treadCheckSchema);
  return { check: await updateTreadCheck({ access, vehicleId: params.vehicleId, checkId: params.checkId, input }) };
});

export const DELETE = route<Params>(async ({ session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  return deleteTreadCheck({ access, vehicleId: params.vehicleId, checkId: params.checkId });
});
