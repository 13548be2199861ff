import { notFound } from "next/navigation";
import { PassClosed } from "@/components/passes/pass-closed";
import { PrintableHistoryView } from "@/components/print/printable-history";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { resolvePassAccess } from "@/db/queries/passes";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { viewerFormat } from "@/lib/format/server";
import { printableHistory } from "@/lib/print/history";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";

// The printable history for a shop under a live pass; the read lands in the driver's access log.
export default async function ShopPrintPage({ params, searchParams }: { params: Promise<{ passId: string; vehicleId: string }>; searchParams: Promise<{ paper?: string }> }) {
  const { passId, vehicleId } = await params;
  const paper = (await searchParams).paper === "letter" ? "letter" : "a4";
  const now = new Date();
  const today = todayIso(now);
  let book;
  try {
    const access = await resolvePassAccess({ session: await getSession(), passId, now });
    book = await getVehicleLogbook({ access, vehicleId, today, action: "print_history" });
  } catch (err) {
    if (err instanceof AppError && err.code === "pass_ended") return <PassClosed message={err.message} />;
    if (err instanceof AppError && (err.code === "not_found" || err.code === "unauthenticated")) notFound();
    throw err;
  }
  const base = `/shop/passes/${passId}/${vehicleId}`;
  return (
    <PrintableHistoryView
      h={printableHistory(book, today, await viewerFormat())}
      paper={paper}
      backHref={base}
      pdfHref={`/api/passes/${passId}/vehicles/${vehicleId}/history-pdf?paper=${paper}`}
      paperHref={(p) => `${base}/print?paper=${p}`}
    />
  );
}
