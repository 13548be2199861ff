import "server-only";
// The export zip, streamed: each attachment is read from disk in chunks and
// stored as it is (photos and PDFs are compressed already), then the
// document and the CSVs are deflated. Nothing of the whole zip is ever held
// in memory at once.
import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import path from "node:path";
import { Zip, ZipDeflate, ZipPassThrough } from "fflate";
import type { ExportFile } from "@/db/queries/export";
import { DOCUMENT_NAME, type ExportDocument } from "./document";
import { toCsv } from "./csv";
import { uploadsDir } from "@/lib/uploads";

const SAFE_NAME = /^[A-Za-z0-9_-]{24}\.[a-z0-9]{2,5}$/;

export function csvFiles(doc: ExportDocument): Record<string, string> {
  const vehicleName = new Map(doc.vehicles.map((v) => [v.id, v.nickname]));
  const setName = new Map(doc.sets.map((s) => [s.id, s.label ?? s.size]));
  const tireById = new Map(doc.tires.map((t) => [t.id, t]));
  const checkById = new Map(doc.treadChecks.map((c) => [c.id, c]));
  const who = (a: ExportDocument["treadChecks"][number]["author"]) => (a.by === "account" ? doc.account.name : a.by === "shop" ? `${a.shop?.name ?? "shop"}${a.name ? ` (${a.name})` : ""}` : (a.name ?? ""));
  return {
    "csv/vehicles.csv": toCsv(doc.vehicles, [
      ["vehicle_id", (v) => v.id], ["nickname", (v) => v.nickname], ["make", (v) => v.make], ["model", (v) => v.model], ["year", (v) => v.year],
      ["vin", (v) => v.vin], ["plate", (v) => v.plate], ["placard_front_size", (v) => v.placardFrontSize], ["placard_rear_size", (v) => v.placardRearSize],
      ["placard_front_kpa", (v) => v.placardFrontKpa], ["placard_rear_kpa", (v) => v.placardRearKpa], ["odometer_unit", (v) => v.odometerUnit],
    ]),
    "csv/odometer-readings.csv": toCsv(doc.odometerReadings, [
      ["vehicle", (o) => vehicleName.get(o.vehicleId)], ["read_on", (o) => o.readOn], ["odometer_km", (o) => o.odometerKm],
    ]),
    "csv/tire-sets.csv": toCsv(doc.sets, [
      ["set_id", (s) => s.id], ["vehicle", (s) => vehicleName.get(s.vehicleId)], ["label", (s) => s.label], ["kind", (s) => s.kind], ["size", (s) => s.size],
      ["load_index", (s) => s.loadIndex], ["speed_symbol", (s) => s.speedSymbol], ["purchased_on", (s) => s.purchasedOn],
      ["price", (s) => (s.priceCents == null ? null : (s.priceCents / 100).toFixed(2))], ["currency", (s) => s.currency], ["seller", (s) => s.seller],
      ["state", (s) => s.state], ["storage_location", (s) => s.storageLocation],
    ]),
    "csv/tires.csv": toCsv(doc.tires, [
      ["set", (t) => setName.get(t.setId)], ["set_id", (t) => t.setId], ["position", (t) => t.position], ["dot_code", (t) => t.dotCode],
      ["dot_week", (t) => t.dotWeek], ["dot_year", (t) => t.dotYear], ["new_depth_mm", (t) => t.newDepthMm],
    ]),
    "csv/tread-readings.csv": toCsv(doc.treadReadings, [
      ["checked_on", (r) => checkById.get(r.checkId)?.checkedOn], ["vehicle", (r) => vehicleName.get(checkById.get(r.checkId)?.vehicleId ?? "")],
      ["set", (r) => setName.get(checkById.get(r.checkId)?.setId ?? "")], ["position", (r) => tireById.get(r.tireId)?.position],
      ["odometer_km", (r) => checkById.get(r.checkId)?.odometerKm], ["inner_mm", (r) => r.innerMm], ["centre_mm", (r) => r.centreMm], ["outer_mm", (r) => r.outerMm],
      ["pressure_kpa", (r) => r.pressureKpa], ["approximate", (r) => r.approximate], ["method", (r) => checkById.get(r.checkId)?.method],
      ["by", (r) => { const c = checkById.get(r.checkId); return c ? who(c.author) : ""; }],
    ]),
    "csv/service-entries.csv": toCsv(doc.serviceEntries, [
      ["performed_on", (s) => s.performedOn], ["vehicle", (s) => vehicleName.get(s.vehicleId)], ["set", (s) => (s.setId ? setName.get(s.setId) : null)],
      ["kind", (s) => s.kind], ["odometer_km", (s) => s.odometerKm], ["cost", (s) => (s.costCents == null ? null : (s.costCents / 100).toFixed(2))],
      ["notes", (s) => s.notes], ["by", (s) => who(s.author)],
    ]),
    "csv/attachments.csv": toCsv(doc.attachments, [
      ["vehicle", (a) => vehicleName.get(a.vehicleId)], ["kind", (a) => a.kind], ["file_name", (a) => a.fileName], ["path_in_zip", (a) => a.path],
      ["mime_type", (a) => a.mimeType], ["size_bytes", (a) => a.sizeBytes], ["sha256", (a) => a.sha256],
    ]),
    "csv/shop-passes.csv": toCsv(doc.shopPasses, [
      ["shop", (p) => p.shop.name], ["scope", (p) => p.scope], ["starts_at", (p) => p.startsAt], ["ends_at", (p) => p.endsAt], ["revoked_at", (p) => p.revokedAt],
      ["vehicles", (p) => p.vehicleIds.map((id) => vehicleName.get(id) ?? id).join("; ")],
    ]),
  };
}

