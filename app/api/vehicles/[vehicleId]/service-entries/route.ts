// Add a service entry, optionally with the tread checks taken during the work;
// read the vehicle's service entries a page at a time.
import { created, parseJson, route } from "@/lib/api/handler";
import { pageLimit } from "@/lib/api/cursor";
import { assertVehicleAccess } from "@/db/queries/access";
import { pageService } from "@/db/queries/logbook";
import { addServiceEntry } from "@/db/queries/service";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { serviceEntrySchema, todayIso } from "@/lib/validation/logbook";

export const POST = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "add_service" });
  const input = await parseJson(req, serviceEntrySchema);
  return created(await addServiceEntry({ access, vehicleId: params.vehicleId, input, today: todayIso() }));
});

/** Newest first: `?cursor=` from the logbook's `serviceNextCursor` or a page's `nextCursor`. */
export const GET = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  const role = await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "read_service" });
  const q = new URL(req.url).searchParams;
  return pageService({ vehicleId: params.vehicleId, cursor: q.get("cursor"), limit: pageLimit(q.get("limit")), viewer: { userId: access.userId, role } });
});
