// Delete a tread check (owner only).
import { route } from "@/lib/api/handler";
import { deleteTreadCheck } from "@/db/queries/checks";
import { ownerAccess } from "@/lib/auth/logbook-access";

export const DELETE = route<{ checkId: string }>(async ({ params, session }) => deleteTreadCheck({ access: ownerAccess(session!), checkId: params.checkId }));
