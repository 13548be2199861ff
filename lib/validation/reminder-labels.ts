// The reminder settings form's lists and labels (no zod), apart from
// ./labels so the logbook's pages do not carry them; re-exported by ./reminders.
import type { Jurisdiction, ReminderKind } from "@/lib/tires";

/** Reminder kinds and tread-limit rules as the settings form lists them (re-exported by ./reminders). */
export const REMINDER_KINDS = ["age-watch", "age-replace", "depth-limit", "seasonal-swap", "rotation-due"] as const satisfies readonly ReminderKind[];

export const REMINDER_KIND_LABELS: Record<ReminderKind, string> = {
  "age-watch": "Tires old enough for a yearly inspection",
  "age-replace": "Tires at their age limit",
  "depth-limit": "Tread projected to reach its depth limit",
  "seasonal-swap": "Seasonal change of tire sets",
  "rotation-due": "Rotation due by distance",
};

export const JURISDICTION_LABELS: Record<Jurisdiction, string> = {
  EU: "European Union (1.6 mm)",
  UK: "United Kingdom (1.6 mm)",
  US: "United States (2/32 in)",
  DE: "Germany (1.6 mm, 4 mm advised in winter)",
  FI: "Finland (3 mm in the winter period)",
  NO: "Norway (3 mm in the winter period)",
  "NO-north": "Northern Norway (3 mm, longer winter period)",
  SE: "Sweden (3 mm in the winter period)",
  AT: "Austria (4 mm in the winter period)",
  practice: "Common practice (3 mm summer, 4 mm winter)",
  custom: "My own limit",
};
