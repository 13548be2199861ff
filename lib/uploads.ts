import "server-only";
// Receipts and photos on disk under `<data folder>/uploads/`, each under a
// random name. The type comes from the file's first bytes, never from its
// name or the browser's claim, and only the four kinds below are kept.
import crypto from "node:crypto";
import fs from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { fileTypeFromBuffer } from "file-type";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { ATTACHMENT_MAX_BYTES, ATTACHMENT_TYPES } from "@/lib/validation/logbook";

export type AllowedType = (typeof ATTACHMENT_TYPES)[number];

/** Each driver's files together, counted over all of their vehicles. FOURPATCH_STORAGE_QUOTA_MB overrides. */
export const STORAGE_QUOTA_BYTES = Math.max(1, Number(process.env.FOURPATCH_STORAGE_QUOTA_MB) || 500) * 1024 * 1024;

export function uploadsDir(): string {
  const dataDir = process.env.NEXT_PHASE === "phase-production-build" ? "memory://" : env().FOURPATCH_DATA_DIR;
  // An in-memory database (tests) keeps its files in a temporary folder of this process.
  if (dataDir.startsWith("memory://")) return path.join(os.tmpdir(), `fourpatch-uploads-${process.pid}`);
  return path.join(path.resolve(/*turbopackIgnore: true*/ dataDir), "uploads");
}

/** Checks size and content; returns the sniffed type. */
export async function checkUpload(bytes: Uint8Array): Promise<{ mimeType: AllowedType; ext: string }> {
  if (bytes.byteLength === 0) throw new AppError("invalid", "The file is empty. Choose the receipt or photo again.", { file: ["The file is empty."] });
  if (bytes.byteLength > ATTACHMENT_MAX_BYTES) {
    throw new AppError("too_large", "The file is larger than 10 MB. Send a smaller photo or a scan of the receipt.", { file: ["At most 10 MB."] });
  }
  const sniffed = await fileTypeFromBuffer(bytes);
  if (!sniffed || !(ATTACHMENT_TYPES as readonly string[]).includes(sniffed.mime)) {
    throw new AppError("unsupported_type", "Only JPEG, PNG or WebP photos and PDF documents can be kept.", {
      file: ["Only JPEG, PNG, WebP or PDF."],
    });
  }
  return { mimeType: sniffed.mime as AllowedType, ext: sniffed.ext };
}

export async function storeFile(bytes: Uint8Array, ext: string): Promise<string> {
  const dir = uploadsDir();
  await fs.mkdir(dir, { recursive: true });
  const storedName = `${crypto.randomBytes(18).toString("base64url")}.${ext}`;
  await fs.writeFile(path.join(/*turbopackIgnore: true*/ dir, storedName), bytes, { flag: "wx" });
  return storedName;
}

/** Only names this module made are ever opened, so a stored name cannot walk out of the folder. */
const SAFE_NAME = /^[A-Za-z0-9_-]{24}\.[a-z0-9]{2,5}$/;

export async function readStoredFile(storedName: string): Promise<Buffer> {
  if (!SAFE_NAME.test(storedName)) throw new AppError("not_found", "That file was not found.");
  return fs.readFile(path.join(/*turbopackIgnore: true*/ uploadsDir(), storedName));
}

export async function removeStoredFile(storedName: string): Promise<void> {
  if (!SAFE_NAME.test(storedName)) return;
  await fs.rm(path.join(/*turbopackIgnore: true*/ uploadsDir(), storedName), { force: true });
}

/** A file name safe to echo back in a Content-Disposition header. */
export function displayFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "file";
  return base.replace(/[^\w .()-]+/g, "_").slice(0, 120) || "file";
}
