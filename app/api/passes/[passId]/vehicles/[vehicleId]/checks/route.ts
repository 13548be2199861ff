// A tread check taken by the shop under a `view_add` pass.
import { addTreadCheck } from "@/db/queries/checks";
import { notifyShopEntry, resolvePassAccess } from "@/db/queries/passes";
import { created, parseJson, route } from "@/lib/api/handler";
import { treadCheckSchema } from "@/lib/validation/logbook";

export const POST = route<{ passId: string; vehicleId: string }>(async ({ req, session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  const input = await parseJson(req, treadCheckSchema);
  const check = await addTreadCheck({ access, vehicleId: params.vehicleId, input });
  const n = input.readings.length;
  await notifyShopEntry({ access, vehicleId: params.vehicleId, summary: `a tread check of ${n} ${n === 1 ? "tire" : "tires"}.` });
  return created({ check });
});
