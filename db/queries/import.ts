import "server-only";
// Bringing an export zip into an account. Everything is checked before
// anything is written: the zip, the document's format and version, every
// field (the export's zod schema), every reference inside the document, and
// every file against its size, checksum and real type. Then one transaction
// writes all rows under new ids, and the files move into the uploads folder
// only after it committed.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import fs from "node:fs/promises";
import path from "node:path";
import { count, eq, inArray } from "drizzle-orm";
import { unzipSync } from "fflate";
import { db, type Transaction } from "@/db";
import {
  attachment,
  driverProfile,
  member,
  odometerReading,
  organization,
  serviceEntry,
  tire,
  tireSet,
  treadCheck,
  treadReading,
  user,
  vehicle,
} from "@/db/schema";
import { AppError } from "@/lib/errors";
import { DOCUMENT_NAME, EXPORT_FORMAT, EXPORT_VERSION, exportDocument, type ExportDocument } from "@/lib/export/document";
import { checkUpload, uploadsDir } from "@/lib/uploads";
import { ATTACHMENT_MAX_BYTES } from "@/lib/validation/logbook";

/** The largest zip accepted, and the most it may unpack to. */
export const IMPORT_MAX_BYTES = 100 * 1024 * 1024;
export const IMPORT_MAX_UNPACKED = 300 * 1024 * 1024;
const DOCUMENT_MAX_BYTES = 30 * 1024 * 1024;

const refuse = (message: string, field = "file") => new AppError("invalid", message, { [field]: [message] });

export type ImportMode = "empty" | "merge";

/** Unpacks and checks an export zip; throws a 4xx naming the reason. Writes nothing. */
export async function readExportZip(bytes: Uint8Array): Promise<{ doc: ExportDocument; files: Map<string, { bytes: Uint8Array; ext: string }> }> {
  if (bytes.byteLength > IMPORT_MAX_BYTES) {
    throw new AppError("too_large", `The file is larger than ${IMPORT_MAX_BYTES / 1024 / 1024} MB, the most an import takes.`, { file: ["Too large."] });
  }
  if (bytes.byteLength < 22 || bytes[0] !== 0x50 || bytes[1] !== 0x4b) throw refuse("This is not a zip file. Choose the .zip that Fourpatch's export made.");
  let entries: Record<string, Uint8Array>;
  let unpacked = 0;
  try {
    entries = unzipSync(bytes, {
      filter: (f) => {
        unpacked += f.originalSize;
        if (unpacked > IMPORT_MAX_UNPACKED) throw new AppError("too_large", "The zip unpacks to more than an import takes.", { file: ["Too large when unpacked."] });
        return f.name === DOCUMENT_NAME || f.name.startsWith("files/");
      },
    });
  } catch (err) {
    if (err instanceof AppError) throw err;
    throw refuse("The zip is damaged or cut short (it may not have finished downloading). Export again and import the new file.");
  }
  const raw = entries[DOCUMENT_NAME];
  if (!raw) throw refuse(`This zip is not a Fourpatch export: it has no ${DOCUMENT_NAME}.`);
  if (raw.byteLength > DOCUMENT_MAX_BYTES) throw new AppError("too_large", "The export's document is larger than an import takes.", { file: ["Too large."] });
  let json: unknown;
  try {
    json = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(raw));
  } catch {
    throw refuse(`The export's ${DOCUMENT_NAME} is damaged: it is not readable JSON.`);
  }
  const head = json as { format?: unknown; version?: unknown } | null;
  if (!head || typeof head !== "object" || head.format !== EXPORT_FORMAT) throw refuse("This zip is not a Fourpatch logbook export (its document has another format).");
  if (typeof head.version !== "number" || !Number.isInteger(head.version)) throw refuse("The export's version is missing or not a number.");
  if (head.version > EXPORT_VERSION) {
    throw refuse(`This export was made by a newer Fourpatch (format version ${head.version}); this one reads version ${EXPORT_VERSION}. Update Fourpatch first.`);
  }
  if (head.version < EXPORT_VERSION) throw refuse(`This is an older export (format version ${head.version}) without its files; export again to get a version ${EXPORT_VERSION} zip.`);
  const parsed = exportDocument.safeParse(json);
  if (!parsed.success) {
    const first = parsed.error.issues.slice(0, 3).map((i) => `${i.path.join(".") || "document"}: ${i.message}`);
    throw refuse(`The export's document does not match the format: ${first.join("; ")}.`);
  }
  const doc = parsed.data;
  checkReferences(doc);
  const files = new Map<string, { bytes: Uint8Array; ext: string }>();
  for (const a of doc.attachments) {
    const b = entries[a.path];
    if (!b) throw refuse(`The file ${a.path} is listed but missing from the zip.`);
    if (b.byteLength !== a.sizeBytes || b.byteLength > ATTACHMENT_MAX_BYTES) throw refuse(`The file ${a.path} does not have the size the document gives.`);
    if (createHash("sha256").update(b).digest("hex") !== a.sha256) throw refuse(`The file ${a.path} is damaged (its checksum does not match).`);
    const sniffed = await checkUpload(b).catch(() => null);
    if (!sniffed || sniffed.mimeType !== a.mimeType) throw refuse(`The file ${a.path} is not the kind of file the document says.`);
    files.set(a.path, { bytes: b, ext: sniffed.ext });
  }
  return { doc, files };
}

