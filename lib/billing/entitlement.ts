// Who is on Plus, decided from the stored subscription only (never from a
// success redirect or a column someone set by hand). Pure: the caller
// passes the clock.
//
// - `active` and `trialing` give Plus until the current period ends.
// - `past_due` keeps Plus for the period already started while Stripe retries
//   the payment (the driver sees "payment failed" and a way to fix it); if the
//   retries run out Stripe moves it to `unpaid` or `canceled`.
// - Every other status (`canceled`, `unpaid`, `incomplete`, `incomplete_expired`,
//   `paused`) is Free. A subscription set to cancel at period end stays Plus
//   until that end, then falls back to Free even before the `deleted` event
//   arrives. Settings are never touched: a driver who comes back finds them.
import type { Plan } from "@/lib/plan";

export const PLUS_STATUSES = ["active", "trialing", "past_due"] as const;

export type StoredSubscription = { status: string; currentPeriodEnd: Date | null };

export function planFromSubscription(sub: StoredSubscription | null | undefined, now: Date): Plan {
  if (!sub || !sub.currentPeriodEnd) return "free";
  if (!(PLUS_STATUSES as readonly string[]).includes(sub.status)) return "free";
  return sub.currentPeriodEnd.getTime() > now.getTime() ? "plus" : "free";
}

/** The driver's plan from all their stored subscriptions (a driver can have an old cancelled one beside a new one). */
export function planFromSubscriptions(subs: StoredSubscription[], now: Date): Plan {
  return subs.some((s) => planFromSubscription(s, now) === "plus") ? "plus" : "free";
}
