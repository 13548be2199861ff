import "server-only";
// Where uploaded files live on disk, and their removal after their rows are gone.
import fs from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { env } from "@/lib/env";

/** `<data folder>/../<name>-uploads`, or a temp folder for memory databases. */
export function uploadsDir(): string {
  const dataDir = env().FOURPATCH_DATA_DIR;
  if (dataDir.startsWith("memory://") || env().DATABASE_URL) {
    return process.env.FOURPATCH_UPLOADS_DIR ?? path.join(os.tmpdir(), `fourpatch-uploads-${process.pid}`);
  }
  const resolved = path.resolve(/*turbopackIgnore: true*/ dataDir);
  return process.env.FOURPATCH_UPLOADS_DIR ?? path.join(path.dirname(resolved), `${path.basename(resolved)}-uploads`);
}

export function storedFilePath(storedName: string): string {
  // Stored names are random and made by us; refuse anything that could climb out.
  if (!/^[A-Za-z0-9_-]+(\.[a-z0-9]+)?$/.test(storedName)) throw new Error(`Bad stored file name: ${storedName}`);
  return path.join(uploadsDir(), storedName);
}

export async function removeStoredFiles(storedNames: string[]) {
  await Promise.all(storedNames.map((n) => fs.rm(storedFilePath(n), { force: true })));
}
