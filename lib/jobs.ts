import "server-only";

export type DailyJob = { name: string; run: (now: Date) => Promise<unknown> };

/** Jobs of the daily scheduler; features add theirs here. */
export const dailyJobs: DailyJob[] = [];