/** Every id a row points at must be a row of the same document, of the same vehicle. */
function checkReferences(doc: ExportDocument) {
  const index = <T extends { id: string }>(rows: T[], what: string) => {
    const m = new Map<string, T>();
    for (const r of rows) {
      if (m.has(r.id)) throw refuse(`The document lists ${what} ${r.id} twice.`);
      m.set(r.id, r);
    }
    return m;
  };
  const vehicles = index(doc.vehicles, "vehicle");
  const sets = index(doc.sets, "set");
  const tires = index(doc.tires, "tire");
  const checks = index(doc.treadChecks, "tread check");
  const services = index(doc.serviceEntries, "service entry");
  index(doc.treadReadings, "reading");
  index(doc.odometerReadings, "odometer reading");
  index(doc.attachments, "file");
  const bad = (what: string, id: string) => refuse(`The document's ${what} ${id} points at something that is not in this export.`);
  for (const s of doc.sets) if (!vehicles.has(s.vehicleId)) throw bad("set", s.id);
  for (const t of doc.tires) if (!sets.has(t.setId)) throw bad("tire", t.id);
  for (const o of doc.odometerReadings) if (!vehicles.has(o.vehicleId)) throw bad("odometer reading", o.id);
  for (const s of doc.serviceEntries) {
    if (!vehicles.has(s.vehicleId)) throw bad("service entry", s.id);
    if (s.setId && sets.get(s.setId)?.vehicleId !== s.vehicleId) throw bad("service entry", s.id);
  }
  for (const c of doc.treadChecks) {
    if (!vehicles.has(c.vehicleId) || sets.get(c.setId)?.vehicleId !== c.vehicleId) throw bad("tread check", c.id);
    if (c.serviceEntryId && services.get(c.serviceEntryId)?.vehicleId !== c.vehicleId) throw bad("tread check", c.id);
  }
  const paths = new Set<string>();
  for (const r of doc.treadReadings) {
    const c = checks.get(r.checkId);
    const t = tires.get(r.tireId);
    if (!c || !t || sets.get(t.setId)?.vehicleId !== c.vehicleId) throw bad("reading", r.id);
  }
  for (const a of doc.attachments) {
    if (!vehicles.has(a.vehicleId)) throw bad("file", a.id);
    if (a.setId && sets.get(a.setId)?.vehicleId !== a.vehicleId) throw bad("file", a.id);
    if (a.serviceEntryId && services.get(a.serviceEntryId)?.vehicleId !== a.vehicleId) throw bad("file", a.id);
    if (paths.has(a.path)) throw refuse(`The document lists the file ${a.path} twice.`);
    paths.add(a.path);
  }
}

