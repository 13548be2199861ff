import { IMPORT_MAX_BYTES, importExport } from "@/db/queries/import";
import { readBodyLimited, route } from "@/lib/api/handler";
import { AppError } from "@/lib/errors";

export const dynamic = "force-dynamic";

/**
 * POST (body: the export zip, `?mode=empty|merge`): brings an export into the
 * signed-in account, as its whole logbook (empty account) or as additional vehicles.
 */
export const POST = route(async ({ req, session }) => {
  const mode = new URL(req.url).searchParams.get("mode");
  if (mode !== "empty" && mode !== "merge") throw new AppError("invalid", "Choose how to import: into an empty account, or as additional vehicles.", { mode: ["Choose empty or merge."] });
  // Read up to the limit; a longer body is refused without reading the rest.
  const tooLarge = () => new AppError("too_large", `The file is larger than ${IMPORT_MAX_BYTES / 1024 / 1024} MB, the most an import takes.`, { file: ["Too large."] });
  const bytes = await readBodyLimited(req, IMPORT_MAX_BYTES, tooLarge, "file");
  if (bytes.byteLength === 0) throw new AppError("invalid", "Choose the export's .zip file.", { file: ["Choose a file."] });
  return { imported: await importExport({ userId: session!.user.id, bytes, mode }) };
}, { body: "zip" });
