// Reminder settings of the demo household: Ada is on Plus with e-mail
// reminders, two calendar alarms and every kind; Tomas keeps the Free feed.

import { eq } from "drizzle-orm";
import { db } from "@/db";
import { driverProfile } from "@/db/schema";
import type { SeedContext } from "../seed";

export async function seedReminders({ ids }: SeedContext) {
  await db
    .update(driverProfile)
    .set({
      emailReminders: true,
      timezone: "Europe/London",
      reminderSettings: {
        kinds: ["age-watch", "age-replace", "depth-limit", "seasonal-swap", "rotation-due"],
        alarmLeadDays: [14, 1],
        emailLeadDays: 14,
        autumnSwap: "10-15",
        springSwap: "04-15",
        rotationIntervalKm: 10_000,
      },
    })
    .where(eq(driverProfile.userId, ids.ada));
  await db.update(driverProfile).set({ emailReminders: false, timezone: "Europe/London" }).where(eq(driverProfile.userId, ids.tomas));

}
