// Record a tread check of one set; read the vehicle's checks a page at a time.
import { created, parseJson, route } from "@/lib/api/handler";
import { pageLimit } from "@/lib/api/cursor";
import { AppError } from "@/lib/errors";
import { assertVehicleAccess } from "@/db/queries/access";
import { addTreadCheck } from "@/db/queries/checks";
import { pageChecks } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { todayIso, treadCheckSchema } from "@/lib/validation/logbook";

export const POST = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "add_check" });
  const input = await parseJson(req, treadCheckSchema);
  return created(await addTreadCheck({ access, vehicleId: params.vehicleId, input, today: todayIso() }));
});

/** Newest first, with their readings: `?cursor=` from the logbook's `checksNextCursor` or a page's `nextCursor`. */
export const GET = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  const role = await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "read_checks" });
  const q = new URL(req.url).searchParams;
  const setId = q.get("setId") ?? undefined;
  if (setId !== undefined && !/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(setId)) {
    throw new AppError("invalid", "That is not a set of this vehicle.", { setId: ["Not a set id."] });
  }
  return pageChecks({ vehicleId: params.vehicleId, setId, cursor: q.get("cursor"), limit: pageLimit(q.get("limit")), viewer: { userId: access.userId, role } });
});