const chunks = <T>(rows: T[], size = 400) => Array.from({ length: Math.ceil(rows.length / size) }, (_, i) => rows.slice(i * size, (i + 1) * size));

/** Imports a checked document into the account in one transaction; returns what it added. */
export async function importExport({
  userId,
  bytes,
  mode,
}: {
  userId: string;
  bytes: Uint8Array;
  mode: ImportMode;
}): Promise<{ vehicles: number; sets: number; checks: number; serviceEntries: number; files: number }> {
  const { doc, files } = await readExportZip(bytes);
  const staging = path.join(/*turbopackIgnore: true*/ uploadsDir(), `.incoming-${randomBytes(9).toString("base64url")}`);
  const storedNames = new Map<string, string>();
  await fs.mkdir(staging, { recursive: true });
  try {
    for (const a of doc.attachments) {
      const f = files.get(a.path)!;
      const storedName = `${randomBytes(18).toString("base64url")}.${f.ext}`;
      await fs.writeFile(path.join(/*turbopackIgnore: true*/ staging, storedName), f.bytes, { flag: "wx" });
      storedNames.set(a.id, storedName);
    }
    const result = await db.transaction((tx) => writeDocument(tx, { userId, doc, mode, storedNames }));
    // Committed: the files move in. A rename within one folder tree does not copy.
    const dir = uploadsDir();
    for (const name of storedNames.values()) await fs.rename(path.join(/*turbopackIgnore: true*/ staging, name), path.join(/*turbopackIgnore: true*/ dir, name));
    return result;
  } finally {
    await fs.rm(staging, { recursive: true, force: true });
  }
}

