// A set the shop fitted, with each tire's DOT code decoded as in the driver's flow.
import { notifyShopEntry, resolvePassAccess } from "@/db/queries/passes";
import { createSetWithTires } from "@/db/queries/sets";
import { created, parseJson, route } from "@/lib/api/handler";
import { setPurchaseSchema } from "@/lib/validation/logbook";

export const POST = route<{ passId: string; vehicleId: string }>(async ({ req, session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  const input = await parseJson(req, setPurchaseSchema);
  const result = await createSetWithTires({ access, vehicleId: params.vehicleId, input });
  await notifyShopEntry({ access, vehicleId: params.vehicleId, summary: `a new ${input.size} set of ${input.tires.length} tires, fitted by the shop.` });
  return created(result);
});
