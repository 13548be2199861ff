// The signed-in driver's reminder settings (the same schema as the form).
import { reminderProfile } from "@/db/queries/reminders";
import { parseJson, route } from "@/lib/api/handler";
import { requireSession } from "@/lib/auth/roles";
import { notFound } from "@/lib/errors";
import { saveSettingsFor } from "@/lib/reminders/settings";
import { reminderSettingsFormSchema } from "@/lib/validation/reminders";

export const GET = route(async ({ session }) => {
  const s = requireSession(session);
  const profile = await reminderProfile({ userId: s.user.id });
  if (!profile) throw notFound("Your driver profile");
  // Everything PUT takes, so a client can read, change one field and write back.
  return { plan: profile.plan, jurisdiction: profile.jurisdiction, emailReminders: profile.emailReminders, timezone: profile.timezone, settings: profile.settings };
});

export const PUT = route(async ({ req, session }) => {
  const s = requireSession(session);
  const input = await parseJson(req, reminderSettingsFormSchema);
  return saveSettingsFor({ userId: s.user.id, input });
});
