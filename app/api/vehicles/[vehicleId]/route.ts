// One vehicle's whole logbook; change or delete the vehicle (owner only).
import { keptJsonResponse, parseJson, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { deleteVehicle, updateVehicle } from "@/db/queries/vehicles";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { todayIso, vehicleUpdateSchema } from "@/lib/validation/logbook";

type P = { vehicleId: string };

export const GET = route<P>(async ({ params, session }) =>
  keptJsonResponse(await getVehicleLogbook({ access: ownerAccess(session!), vehicleId: params.vehicleId, today: todayIso() })),
);

export const PATCH = route<P>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  // The access check comes before the body is judged, so a stranger's request is a 404 whatever it holds.
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "update_vehicle" });
  const input = await parseJson(req, vehicleUpdateSchema);
  return { vehicle: await updateVehicle({ access, vehicleId: params.vehicleId, input }) };
});

export const DELETE = route<P>(async ({ params, session }) => deleteVehicle({ access: ownerAccess(session!), vehicleId: params.vehicleId }));
