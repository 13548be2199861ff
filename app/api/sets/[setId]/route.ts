// One set: its tires' ages, depths, patterns and projections; edit or delete it (owner only).
import { parseJson, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { getSetDetail, vehicleIdOfSet } from "@/db/queries/logbook";
import { deleteSet, updateSet } from "@/db/queries/sets";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { setUpdateSchema, todayIso } from "@/lib/validation/logbook";

type P = { setId: string };

export const GET = route<P>(async ({ params, session }) => getSetDetail({ access: ownerAccess(session!), setId: params.setId, today: todayIso() }));

export const PATCH = route<P>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: await vehicleIdOfSet({ setId: params.setId }), action: "update_set" });
  const input = await parseJson(req, setUpdateSchema);
  return { set: await updateSet({ access, setId: params.setId, input }) };
});

export const DELETE = route<P>(async ({ params, session }) => deleteSet({ access: ownerAccess(session!), setId: params.setId }));
