// A reminder's severity in the words and shapes of the condition code, so the
// page, the e-mail and the calendar say the same thing. "info" (a seasonal
// swap, a rotation) is not a condition and keeps its own words.
import type { ReminderSeverity } from "@/lib/tires";
import { CONDITION_CODE, conditionText, type ConditionLevel } from "@/lib/visual/condition-code";

export type BadgeCondition = Exclude<ConditionLevel, "good" | "unknown">;

/** The condition level a reminder shows, or null for one that judges no tire. */
export function badgeFor(severity: ReminderSeverity): BadgeCondition | null {
  return severity === "info" ? null : severity;
}

export function conditionLabelFor(severity: ReminderSeverity): string {
  return severity === "info" ? "Coming up" : CONDITION_CODE[severity].word;
}

/** The severity as plain text with the condition code's mark: "▰▱▱ Plan to replace". */
export function conditionTextFor(severity: ReminderSeverity): string {
  return severity === "info" ? "Coming up" : conditionText(severity);
}
