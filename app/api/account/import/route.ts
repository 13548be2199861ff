import { IMPORT_MAX_BYTES, importExport } from "@/db/queries/import";
import { route } from "@/lib/api/handler";
import { AppError } from "@/lib/errors";

export const dynamic = "force-dynamic";

/** Reads the body up to the limit; a longer body is refused without reading the rest. */
async function readCapped(req: Request, max: number): Promise<Uint8Array> {
  const declared = Number(req.headers.get("content-length") ?? "0");
  const tooLarge = () => new AppError("too_large", `The file is larger than ${max / 1024 / 1024} MB, the most an import takes.`, { file: ["Too large."] });
  if (declared > max) throw tooLarge();
  if (!req.body) throw new AppError("invalid", "Choose the export's .zip file.", { file: ["Choose a file."] });
  const reader = req.body.getReader();
  const parts: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > max) {
      await reader.cancel();
      throw tooLarge();
    }
    parts.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.byteLength;
  }
  return out;
}

/**
 * POST (body: the export zip, `?mode=empty|merge`): brings an export into the
 * signed-in account, as its whole logbook (empty account) or as additional vehicles.
 */
export const POST = route(async ({ req, session }) => {
  const mode = new URL(req.url).searchParams.get("mode");
  if (mode !== "empty" && mode !== "merge") throw new AppError("invalid", "Choose how to import: into an empty account, or as additional vehicles.", { mode: ["Choose empty or merge."] });
  const bytes = await readCapped(req, IMPORT_MAX_BYTES);
  if (bytes.byteLength === 0) throw new AppError("invalid", "Choose the export's .zip file.", { file: ["Choose a file."] });
  return { imported: await importExport({ userId: session!.user.id, bytes, mode }) };
}, { body: "zip" });
