// What each plan includes. Who is on Plus comes from the stored Stripe
// subscription (`planOf` in db/queries/billing.ts, rule in
// lib/billing/entitlement.ts); every feature check goes through `planAllows`,
// and route handlers answer 402 with the upgrade link (`plusRequired`).
import type { ReminderKind } from "@/lib/tires";

export type Plan = "free" | "plus";

export type PlanFeature = "email-reminders" | "alarms" | "seasonal-swap" | "rotation-due";

const PLUS_ONLY: readonly PlanFeature[] = ["email-reminders", "alarms", "seasonal-swap", "rotation-due"];

export function planAllows({ plan, feature }: { plan: Plan; feature: PlanFeature }): boolean {
  return plan === "plus" || !PLUS_ONLY.includes(feature);
}

/** Free keeps the basic kinds (age and depth); the other kinds are features of their own. */
export function planAllowsKind({ plan, kind }: { plan: Plan; kind: ReminderKind }): boolean {
  return kind === "seasonal-swap" || kind === "rotation-due" ? planAllows({ plan, feature: kind }) : true;
}

export const PLUS_ADDS = [
  "E-mail reminders before each date",
  "Calendar alarms at the lead times you choose",
  "Seasonal swap and rotation reminders",
] as const;
