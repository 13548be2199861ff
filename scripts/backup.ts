// `npm run backup [folder]`: a consistent copy of the embedded database and
// the uploaded files, into backups/fourpatch-<time>/ (or the given folder).
// With the server running it asks the server (POST /api/ops/backup with
// CRON_SECRET); with no server it opens the folder itself, under the lock.
import fs from "node:fs";
import path from "node:path";

const dataDir = path.resolve(process.env.FOURPATCH_DATA_DIR || "./data");
const out = path.resolve(process.argv[2] ?? path.join("backups", `fourpatch-${new Date().toISOString().replace(/[:.]/g, "-")}`));
if (process.env.DATABASE_URL) {
  console.error("This deployment uses PostgreSQL (DATABASE_URL): back it up with pg_dump and restore with pg_restore.");
  process.exit(1);
}
const { lockPathFor } = await import("@/db/lock");

function serverHolder(): number | null {
  try {
    const { pid } = JSON.parse(fs.readFileSync(lockPathFor(dataDir), "utf8")) as { pid: number };
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

let dump: Buffer;
const holder = serverHolder();
if (holder) {
  const base = (process.env.BETTER_AUTH_URL || `http://localhost:${process.env.PORT || 3000}`).replace(/\/$/, "");
  const secret = process.env.CRON_SECRET;
  if (!secret) {
    console.error(`The data folder is in use by a running server (PID ${holder}). Set CRON_SECRET (the server's) so the backup can ask it for a copy.`);
    process.exit(1);
  }
  const res = await fetch(`${base}/api/ops/backup`, { method: "POST", headers: { authorization: `Bearer ${secret}` } });
  if (!res.ok) {
    console.error(`The server refused the backup: ${res.status} ${await res.text()}`);
    process.exit(1);
  }
  dump = Buffer.from(await res.arrayBuffer());
} else {
  process.env.FOURPATCH_DATA_DIR = dataDir;
  const { closeDb, dumpEmbeddedDatabase, migrateDb } = await import("@/db");
  await migrateDb();
  dump = Buffer.from(await (await dumpEmbeddedDatabase())!.arrayBuffer());
  await closeDb();
}
fs.mkdirSync(out, { recursive: true });
fs.writeFileSync(path.join(out, "pgdata.tar.gz"), dump);
// Uploaded files are written once under random names and never changed, so a plain copy is consistent.
const uploads = path.join(dataDir, "uploads");
if (fs.existsSync(uploads)) fs.cpSync(uploads, path.join(out, "uploads"), { recursive: true });
fs.writeFileSync(path.join(out, "backup.json"), JSON.stringify({ made: new Date().toISOString(), from: dataDir, throughServer: !!holder }, null, 2));
console.log(`Backup written to ${out}`);
