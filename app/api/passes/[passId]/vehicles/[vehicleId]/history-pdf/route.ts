// A shop under a live pass prints the tire history too; the print lands in
// the driver's access log like every other read.
import { getVehicleLogbook } from "@/db/queries/logbook";
import { resolvePassAccess } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";
import { paperOf, pdfResponse } from "@/lib/print/respond";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";

export const GET = route<{ passId: string; vehicleId: string }>(async ({ req, session, params }) => {
  const now = new Date();
  const access = await resolvePassAccess({ session, passId: params.passId, now });
  const today = todayIso(now);
  const book = await getVehicleLogbook({ access, vehicleId: params.vehicleId, today, action: "print_history" });
  return pdfResponse(book, today, paperOf(req));
});
