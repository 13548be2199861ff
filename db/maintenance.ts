// Keeping the database fast and small. PGlite runs PostgreSQL in single-user
// mode: nothing collects planner statistics (no autovacuum) and nothing
// checkpoints, so the write-ahead log grows until a CHECKPOINT. The policy:
// - ANALYZE after migrations (db/index.ts), after bulk changes (seed, import)
//   and in the daily jobs;
// - VACUUM (plain, never FULL: it would lock and rewrite whole tables) in the
//   daily jobs, so deleted and updated rows' space is reused;
// - CHECKPOINT after bulk changes, in the daily jobs and every
//   CHECKPOINT_EVERY_MS while the server runs, so the WAL stays near
//   max_wal_size (64 MB) instead of growing to gigabytes.
// With DATABASE_URL the server's autovacuum and checkpointer do this; only
// ANALYZE after bulk changes is still worth running there.
import { databaseKind, execMaintenance } from "./index";

export const CHECKPOINT_EVERY_MS = 10 * 60 * 1000;

export async function analyzeDb(): Promise<void> {
  await execMaintenance("ANALYZE");
}

export async function checkpointDb(): Promise<void> {
  if (databaseKind() === "pglite") await execMaintenance("CHECKPOINT");
}

/** After a seed or an import: fresh statistics, and the WAL written so far checkpointed. */
export async function afterBulkChange(): Promise<void> {
  await analyzeDb();
  await checkpointDb();
}

/** The daily job: reclaim space, refresh statistics, checkpoint. */
export async function dailyMaintenance(): Promise<{ kind: "pglite" | "pg"; ms: number }> {
  const t0 = Date.now();
  const kind = databaseKind();
  if (kind === "pglite") {
    await execMaintenance("VACUUM (ANALYZE)");
    await execMaintenance("CHECKPOINT");
  } else {
    await execMaintenance("ANALYZE");
  }
  return { kind, ms: Date.now() - t0 };
}
