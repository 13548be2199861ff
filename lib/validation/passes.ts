// Shop passes: what a driver sends to issue or extend one. The same schemas
// check the route handlers' bodies and the forms in the browser.
import { z } from "zod";
import { decimalFromText } from "./text";

const HOUR_MS = 60 * 60 * 1000;

export { MAX_PASS_DAYS } from "./pass-labels";
import { MAX_PASS_DAYS } from "./pass-labels";
export const MAX_PASS_MS = MAX_PASS_DAYS * 24 * HOUR_MS;

export { PASS_PRESETS, passScopes, SCOPE_LABEL, type PassScope } from "./pass-labels";
import { PASS_PRESETS, passScopes } from "./pass-labels";

const presetValues = PASS_PRESETS.map((p) => p.value) as unknown as ["4h", "8h", "24h", "3d", "7d"];

const customDays = z.preprocess(
  (v) => (v === "" || v == null ? undefined : v),
  z.preprocess(decimalFromText, z.coerce
    .number({ error: "Enter a number of days." })
    .int("Use whole days.")
    .min(1, "A custom pass lasts at least 1 day.")
    .max(MAX_PASS_DAYS, `A pass lasts at most ${MAX_PASS_DAYS} days.`)
    .optional()),
);

const durationFields = {
  duration: z.enum([...presetValues, "custom"], { error: "Choose how long the pass lasts." }),
  customDays,
};

function requireCustomDays(v: { duration: string; customDays?: number }, ctx: z.RefinementCtx) {
  if (v.duration === "custom" && v.customDays == null) {
    ctx.addIssue({ code: "custom", path: ["customDays"], message: "Enter how many days, from 1 to 30." });
  }
}

export const issuePassSchema = z
  .object({
    shopId: z.string().trim().min(1, "Choose a shop from the directory."),
    vehicleIds: z
      .array(z.string().uuid("Choose one of your vehicles."), { error: "Choose at least one vehicle." })
      .min(1, "Choose at least one vehicle.")
      .max(20),
    scope: z.enum(passScopes, { error: "Choose what the shop may do." }),
    ...durationFields,
    note: z.preprocess(
      (v) => (typeof v === "string" && v.trim() === "" ? undefined : v),
      z.string().trim().max(500, "Keep the note under 500 characters.").optional(),
    ),
  })
  .superRefine(requireCustomDays);

export const extendPassSchema = z.object(durationFields).superRefine(requireCustomDays);

export type IssuePassInput = z.input<typeof issuePassSchema>;
export type ExtendPassInput = z.input<typeof extendPassSchema>;

/** The length in milliseconds a parsed duration stands for. */
export function durationMs(v: { duration: string; customDays?: number }): number {
  if (v.duration === "custom") return (v.customDays ?? 1) * 24 * HOUR_MS;
  const preset = PASS_PRESETS.find((p) => p.value === v.duration);
  return (preset?.hours ?? 4) * HOUR_MS;
}

export type PassState = "scheduled" | "active" | "expired" | "revoked";

/** A pass's state at `now`: revoked wins over expired, both over active. */
export function passState(p: { startsAt: Date; endsAt: Date; revokedAt: Date | null }, now: Date): PassState {
  if (p.revokedAt && p.revokedAt <= now) return "revoked";
  if (now >= p.endsAt) return "expired";
  if (now < p.startsAt) return "scheduled";
  return "active";
}

/** When a pass stopped working: its revocation, else its end. */
export function passEndedAt(p: { endsAt: Date; revokedAt: Date | null }): Date {
  return p.revokedAt && p.revokedAt < p.endsAt ? p.revokedAt : p.endsAt;
}

// Kept in its own module (no zod) so the pass timer does not ship the validation library to the browser.
export { formatTimeLeft } from "@/lib/time-left";
