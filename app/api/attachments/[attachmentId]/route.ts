// Download a receipt or photo (only through the vehicle's access check), or delete it.
import { route } from "@/lib/api/handler";
import { deleteAttachment, getAttachmentForDownload } from "@/db/queries/attachments";
import { ownerAccess } from "@/lib/auth/logbook-access";

type P = { attachmentId: string };

export const GET = route<P>(async ({ params, session }) => {
  const f = await getAttachmentForDownload({ access: ownerAccess(session!), attachmentId: params.attachmentId });
  const inline = f.mimeType.startsWith("image/") || f.mimeType === "application/pdf";
  return new Response(new Uint8Array(f.bytes), {
    headers: {
      "content-type": f.mimeType,
      "content-length": String(f.bytes.byteLength),
      "content-disposition": `${inline ? "inline" : "attachment"}; filename="${f.fileName.replace(/"/g, "")}"`,
      // The type was sniffed on upload; the browser must not guess another.
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
});

export const DELETE = route<P>(async ({ params, session }) => deleteAttachment({ access: ownerAccess(session!), attachmentId: params.attachmentId }));
