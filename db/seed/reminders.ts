// Reminder settings of the demo household: Ada is on Plus with e-mail
// reminders, two calendar alarms and every kind; Tomas keeps the Free feed.
//
// Until the logbook's own demo part gives Ada vehicles, this part adds one
// small vehicle of its own so that her feed and inbox have dates; once Ada
// has any vehicle, it adds nothing. All names are invented.
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { driverProfile, serviceEntry, tire, tireSet, treadCheck, treadReading, vehicle } from "@/db/schema";
import { addDays, addMonths, dotWeekOf, dotWeekStart, formatDotDateCode } from "@/lib/tires";
import type { SeedContext } from "../seed";

export async function seedReminders({ ids, today }: SeedContext) {
  await db
    .update(driverProfile)
    .set({
      plan: "plus",
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
  await db.update(driverProfile).set({ plan: "free", emailReminders: false, timezone: "Europe/London" }).where(eq(driverProfile.userId, ids.tomas));

  const [hasVehicle] = await db.select({ id: vehicle.id }).from(vehicle).where(eq(vehicle.ownerId, ids.ada)).limit(1);
  if (!hasVehicle) await fallbackLogbook(ids.ada, today);
}

/** A DOT date code for a tire made around `iso`, and the decoded week. */
function dotFor(iso: string) {
  const w = dotWeekOf(iso)!;
  return { dotCode: `DOT QF7 RNWK01 ${formatDotDateCode(w.week, w.year)}`, dotWeek: w.week, dotYear: w.year, dotWeekStart: dotWeekStart(w.week, w.year), dotPrecision: "week" };
}

const FOUR = ["front_left", "front_right", "rear_left", "rear_right"] as const;

async function fallbackLogbook(ownerId: string, today: string) {
  await db.transaction(async (tx) => {
    const [v] = await tx
      .insert(vehicle)
      .values({ ownerId, nickname: "Heron", make: "Velora", model: "Arden Touring", year: 2019, placardFrontSize: "205/55R16 91V", placardRearSize: "205/55R16 91V" })
      .returning({ id: vehicle.id });
    // Summer set on the car: made 3 years ago, checked twice; the rotation comes due about now.
    const [summer] = await tx
      .insert(tireSet)
      .values({ vehicleId: v.id, label: "Brightway summer", kind: "summer", size: "205/55R16 91V", loadIndex: 91, speedSymbol: "V", state: "mounted", purchasedOn: addMonths(today, -34) })
      .returning({ id: tireSet.id });
    const summerTires = await tx
      .insert(tire)
      .values(FOUR.map((position) => ({ setId: summer.id, position, newDepthMm: 8, ...dotFor(addMonths(today, -36)) })))
      .returning({ id: tire.id });
    await tx.insert(serviceEntry).values({ vehicleId: v.id, setId: summer.id, kind: "fitting", performedOn: addDays(today, -200), odometerKm: 20_000 });
    for (const [on, odometerKm, mm] of [
      [addDays(today, -200), 20_000, 6.4],
      [addDays(today, -10), 29_500, 5.5],
    ] as const) {
      const [c] = await tx.insert(treadCheck).values({ vehicleId: v.id, setId: summer.id, checkedOn: on, odometerKm }).returning({ id: treadCheck.id });
      await tx.insert(treadReading).values(summerTires.map((t) => ({ checkId: c.id, tireId: t.id, innerMm: mm, centreMm: mm + 0.3, outerMm: mm + 0.2 })));
    }
    // Winter set in storage: four years old ten days ago, so its yearly inspection is due.
    const [winter] = await tx
      .insert(tireSet)
      .values({ vehicleId: v.id, label: "Snowmere winter", kind: "winter", size: "205/55R16 91H", loadIndex: 91, speedSymbol: "H", state: "stored", storageLocation: "Garage loft" })
      .returning({ id: tireSet.id });
    await tx.insert(tire).values(FOUR.map((position) => ({ setId: winter.id, position, newDepthMm: 9, ...dotFor(addDays(addMonths(today, -48), -10)) })));
  });
}