async function writeDocument(
  tx: Transaction,
  { userId, doc, mode, storedNames }: { userId: string; doc: ExportDocument; mode: ImportMode; storedNames: Map<string, string> },
) {
  // Re-checked inside the transaction; the row lock makes two imports into one account take turns.
  const [me] = await tx.select({ id: user.id, banned: user.banned }).from(user).where(eq(user.id, userId)).for("update").limit(1);
  if (!me || me.banned) throw new AppError("forbidden", "This account cannot import.");
  if (mode === "empty") {
    const [{ n }] = await tx.select({ n: count() }).from(vehicle).where(eq(vehicle.ownerId, userId));
    if (n > 0) throw new AppError("conflict", "This account already has vehicles. Import them as additional vehicles, or start from an empty account.", { mode: ["The account is not empty."] });
  }

  // Shops are kept by reference when they exist here; a technician is kept when still on that shop's staff.
  const shopIds = [...new Set([...doc.sets.map((s) => s.fittedByShop?.id), ...doc.treadChecks.map((c) => c.author.shop?.id), ...doc.serviceEntries.map((s) => s.author.shop?.id)].filter((x): x is string => !!x))];
  const knownShops = new Set(shopIds.length ? (await tx.select({ id: organization.id }).from(organization).where(inArray(organization.id, shopIds))).map((o) => o.id) : []);
  const staff = shopIds.length
    ? await tx.select({ shopId: member.organizationId, userId: member.userId, name: user.name }).from(member).innerJoin(user, eq(user.id, member.userId)).where(inArray(member.organizationId, shopIds))
    : [];
  const authorship = (a: ExportDocument["treadChecks"][number]["author"]) => {
    if (a.by === "account") return { shopId: null, authorUserId: userId };
    if (a.by === "shop" && a.shop && knownShops.has(a.shop.id)) {
      const tech = staff.find((m) => m.shopId === a.shop!.id && m.name === a.name);
      return { shopId: a.shop.id, authorUserId: tech?.userId ?? null };
    }
    return { shopId: null, authorUserId: null };
  };

  const newId = new Map<string, string>();
  const idFor = (old: string) => {
    let v = newId.get(old);
    if (!v) newId.set(old, (v = randomUUID()));
    return v;
  };
  const ts = (s: string) => new Date(s);

  for (const part of chunks(doc.vehicles)) {
    await tx.insert(vehicle).values(part.map((v) => ({ ...v, id: idFor(v.id), ownerId: userId, createdAt: ts(v.createdAt), updatedAt: ts(v.updatedAt) })));
  }
  for (const part of chunks(doc.odometerReadings)) {
    await tx.insert(odometerReading).values(part.map((o) => ({ ...o, id: idFor(o.id), vehicleId: idFor(o.vehicleId), createdAt: ts(o.createdAt) })));
  }
  for (const part of chunks(doc.sets)) {
    await tx.insert(tireSet).values(
      part.map(({ fittedByShop, ...s }) => ({
        ...s,
        id: idFor(s.id),
        vehicleId: idFor(s.vehicleId),
        fittedByShopId: fittedByShop && knownShops.has(fittedByShop.id) ? fittedByShop.id : null,
        createdAt: ts(s.createdAt),
        updatedAt: ts(s.updatedAt),
      })),
    );
  }
  for (const part of chunks(doc.tires)) {
    await tx.insert(tire).values(part.map((t) => ({ ...t, id: idFor(t.id), setId: idFor(t.setId), createdAt: ts(t.createdAt) })));
  }
  for (const part of chunks(doc.serviceEntries)) {
    await tx.insert(serviceEntry).values(
      part.map(({ author, ...s }) => ({
        ...s,
        id: idFor(s.id),
        vehicleId: idFor(s.vehicleId),
        setId: s.setId ? idFor(s.setId) : null,
        ...authorship(author),
        createdAt: ts(s.createdAt),
      })),
    );
  }
  for (const part of chunks(doc.treadChecks)) {
    await tx.insert(treadCheck).values(
      part.map(({ author, ...c }) => ({
        ...c,
        id: idFor(c.id),
        vehicleId: idFor(c.vehicleId),
        setId: idFor(c.setId),
        serviceEntryId: c.serviceEntryId ? idFor(c.serviceEntryId) : null,
        ...authorship(author),
        createdAt: ts(c.createdAt),
      })),
    );
  }
  for (const part of chunks(doc.treadReadings)) {
    await tx.insert(treadReading).values(part.map((r) => ({ ...r, id: idFor(r.id), checkId: idFor(r.checkId), tireId: idFor(r.tireId) })));
  }
  for (const part of chunks(doc.attachments)) {
    await tx.insert(attachment).values(
      part.map((a) => ({
        id: idFor(a.id),
        ownerId: userId,
        vehicleId: idFor(a.vehicleId),
        setId: a.setId ? idFor(a.setId) : null,
        serviceEntryId: a.serviceEntryId ? idFor(a.serviceEntryId) : null,
        kind: a.kind,
        fileName: a.fileName,
        storedName: storedNames.get(a.id)!,
        mimeType: a.mimeType,
        sizeBytes: a.sizeBytes,
        uploadedByUserId: userId,
        createdAt: ts(a.createdAt),
      })),
    );
  }
  if (mode === "empty" && doc.profile) {
    // Preferences come along into an empty account; the plan never does.
    const { units, pressureUnit, timezone, jurisdiction, reminderSettings, emailReminders } = doc.profile;
    await tx
      .insert(driverProfile)
      .values({ userId, units, pressureUnit, timezone, jurisdiction, reminderSettings, emailReminders })
      .onConflictDoUpdate({ target: driverProfile.userId, set: { units, pressureUnit, timezone, jurisdiction, reminderSettings, emailReminders, updatedAt: new Date() } });
  }
  return {
    vehicles: doc.vehicles.length,
    sets: doc.sets.length,
    checks: doc.treadChecks.length,
    serviceEntries: doc.serviceEntries.length,
    files: doc.attachments.length,
  };
}

