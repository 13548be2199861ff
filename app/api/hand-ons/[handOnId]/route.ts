import { cancelHandOn } from "@/db/queries/hand-on";
import { route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";

export const dynamic = "force-dynamic";

/** DELETE: the seller withdraws an open hand-on link. */
export const DELETE = route<{ handOnId: string }>(async ({ params, session }) => cancelHandOn({ access: ownerAccess(session!), handOnId: params.handOnId }));
