import "server-only";
// Daily jobs run inside the server process: no second process may open the
// PGlite data folder. Jobs register themselves in lib/jobs.ts.
import { dailyJobs } from "./jobs";
import { CHECKPOINT_EVERY_MS } from "@/db/maintenance";

const DAY_MS = 24 * 60 * 60 * 1000;
const globalForScheduler = globalThis as unknown as { __fourpatchScheduler?: NodeJS.Timeout; __fourpatchCheckpoints?: NodeJS.Timeout };

export async function runDailyJobs(now = new Date()) {
  const results: Record<string, unknown> = {};
  for (const job of dailyJobs) {
    try {
      results[job.name] = await job.run(now);
    } catch (err) {
      console.error(`[scheduler] ${job.name} failed`, err);
      results[job.name] = { error: String(err) };
    }
  }
  return results;
}

export function startScheduler() {
  if (process.env.FOURPATCH_SCHEDULER === "off" || globalForScheduler.__fourpatchScheduler) return;
  // First run a minute after start, then once a day.
  const first = setTimeout(() => {
    void runDailyJobs();
    globalForScheduler.__fourpatchScheduler = setInterval(() => void runDailyJobs(), DAY_MS);
    globalForScheduler.__fourpatchScheduler.unref();
  }, 60_000);
  first.unref();
  globalForScheduler.__fourpatchScheduler = first;
  // PGlite never checkpoints on its own: without this the write-ahead log grows without bound.
  globalForScheduler.__fourpatchCheckpoints ??= setInterval(() => {
    void import("@/db/maintenance").then((m) => m.checkpointDb()).catch((err) => console.error("[scheduler] checkpoint failed", err));
  }, CHECKPOINT_EVERY_MS);
  globalForScheduler.__fourpatchCheckpoints.unref();
}
