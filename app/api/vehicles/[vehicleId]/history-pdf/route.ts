import { getVehicleLogbook } from "@/db/queries/logbook";
import { route } from "@/lib/api/handler";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { paperOf, pdfResponse } from "@/lib/print/respond";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";

/** GET (?paper=a4|letter): the vehicle's tire history as a PDF, for its owner and co-keepers. */
export const GET = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const today = todayIso();
  const book = await getVehicleLogbook({ access: ownerAccess(session!), vehicleId: params.vehicleId, today, action: "print_history" });
  return pdfResponse(book, today, paperOf(req));
});
