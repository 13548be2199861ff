import { spawn } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { describe, expect, it } from "vitest";
import { acquireDataDirLock, DataDirLockedError, lockPathFor } from "@/db/lock";

function startHolder(dir: string) {
  const child = spawn("npx", ["tsx", "--tsconfig", "scripts/tsconfig.json", "tests/support/lock-holder.ts", dir], {
    cwd: process.cwd(),
    // The lock guards PGlite folders: the child must not follow a PostgreSQL run's DATABASE_URL.
    env: { ...process.env, DATABASE_URL: "", FOURPATCH_TEST_PG_URL: "" },
    stdio: ["pipe", "pipe", "inherit"],
  });
  const ready = new Promise<void>((resolve, reject) => {
    child.stdout.on("data", (d: Buffer) => d.toString().includes("ready") && resolve());
    child.on("exit", (code) => reject(new Error(`holder exited early with ${code}`)));
  });
  const stop = () =>
    new Promise<void>((resolve) => {
      child.removeAllListeners("exit");
      child.on("exit", () => resolve());
      child.stdin.write("stop\n");
    });
  return { child, ready, stop };
}

describe("exclusive lock on the PGlite data folder (PGlite itself takes none)", () => {
  it("refuses a second opener with a clear error naming the folder and the holder's PID, and the first process's data survives", async () => {
    const dir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "fourpatch-lock-")), "data");
    const holder = startHolder(dir);
    await holder.ready;

    let refused: unknown;
    try {
      acquireDataDirLock(dir);
    } catch (err) {
      refused = err;
    }
    expect(refused).toBeInstanceOf(DataDirLockedError);
    const e = refused as DataDirLockedError;
    expect(e.message).toContain(path.resolve(dir));
    expect(e.holderPid).toBeGreaterThan(0);
    expect(e.holderPid).not.toBe(process.pid);
    expect(e.message).toContain(`PID ${e.holderPid}`);
    expect(e.message).toContain("Nothing was written");

    await holder.stop();
    expect(fs.existsSync(lockPathFor(dir))).toBe(false);

    // After the holder stopped cleanly its committed row is on disk.
    const release = acquireDataDirLock(dir);
    const pg = new PGlite(dir);
    const rows = await pg.query<{ v: string }>("select v from lock_probe");
    expect(rows.rows.map((r) => r.v)).toEqual(["written by the first process"]);
    await pg.close();
    release();
  }, 60_000);

  it("takes over a stale lock left by a process that died", () => {
    const dir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "fourpatch-stale-")), "data");
    // PID 2^22 + 1 is above Linux's pid_max ceiling, so no process has it.
    fs.writeFileSync(lockPathFor(dir), JSON.stringify({ pid: 4194305 }));
    const release = acquireDataDirLock(dir);
    expect(JSON.parse(fs.readFileSync(lockPathFor(dir), "utf8")).pid).toBe(process.pid);
    release();
    expect(fs.existsSync(lockPathFor(dir))).toBe(false);
  });

  it.skipIf(process.platform !== "linux")("takes over a lock whose holder was killed but never reaped (a zombie)", async () => {
    // A parent that forks a child which exits at once and is never waited for:
    // the child stays a zombie, which signal 0 still reaches.
    const parent = spawn("python3", ["-c", "import os,sys,time\npid=os.fork()\nif pid==0: os._exit(0)\nprint(pid, flush=True)\ntime.sleep(30)"], { stdio: ["ignore", "pipe", "inherit"] });
    try {
      const zombie = await new Promise<number>((resolve) => parent.stdout.once("data", (d: Buffer) => resolve(Number(d.toString().trim()))));
      // Wait until the kernel shows it as a zombie.
      for (let i = 0; i < 50 && !fs.readFileSync(`/proc/${zombie}/stat`, "utf8").includes(") Z "); i++) await new Promise((r) => setTimeout(r, 20));
      expect(() => process.kill(zombie, 0)).not.toThrow();
      const dir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "fourpatch-zombie-")), "data");
      fs.writeFileSync(lockPathFor(dir), JSON.stringify({ pid: zombie }));
      const release = acquireDataDirLock(dir);
      expect(JSON.parse(fs.readFileSync(lockPathFor(dir), "utf8")).pid).toBe(process.pid);
      release();
    } finally {
      parent.kill("SIGKILL");
    }
  });
});