const README = `This zip is a Fourpatch logbook export.

fourpatch-export.json  the whole logbook (format "fourpatch-logbook-export", version 2);
                       its JSON Schema is docs/fourpatch-export.schema.json in Fourpatch's repository.
csv/                   one CSV per kind of record, for spreadsheets.
files/                 the receipts and photos, as they were uploaded.

Import it into a Fourpatch account under Account > Bring a logbook in.
`;

/** A rough size for the progress bar: the files plus the uncompressed text. */
export function estimateZipBytes(doc: ExportDocument, files: ExportFile[]) {
  return files.reduce((n, f) => n + f.sizeBytes, 0) + Math.round(JSON.stringify(doc).length * 0.4);
}

/** The zip as a web stream; fills in each attachment's sha256 while reading it. */
export function exportZipStream({ document, files }: { document: ExportDocument; files: ExportFile[] }): ReadableStream<Uint8Array> {
  let waitForPull: (() => void) | null = null;
  return new ReadableStream<Uint8Array>({
    start(controller) {
      const zip = new Zip((err, chunk, final) => {
        if (err) {
          controller.error(err);
          return;
        }
        if (chunk.length) controller.enqueue(chunk);
        if (final) controller.close();
      });
      const backpressure = () =>
        (controller.desiredSize ?? 1) > 0 ? Promise.resolve() : new Promise<void>((resolve) => (waitForPull = resolve));
      const addText = (name: string, text: string) => {
        const entry = new ZipDeflate(name, { level: 6 });
        zip.add(entry);
        entry.push(new TextEncoder().encode(text), true);
      };
      (async () => {
        const dir = uploadsDir();
        for (const [i, f] of files.entries()) {
          if (!SAFE_NAME.test(f.storedName)) throw new Error("unexpected stored name");
          const entry = new ZipPassThrough(f.path);
          zip.add(entry);
          const hash = createHash("sha256");
          const stream = createReadStream(path.join(/*turbopackIgnore: true*/ dir, f.storedName), { highWaterMark: 256 * 1024 });
          for await (const chunk of stream as AsyncIterable<Buffer>) {
            hash.update(chunk);
            entry.push(new Uint8Array(chunk.buffer, chunk.byteOffset, chunk.byteLength));
            await backpressure();
          }
          entry.push(new Uint8Array(0), true);
          document.attachments[i].sha256 = hash.digest("hex");
        }
        addText(DOCUMENT_NAME, JSON.stringify(document, null, 2));
        for (const [name, text] of Object.entries(csvFiles(document))) addText(name, text);
        addText("README.txt", README);
        zip.end();
      })().catch((err) => controller.error(err));
    },
    pull() {
      waitForPull?.();
      waitForPull = null;
    },
  });
}
