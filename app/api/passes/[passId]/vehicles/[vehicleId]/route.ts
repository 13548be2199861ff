// The vehicle's logbook as the shop sees it under a pass. The pass is
// checked on every request; the read lands in the driver's access log.
import { getVehicleLogbook } from "@/db/queries/logbook";
import { resolvePassAccess } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";

export const GET = route<{ passId: string; vehicleId: string }>(async ({ session, params }) => {
  const now = new Date();
  const access = await resolvePassAccess({ session, passId: params.passId, now });
  const logbook = await getVehicleLogbook({ access, vehicleId: params.vehicleId, today: todayIso(now), action: "read_logbook" });
  return { logbook, pass: { id: access.passId, scope: access.scope, endsAt: access.endsAt, shopName: access.shopName } };
});
