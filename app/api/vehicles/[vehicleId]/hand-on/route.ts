import { createHandOn, openHandOnOf } from "@/db/queries/hand-on";
import { created, parseJson, route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { handOnSchema } from "@/lib/validation/household";

export const dynamic = "force-dynamic";
type P = { vehicleId: string };

/** GET: the vehicle's open hand-on, if any (owner only). */
export const GET = route<P>(async ({ params, session }) => ({ open: await openHandOnOf({ access: ownerAccess(session!), vehicleId: params.vehicleId }) }));

/** POST { email?, includeReceipts, keepSnapshot }: a one-time link for the next owner (owner only); shown once. */
export const POST = route<P>(async ({ req, params, session }) => {
  const input = await parseJson(req, handOnSchema);
  return created(await createHandOn({ access: ownerAccess(session!), vehicleId: params.vehicleId, input }));
});
