import "server-only";
// Saving the reminder form, shared by the server action and the API route.
import type { z } from "zod";
import { optBackIn, reminderProfile, saveReminderSettings } from "@/db/queries/reminders";
import { notFound, plusRequired } from "@/lib/errors";
import { planAllows, planAllowsKind } from "@/lib/plan";
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
  // Free drivers may keep what they chose on Plus (deliveries and the feed check
  // the plan, so coming back needs no second visit), but may not switch a Plus
  // feature on: that is a 402 naming the upgrade page.
  const emailReminders = input.emailReminders;
  if (profile.plan !== "plus") {
    const stored = profile.settings;
    const sameList = (a: readonly number[], b: readonly number[]) => a.length === b.length && a.every((v, i) => v === b[i]);
    if (emailReminders && !profile.emailReminders) throw plusRequired("E-mail reminders", { emailReminders: ["Plus only"] });
    if (settings.alarmLeadDays.length > 0 && !sameList(settings.alarmLeadDays, stored.alarmLeadDays)) {
      throw plusRequired("Calendar alarms", { alarmLeadDays: ["Plus only"] });
    }
    const newPlusKinds = settings.kinds.filter((k) => !planAllowsKind({ plan: "free", kind: k }) && !stored.kinds.includes(k));
    if (newPlusKinds.length > 0) throw plusRequired("Seasonal swap and rotation reminders", { kinds: ["Plus only"] });
  }
  await saveReminderSettings({ userId, jurisdiction: input.jurisdiction, emailReminders, settings, timezone: input.timezone });
  // Ticking the box on the page is as clear a wish as the unsubscribe link was.
  if (emailReminders) await optBackIn({ userId, kind: "reminder-digest" });
  return { plan: profile.plan, emailReminders, emailActive: emailReminders && planAllows({ plan: profile.plan, feature: "email-reminders" }), settings };
}
