// Delete a service entry with its files (owner only).
import { route } from "@/lib/api/handler";
import { deleteServiceEntry } from "@/db/queries/service";
import { ownerAccess } from "@/lib/auth/logbook-access";

export const DELETE = route<{ entryId: string }>(async ({ params, session }) => deleteServiceEntry({ access: ownerAccess(session!), entryId: params.entryId }));
