// A pass's lengths and scopes as the forms and lists show them (no zod),
// apart from ./labels so the logbook's pages do not carry them; re-exported
// by ./passes.

/** Preset lengths offered first; a custom length may go up to 30 days. */
export const PASS_PRESETS = [
  { value: "4h", label: "4 hours", hours: 4 },
  { value: "8h", label: "A working day (8 hours)", hours: 8 },
  { value: "24h", label: "24 hours", hours: 24 },
  { value: "3d", label: "3 days", hours: 72 },
  { value: "7d", label: "7 days", hours: 168 },
] as const;

export const passScopes = ["view", "view_add"] as const;
export type PassScope = (typeof passScopes)[number];

export const SCOPE_LABEL: Record<PassScope, string> = {
  view: "Read only",
  view_add: "Read and add entries",
};

/** The longest pass, in days. */
export const MAX_PASS_DAYS = 30;
