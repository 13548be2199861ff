import { inviteKeeper, listKeepers } from "@/db/queries/keepers";
import { created, parseJson, route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { inviteKeeperSchema } from "@/lib/validation/household";

export const dynamic = "force-dynamic";
type P = { vehicleId: string };

/** GET: the vehicle's co-keepers (owner and co-keepers). */
export const GET = route<P>(async ({ params, session }) => listKeepers({ access: ownerAccess(session!), vehicleId: params.vehicleId }));

/** POST { email }: the owner invites a co-keeper; the link is e-mailed. */
export const POST = route<P>(async ({ req, params, session }) => {
  const { email } = await parseJson(req, inviteKeeperSchema);
  const r = await inviteKeeper({ access: ownerAccess(session!), vehicleId: params.vehicleId, email });
  return created({ id: r.id, emailed: r.emailed });
});

