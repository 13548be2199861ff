// One tire: its DOT code and position corrected, or the tire deleted with its
// readings, by the vehicle's owner.
import { deleteTire, updateTire } from "@/db/queries/sets";
import { parseJson, route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { tireUpdateSchema } from "@/lib/validation/logbook";

export const PATCH = route<{ tireId: string }>(async ({ req, params, session }) => {
  const input = await parseJson(req, tireUpdateSchema);
  return { tire: await updateTire({ access: ownerAccess(session!), tireId: params.tireId, input }) };
});

export const DELETE = route<{ tireId: string }>(async ({ params, session }) => deleteTire({ access: ownerAccess(session!), tireId: params.tireId }));
