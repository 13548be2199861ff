import { redirect } from "next/navigation";
import { orNotFound } from "@/components/logbook/or-not-found";
import { PrintableHistoryView } from "@/components/print/printable-history";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { getSession } from "@/lib/auth/session";
import { viewerFormat } from "@/lib/format/server";
import { printableHistory } from "@/lib/print/history";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";

export default async function PrintHistoryPage({ params, searchParams }: { params: Promise<{ vehicleId: string }>; searchParams: Promise<{ paper?: string }> }) {
  const session = await getSession();
  const { vehicleId } = await params;
  if (!session) redirect(`/sign-in?next=/vehicles/${vehicleId}/print`);
  const paper = (await searchParams).paper === "letter" ? "letter" : "a4";
  const today = todayIso();
  const book = await getVehicleLogbook({ access: ownerAccess(session), vehicleId, today, action: "print_history" }).catch(orNotFound);
  return (
    <PrintableHistoryView
      h={printableHistory(book, today, await viewerFormat())}
      paper={paper}
      backHref={`/vehicles/${vehicleId}`}
      pdfHref={`/api/vehicles/${vehicleId}/history-pdf?paper=${paper}`}
      paperHref={(p) => `/vehicles/${vehicleId}/print?paper=${p}`}
    />
  );
}
