// `npm run backup` / `npm run restore` (issue 9): a round trip on a real
// PGlite folder, and the server route the backup uses while the app runs.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { POST as backupRoute } from "@/app/api/ops/backup/route";
import { resetEnvForTests } from "@/lib/env";

const root = path.resolve(import.meta.dirname, "../../..");
const onPostgres = !!process.env.FOURPATCH_TEST_PG_URL;

function run(args: string[], env: Record<string, string>) {
  return execFileSync("npx", ["tsx", "--tsconfig", "scripts/tsconfig.json", ...args], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: "", FOURPATCH_TEST_PG_URL: "", ...env },
    encoding: "utf8",
  });
}

describe.skipIf(onPostgres)("backup and restore", () => {
  it("restores exactly what the backup held, files included, and keeps the replaced folder aside", async () => {
    const work = fs.mkdtempSync(path.join(os.tmpdir(), "fourpatch-backup-"));
    const dir = path.join(work, "data");
    const env = { FOURPATCH_DATA_DIR: dir };
    run(["tests/support/db-probe.ts", "write", dir, "Before A", "Before B"], env);
    run(["scripts/backup.ts", path.join(work, "backup")], env);
    run(["tests/support/db-probe.ts", "write", dir, "After C"], env);

    run(["scripts/restore.ts", path.join(work, "backup")], env);
    const restored = JSON.parse(run(["tests/support/db-probe.ts", "list", dir], env)) as { vehicles: string[]; files: string[] };
    expect(restored.vehicles).toEqual(["Before A", "Before B"]);
    expect(restored.files).toEqual(["Before A.txt", "Before B.txt"]);
    expect(fs.readdirSync(work).some((n) => n.startsWith("data.before-restore-"))).toBe(true);
    fs.rmSync(work, { recursive: true, force: true });
  }, 240_000);

  it("the server's backup route answers only the operations secret", async () => {
    process.env.CRON_SECRET = "ops-secret-for-test";
    resetEnvForTests();
    try {
      const call = (auth?: string) => backupRoute(new Request("http://fourpatch.test/api/ops/backup", { method: "POST", headers: auth ? { authorization: auth } : {} }));
      expect((await call()).status).toBe(401);
      expect((await call("Bearer wrong")).status).toBe(401);
      const ok = await call("Bearer ops-secret-for-test");
      expect(ok.status).toBe(200);
      const bytes = new Uint8Array(await ok.arrayBuffer());
      // A gzip stream starts with 1f 8b (RFC 1952, section 2.3.1).
      expect([bytes[0], bytes[1]]).toEqual([0x1f, 0x8b]);
    } finally {
      delete process.env.CRON_SECRET;
      resetEnvForTests();
    }
  });
});
