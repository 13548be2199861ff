import "server-only";
// Saving the reminder form, shared by the server action and the API route.
import type { z } from "zod";
import { optBackIn, reminderProfile, saveReminderSettings } from "@/db/queries/reminders";
import { notFound } from "@/lib/errors";
import { planAllows } from "@/lib/plan";
import { reminderSettingsSchema, type reminderSettingsFormSchema } from "@/lib/validation/reminders";

export async function saveSettingsFor({ userId, input }: { userId: string; input: z.output<typeof reminderSettingsFormSchema> }) {
  const profile = await reminderProfile({ userId });
  if (!profile) throw notFound("Your driver profile");
  const settings = reminderSettingsSchema.parse({
    kinds: input.kinds,
    alarmLeadDays: input.alarmLeadDays,
    emailLeadDays: input.emailLeadDays,
    customDepthMm: input.customDepthMm,
    autumnSwap: input.autumnSwap,
    springSwap: input.springSwap,
    rotationIntervalKm: input.rotationIntervalKm,
  });
  // Free drivers may keep the switch on; deliveries check the plan, so an upgrade needs no second visit.
  const emailReminders = input.emailReminders;
  await saveReminderSettings({ userId, jurisdiction: input.jurisdiction, emailReminders, settings, timezone: input.timezone });
  // Ticking the box on the page is as clear a wish as the unsubscribe link was.
  if (emailReminders) await optBackIn({ userId, kind: "reminder-digest" });
  return { plan: profile.plan, emailReminders, emailActive: emailReminders && planAllows({ plan: profile.plan, feature: "email-reminders" }), settings };
}
