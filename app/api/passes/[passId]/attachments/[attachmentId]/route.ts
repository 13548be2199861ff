// A receipt or photo of the logbook, opened by the shop under a pass.
import { getAttachmentForDownload } from "@/db/queries/attachments";
import { resolvePassAccess } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";

export const dynamic = "force-dynamic";

export const GET = route<{ passId: string; attachmentId: string }>(async ({ session, params }) => {
  const access = await resolvePassAccess({ session, passId: params.passId, now: new Date() });
  const file = await getAttachmentForDownload({ access, attachmentId: params.attachmentId });
  return new Response(new Uint8Array(file.bytes), {
    headers: {
      "content-type": file.mimeType,
      "content-disposition": `inline; filename="${encodeURIComponent(file.fileName)}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
