// What a pass has left, for people. Its own module, without zod: the
// browser's pass timer (components/passes/time-left.tsx) imports it.

/** "2 days 3 hours", "5 hours 10 min", "12 min": what is left, for people. */
export function formatTimeLeft(ms: number): string {
  if (ms <= 0) return "ended";
  const min = Math.floor(ms / 60_000);
  const days = Math.floor(min / (24 * 60));
  const hours = Math.floor((min % (24 * 60)) / 60);
  const mins = min % 60;
  const plural = (n: number, w: string) => `${n} ${w}${n === 1 ? "" : "s"}`;
  if (days > 0) return hours > 0 ? `${plural(days, "day")} ${plural(hours, "hour")}` : plural(days, "day");
  if (hours > 0) return mins > 0 ? `${plural(hours, "hour")} ${mins} min` : plural(hours, "hour");
  return min > 0 ? `${mins} min` : "less than a minute";
}
