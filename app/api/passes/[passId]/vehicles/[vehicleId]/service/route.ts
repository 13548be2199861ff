// A service entry (with the checks taken during the work), written by the
// shop under a `view_add` pass and attributed to the shop and technician.
import { resolvePassAccess, notifyShopEntry } from "@/db/queries/passes";
import { addServiceEntry } from "@/db/queries/service";
import { created, parseJson, route } from "@/lib/api/handler";
import { SERVICE_KIND_LABELS, serviceEntrySchema } from "@/lib/validation/logbook";

export const POST = route<{ passId: string; vehicleId: string }>(async ({ req, session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  const input = await parseJson(req, serviceEntrySchema);
  const entry = await addServiceEntry({ access, vehicleId: params.vehicleId, input });
  const tires = input.checks.reduce((n, c) => n + c.readings.length, 0);
  await notifyShopEntry({
    access,
    vehicleId: params.vehicleId,
    summary: `${SERVICE_KIND_LABELS[input.kind].toLowerCase()}${tires ? ` with a tread check of ${tires} ${tires === 1 ? "tire" : "tires"}` : ""}.`,
  });
  return created({ entry });
});
