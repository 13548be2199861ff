import { buildAccountExport } from "@/db/queries/export";
import { route } from "@/lib/api/handler";
import { estimateZipBytes, exportZipStream } from "@/lib/export/zip";

export const dynamic = "force-dynamic";

/** GET: the signed-in account's whole logbook as one zip, streamed (document, CSVs, files). */
export const GET = route(async ({ session }) => {
  const { document, files } = await buildAccountExport({ userId: session!.user.id });
  const day = document.exportedAt.slice(0, 10);
  return new Response(exportZipStream({ document, files }), {
    headers: {
      "content-type": "application/zip",
      "content-disposition": `attachment; filename="fourpatch-logbook-${day}.zip"`,
      "cache-control": "no-store",
      // The zip's length is not known while it is streamed; the page shows progress against this estimate.
      "x-fourpatch-size-estimate": String(estimateZipBytes(document, files)),
    },
  });
});
