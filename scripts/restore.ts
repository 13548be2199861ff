// `npm run restore <backup folder>`: brings a backup made by `npm run backup`
// back into the data folder. The server must be stopped (the data-folder lock
// is taken); the current folder is kept beside it as <folder>.before-restore-<time>.
import fs from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";

const from = process.argv[2];
if (!from || !fs.existsSync(path.join(from, "pgdata.tar.gz"))) {
  console.error("Usage: npm run restore -- <folder made by npm run backup>");
  process.exit(1);
}
if (process.env.DATABASE_URL) {
  console.error("This deployment uses PostgreSQL (DATABASE_URL): restore with pg_restore.");
  process.exit(1);
}
const dataDir = path.resolve(process.env.FOURPATCH_DATA_DIR || "./data");
const { acquireDataDirLock } = await import("@/db/lock");
fs.mkdirSync(dataDir, { recursive: true });
let release: () => void;
try {
  release = acquireDataDirLock(dataDir);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
}
const aside = `${dataDir}.before-restore-${new Date().toISOString().replace(/[:.]/g, "-")}`;
const staging = `${dataDir}.restoring`;
fs.rmSync(staging, { recursive: true, force: true });
const dump = new Blob([fs.readFileSync(path.join(from, "pgdata.tar.gz"))]);
const pg = new PGlite(staging, { loadDataDir: dump });
await pg.query("select 1");
await pg.close();
if (fs.existsSync(path.join(from, "uploads"))) fs.cpSync(path.join(from, "uploads"), path.join(staging, "uploads"), { recursive: true });
// Swap in one step each: the old folder moves aside, the restored one takes its place.
fs.renameSync(dataDir, aside);
fs.renameSync(staging, dataDir);
release();
console.log(`Restored ${from} into ${dataDir}; the previous data is in ${aside}.`);
