// A driver's reminder settings: stored as JSON in driver_profile.reminder_settings
// (jurisdiction and the e-mail switch have their own columns) and edited by
// the form on /reminders. The same schema parses both.
import { z } from "zod";
import { decimalFromText } from "./text";
import { JURISDICTIONS, type Jurisdiction } from "@/lib/tires";

export { REMINDER_KINDS, REMINDER_KIND_LABELS, JURISDICTION_LABELS } from "./reminder-labels";
import { REMINDER_KINDS } from "./reminder-labels";

const monthDay = z
  .string()
  .trim()
  .regex(/^(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/, "Use month-day, for example 10-15 for 15 October.")
  .refine((md) => !Number.isNaN(Date.parse(`2024-${md}T00:00:00Z`)) && new Date(`2024-${md}T00:00:00Z`).getUTCDate() === Number(md.slice(3)), "That day does not exist in that month.");

/** Lead times (days before the date) for calendar alarms; at most three, each 0–180. */
const leadDays = z
  .array(z.preprocess(decimalFromText, z.coerce.number().int("Whole days only.").min(0, "At least 0 days.").max(180, "At most 180 days.")))
  .max(3, "At most three alarms.")
  .transform((a) => [...new Set(a)].sort((x, y) => y - x));

export const reminderSettingsSchema = z.object({
  kinds: z.array(z.enum(REMINDER_KINDS)).default([...REMINDER_KINDS]),
  alarmLeadDays: leadDays.default([14, 1]),
  /** How many days before an item its e-mail goes out (Plus). */
  emailLeadDays: z.preprocess(decimalFromText, z.coerce.number().int("Whole days only.").min(0, "At least 0 days.").max(180, "At most 180 days.").default(14)),
  customDepthMm: z.preprocess(decimalFromText, z.coerce.number().min(0.5, "At least 0.5 mm.").max(10, "At most 10 mm.").optional()),
  autumnSwap: monthDay.default("10-15"),
  springSwap: monthDay.default("04-15"),
  rotationIntervalKm: z.preprocess(decimalFromText, z.coerce.number().int("Whole kilometres only.").min(1000, "At least 1,000 km.").max(50_000, "At most 50,000 km.").default(10_000)),
});

export type StoredReminderSettings = z.output<typeof reminderSettingsSchema>;

export const DEFAULT_STORED_SETTINGS: StoredReminderSettings = reminderSettingsSchema.parse({});

/**
 * Whatever is in the JSON column becomes valid settings: a field that no
 * longer parses falls back to its default instead of breaking the feed.
 */
export function parseStoredSettings(raw: unknown): StoredReminderSettings {
  const obj = raw && typeof raw === "object" ? (raw as Record<string, unknown>) : {};
  const whole = reminderSettingsSchema.safeParse(obj);
  if (whole.success) return whole.data;
  const out: Record<string, unknown> = {};
  for (const [key, field] of Object.entries(reminderSettingsSchema.shape)) {
    const r = (field as z.ZodType).safeParse(obj[key]);
    if (r.success) out[key] = r.data;
  }
  return reminderSettingsSchema.parse(out);
}

const checkbox = z.preprocess((v) => v === "on" || v === "true" || v === true, z.boolean());
// Checkbox groups and repeated inputs arrive as arrays (with blanks for empty inputs) or as "14, 1".
const list = (v: unknown) =>
  Array.isArray(v)
    ? v.filter((x) => x !== "" && x != null && x !== false)
    : typeof v === "string"
      ? v.split(",").map((s) => s.trim()).filter(Boolean)
      : v == null || v === false
        ? []
        : v;

function validTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat("en-CA", { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

/** The settings form on /reminders (server action and client form). */
export const reminderSettingsFormSchema = z
  .object({
    jurisdiction: z.enum(JURISDICTIONS as [Jurisdiction, ...Jurisdiction[]], { message: "Choose a region." }),
    customDepthMm: z.preprocess((v) => (v === "" || v == null ? undefined : v), z.preprocess(decimalFromText, z.coerce.number().min(0.5, "At least 0.5 mm.").max(10, "At most 10 mm.").optional())),
    kinds: z.preprocess(list, z.array(z.enum(REMINDER_KINDS))),
    alarmLeadDays: z.preprocess(list, leadDays),
    emailLeadDays: z.preprocess(decimalFromText, z.coerce.number({ message: "Enter a number of days." }).int("Whole days only.").min(0, "At least 0 days.").max(180, "At most 180 days.")),
    autumnSwap: monthDay,
    springSwap: monthDay,
    rotationIntervalKm: z.preprocess(decimalFromText, z.coerce.number({ message: "Enter a distance in km." }).int("Whole kilometres only.").min(1000, "At least 1,000 km.").max(50_000, "At most 50,000 km.")),
    emailReminders: checkbox,
    timezone: z.string().trim().min(1, "Choose a time zone.").refine(validTimeZone, "That time zone is unknown."),
  })
  .refine((v) => v.jurisdiction !== "custom" || v.customDepthMm !== undefined, {
    path: ["customDepthMm"],
    message: "Enter your own depth limit, or choose a region.",
  });

export type ReminderSettingsForm = z.input<typeof reminderSettingsFormSchema>;
