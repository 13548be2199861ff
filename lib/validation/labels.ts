// What the browser shows of the logbook's and passes' fixed values: labels,
// lists and the local date. No zod here: client components that only show
// these import this module, and the validation library stays off their pages.
// (A pass's lengths and scopes are in ./pass-labels, the reminder lists in
// ./reminder-labels: each page carries only the lists it shows.)

/** The local calendar date; forms and handlers both use it to refuse dates in the future. */
export function todayIso(now = new Date()): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, "0");
  const d = String(now.getDate()).padStart(2, "0");
  return `${y}-${m}-${d}`;
}

export const SET_KIND_VALUES = ["summer", "all_season", "all_weather", "winter"] as const;
export const SET_KIND_LABELS: Record<(typeof SET_KIND_VALUES)[number], string> = {
  summer: "Summer",
  all_season: "All-season",
  all_weather: "All-weather",
  winter: "Winter",
};
export const POSITIONS = ["front_left", "front_right", "rear_left", "rear_right", "spare"] as const;
export type PositionValue = (typeof POSITIONS)[number];
export const POSITION_LABELS: Record<PositionValue, string> = {
  front_left: "Front left",
  front_right: "Front right",
  rear_left: "Rear left",
  rear_right: "Rear right",
  spare: "Spare",
};
export const SERVICE_KINDS = ["fitting", "seasonal_swap", "rotation", "balancing", "alignment", "puncture_repair", "inspection"] as const;
export const SERVICE_KIND_LABELS: Record<(typeof SERVICE_KINDS)[number], string> = {
  fitting: "Fitting",
  seasonal_swap: "Seasonal swap",
  rotation: "Rotation",
  balancing: "Balancing",
  alignment: "Alignment",
  puncture_repair: "Puncture repair",
  inspection: "Inspection",
};


/** The largest upload and the file types the logbook keeps (the purchase form checks them before sending). */
export const ATTACHMENT_MAX_BYTES = 10 * 1024 * 1024;
export const ATTACHMENT_TYPES = ["image/jpeg", "image/png", "image/webp", "application/pdf"] as const;
