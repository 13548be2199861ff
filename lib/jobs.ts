import "server-only";
import { sendDuePassEndedNotices } from "@/db/queries/passes";

export type DailyJob = { name: string; run: (now: Date) => Promise<unknown> };

/** Jobs of the daily scheduler; features add theirs here. */
export const dailyJobs: DailyJob[] = [{ name: "pass-ended-notices", run: (now) => sendDuePassEndedNotices({ now }) }];
