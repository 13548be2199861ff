// Upload a receipt or photo (multipart, field "file"). Type from content, at
// most 10 MB. The body is read as a stream and cut off at the limit, so a
// huge or chunked upload never sits whole in memory.
import { created, readBodyLimited, route } from "@/lib/api/handler";
import { assertVehicleAccess } from "@/db/queries/access";
import { saveAttachment } from "@/db/queries/attachments";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { AppError } from "@/lib/errors";
import { LIMITS } from "@/lib/rate-limit";
import { fieldErrors } from "@/lib/validation/fields";
import { findHostileText, HOSTILE_TEXT_MESSAGE } from "@/lib/validation/text";
import { ATTACHMENT_MAX_BYTES, attachmentMetaSchema } from "@/lib/validation/logbook";

// Room for the multipart boundaries and the other fields around the file.
const ENVELOPE_BYTES = 64 * 1024;
const tooLarge = () => new AppError("too_large", "The file is larger than 10 MB. Send a smaller photo or a scan of the receipt.", { file: ["At most 10 MB."] });

export const POST = route<{ vehicleId: string }>(
  async ({ req, params, session }) => {
    const access = ownerAccess(session!);
    await assertVehicleAccess(access, { vehicleId: params.vehicleId, action: "upload" });
    const bytes = await readBodyLimited(req, ATTACHMENT_MAX_BYTES + ENVELOPE_BYTES, tooLarge, "file");
    let form: FormData;
    try {
      form = await new Response(bytes as BodyInit, { headers: { "content-type": req.headers.get("content-type") ?? "" } }).formData();
    } catch {
      throw new AppError("invalid", "Send the file as a multipart form with a field named file.", { file: ["Choose a file."] });
    }
    const file = form.get("file");
    if (!(file instanceof File)) throw new AppError("invalid", "Choose a file to upload.", { file: ["Choose a file."] });
    const fields = Object.fromEntries([...form.entries()].filter(([k]) => k !== "file"));
    const hostile = findHostileText(fields);
    if (hostile !== null) throw new AppError("invalid", "Some fields hold characters that are not allowed.", { [hostile]: [HOSTILE_TEXT_MESSAGE] });
    const meta = attachmentMetaSchema.safeParse(fields);
    if (!meta.success) throw new AppError("invalid", "Some fields need attention.", fieldErrors(meta.error));
    if (file.size > ATTACHMENT_MAX_BYTES) throw tooLarge();
    const fileBytes = new Uint8Array(await file.arrayBuffer());
    const saved = await saveAttachment({ access, vehicleId: params.vehicleId, file: { name: file.name || "upload", bytes: fileBytes }, meta: meta.data });
    return created({ attachment: saved });
  },
  { body: "multipart", rateLimit: { ...LIMITS.upload, by: "user" } },
);
