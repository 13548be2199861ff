import "server-only";
import { sendDuePassEndedNotices } from "@/db/queries/passes";

export type DailyJob = { name: string; run: (now: Date) => Promise<unknown> };

/** Jobs of the daily scheduler; features add theirs here. */
export const dailyJobs: DailyJob[] = [
  { name: "pass-ended-notices", run: (now) => sendDuePassEndedNotices({ now }) },
  // Loaded when it runs, so the scheduler module stays light at start-up.
  { name: "reminder-deliveries", run: async (now) => (await import("./reminders/run")).runReminderDeliveries({ now }) },
  // Last: after the day's writes. VACUUM, ANALYZE and CHECKPOINT (db/maintenance.ts).
  { name: "database-maintenance", run: async () => (await import("@/db/maintenance")).dailyMaintenance() },
];
