// A service entry the shop recorded under this pass, changed or deleted while
// the pass lasts (view-and-add only); each is a row of the driver's access log.
import { resolvePassAccess } from "@/db/queries/passes";
import { deleteServiceEntry, updateServiceEntry } from "@/db/queries/service";
import { parseJson, route } from "@/lib/api/handler";
import { serviceEntryUpdateSchema } from "@/lib/validation/logbook";

type Params = { passId: string; vehicleId: string; entryId: string };

export const PATCH = route<Params>(async ({ req, session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  const input = await parseJson(req, serviceEntryUpdateSchema);
  return { entry: await updateServiceEntry({ access, vehicleId: params.vehicleId, entryId: params.entryId, input }) };
});

export const DELETE = route<Params>(async ({ session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  return deleteServiceEntry({ access, vehicleId: params.vehicleId, entryId: params.entryId });
});
