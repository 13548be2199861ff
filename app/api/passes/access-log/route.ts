// The driver's access log: every read and write made under the driver's passes.
import { listAccessLog } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { requireSession } from "@/lib/auth/roles";

export const dynamic = "force-dynamic";

export const GET = route(async ({ req, session }) => {
  const vehicleId = new URL(req.url).searchParams.get("vehicleId") ?? undefined;
  return { entries: await listAccessLog({ access: ownerAccess(requireSession(session)), vehicleId }) };
});
