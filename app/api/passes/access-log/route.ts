// The driver's access log: every write made under the driver's passes, and
// reads counted per visit. A page at a time: `?cursor=` from `nextCursor`.
import { pageAccessLog } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";
import { pageLimit } from "@/lib/api/cursor";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { requireSession } from "@/lib/auth/roles";

export const dynamic = "force-dynamic";

export const GET = route(async ({ req, session }) => {
  const q = new URL(req.url).searchParams;
  return pageAccessLog({
    access: ownerAccess(requireSession(session)),
    vehicleId: q.get("vehicleId") ?? undefined,
    cursor: q.get("cursor"),
    limit: pageLimit(q.get("limit")),
  });
});
