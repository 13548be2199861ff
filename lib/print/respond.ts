import "server-only";
import type { VehicleLogbook } from "@/db/queries/logbook";
import { printableHistory } from "./history";
import { historyPdf, type Paper } from "./pdf";

export function paperOf(req: Request): Paper {
  return new URL(req.url).searchParams.get("paper") === "letter" ? "letter" : "a4";
}

/** The PDF download of a logbook the caller was allowed to read. */
export async function pdfResponse(book: VehicleLogbook, today: string, paper: Paper): Promise<Response> {
  const bytes = await historyPdf(printableHistory(book, today), paper);
  const name = book.vehicle.nickname.replace(/[^A-Za-z0-9 _-]+/g, "").trim().replace(/\s+/g, "-").slice(0, 60) || "vehicle";
  return new Response(bytes as BodyInit, {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="tire-history-${name}.pdf"`,
      "cache-control": "no-store",
    },
  });
}
