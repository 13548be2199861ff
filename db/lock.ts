// PGlite takes no lock on its data folder, and a second process that opens
// the same folder silently loses committed writes. This exclusive lock file,
// taken before PGlite opens, makes that impossible.
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

export class DataDirLockedError extends Error {
  constructor(
    readonly dataDir: string,
    readonly holderPid: number,
  ) {
    super(
      `The data folder ${dataDir} is in use by another Fourpatch process (PID ${holderPid}). ` +
        `Stop that process first, or go through the running server (for example \`npm run reminders:run\`). ` +
        `Nothing was written.`,
    );
    this.name = "DataDirLockedError";
  }
}

/**
 * The lock lives in this machine's temporary folder, named after the data
 * folder's real path: copying or moving an app folder (or the data folder)
 * never carries a stale lock along, and a symlinked path finds the same lock.
 * FOURPATCH_LOCK_DIR overrides the folder.
 */
export function lockPathFor(dataDir: string) {
  const abs = path.resolve(dataDir);
  let real = abs;
  try {
    real = fs.realpathSync(abs);
  } catch {
    // Not created yet: its resolved path is its identity.
  }
  const dir = process.env.FOURPATCH_LOCK_DIR || path.join(os.tmpdir(), "fourpatch-locks");
  const id = crypto.createHash("sha256").update(real).digest("hex").slice(0, 24);
  return path.join(dir, `${path.basename(real).replace(/[^\w.-]/g, "_")}-${id}.lock`);
}

/**
 * A killed holder whose parent never reaps it (a container whose first
 * process does not collect orphans) stays a zombie: signal 0 still reaches
 * it, yet it holds nothing. On Linux its state in /proc says so.
 */
function isZombie(pid: number) {
  try {
    const stat = fs.readFileSync(`/proc/${pid}/stat`, "utf8");
    // "pid (comm) S ...": the state follows the last ")" (comm may hold spaces or parentheses).
    const state = stat.slice(stat.lastIndexOf(")") + 2, stat.lastIndexOf(")") + 3);
    return state === "Z" || state === "X";
  } catch {
    return false;
  }
}

function isAlive(pid: number) {
  try {
    process.kill(pid, 0);
    return !isZombie(pid);
  } catch (err) {
    // EPERM means the process exists but belongs to someone else.
    return (err as NodeJS.ErrnoException).code === "EPERM";
  }
}

/** Takes the lock or throws DataDirLockedError. Returns a release function. */
export function acquireDataDirLock(dataDir: string): () => void {
  const lockPath = lockPathFor(dataDir);
  fs.mkdirSync(path.dirname(lockPath), { recursive: true });
  const body = JSON.stringify({ pid: process.pid, host: os.hostname(), dataDir: path.resolve(dataDir), since: new Date().toISOString() });

  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      fs.writeFileSync(lockPath, body, { flag: "wx" });
      let released = false;
      const release = () => {
        if (released) return;
        released = true;
        try {
          const holder = JSON.parse(fs.readFileSync(lockPath, "utf8")) as { pid: number };
          if (holder.pid === process.pid) fs.unlinkSync(lockPath);
        } catch {
          // Already gone: nothing to release.
        }
      };
      process.once("exit", release);
      return release;
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== "EEXIST") throw err;
      let holderPid = 0;
      try {
        holderPid = (JSON.parse(fs.readFileSync(lockPath, "utf8")) as { pid: number }).pid;
      } catch {
        // An unreadable lock is treated as stale below.
      }
      if (holderPid && holderPid !== process.pid && isAlive(holderPid)) {
        throw new DataDirLockedError(path.resolve(dataDir), holderPid);
      }
      // The holder died without cleaning up: remove the stale lock and retry once.
      fs.rmSync(lockPath, { force: true });
    }
  }
  throw new DataDirLockedError(path.resolve(dataDir), 0);
}
