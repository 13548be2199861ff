import { endKeeper } from "@/db/queries/keepers";
import { route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";

export const dynamic = "force-dynamic";

/** DELETE: ends a co-keeper arrangement (the owner, or the co-keeper themselves) or withdraws an invitation (the owner). */
export const DELETE = route<{ keeperId: string }>(async ({ params, session }) => endKeeper({ access: ownerAccess(session!), keeperId: params.keeperId }));
