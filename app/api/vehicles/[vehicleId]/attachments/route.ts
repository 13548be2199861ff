// Upload a receipt or photo (multipart, field "file"). Type from content, at most 10 MB.
import { created, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { saveAttachment } from "@/db/queries/attachments";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { AppError } from "@/lib/errors";
import { fieldErrors } from "@/lib/validation/fields";
import { ATTACHMENT_MAX_BYTES, attachmentMetaSchema } from "@/lib/validation/logbook";

// Room for the multipart boundaries and the other fields around the file.
const ENVELOPE_BYTES = 64 * 1024;

export const POST = route<{ vehicleId: string }>(async ({ req, params, session }) => {
  const access = ownerAccess(session!);
  await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "upload" });
  const length = Number(req.headers.get("content-length") ?? "0");
  // Refused before reading the body, so a huge upload costs nothing.
  if (length > ATTACHMENT_MAX_BYTES + ENVELOPE_BYTES) {
    throw new AppError("too_large", "The file is larger than 10 MB. Send a smaller photo or a scan of the receipt.", { file: ["At most 10 MB."] });
  }
  let form: FormData;
  try {
    form = await req.formData();
  } catch {
    throw new AppError("invalid", "Send the file as a multipart form with a field named file.", { file: ["Choose a file."] });
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("invalid", "Choose a file to upload.", { file: ["Choose a file."] });
  const meta = attachmentMetaSchema.safeParse(Object.fromEntries([...form.entries()].filter(([k]) => k !== "file")));
  if (!meta.success) throw new AppError("invalid", "Some fields need attention.", fieldErrors(meta.error));
  if (file.size > ATTACHMENT_MAX_BYTES) {
    throw new AppError("too_large", "The file is larger than 10 MB. Send a smaller photo or a scan of the receipt.", { file: ["At most 10 MB."] });
  }
  const bytes = new Uint8Array(await file.arrayBuffer());
  const saved = await saveAttachment({ access, vehicleId: params.vehicleId, file: { name: file.name || "upload", bytes }, meta: meta.data });
  return created({ attachment: saved });
});
