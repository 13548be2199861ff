// A reminder's severity in the words of the tire conditions, so the page,
// the e-mail and the badge say the same thing.
import type { ReminderSeverity } from "@/lib/tires";

export type BadgeCondition = "good" | "watch" | "plan" | "replace";

export function badgeFor(severity: ReminderSeverity): BadgeCondition {
  return severity === "info" ? "good" : severity;
}

const LABELS: Record<ReminderSeverity, string> = {
  info: "Coming up",
  watch: "Watch",
  plan: "Plan to replace",
  replace: "Replace now",
};

export function conditionLabelFor(severity: ReminderSeverity): string {
  return LABELS[severity];
}
