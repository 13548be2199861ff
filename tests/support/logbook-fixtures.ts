// Logbook rows written straight through Drizzle, for tests that need a
// driver's vehicles, sets, tires and tread checks without the logbook UI.
// All names are invented.
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { billingSubscription, driverProfile, tire, tireSet, treadCheck, treadReading, vehicle } from "@/db/schema";

type Position = (typeof tire.$inferInsert)["position"];
const FOUR: Position[] = ["front_left", "front_right", "rear_left", "rear_right"];

export type FixtureSet = {
  label: string;
  kind: (typeof tireSet.$inferInsert)["kind"];
  state?: (typeof tireSet.$inferInsert)["state"];
  size?: string;
  /** One DOT code for all four tires (a set bought together). */
  dotCode: string;
  /** Tread checks: every tire gets the same grooves unless `perTire` says otherwise. */
  checks?: { on: string; odometerKm: number; mm: number; perTire?: Partial<Record<Position, number>> }[];
};

export async function addVehicle({ ownerId, nickname, make = "Korvan", model = "Estate", sets }: { ownerId: string; nickname: string; make?: string; model?: string; sets: FixtureSet[] }) {
  const [v] = await db.insert(vehicle).values({ ownerId, nickname, make, model, year: 2021 }).returning({ id: vehicle.id });
  const setIds: Record<string, string> = {};
  const tireIds: Record<string, Record<Position, string>> = {};
  for (const s of sets) {
    const [row] = await db
      .insert(tireSet)
      .values({ vehicleId: v.id, label: s.label, kind: s.kind, state: s.state ?? "mounted", size: s.size ?? "205/55R16 91V" })
      .returning({ id: tireSet.id });
    setIds[s.label] = row.id;
    const tires = await db
      .insert(tire)
      .values(FOUR.map((position) => ({ setId: row.id, position, dotCode: s.dotCode })))
      .returning({ id: tire.id, position: tire.position });
    tireIds[s.label] = Object.fromEntries(tires.map((t) => [t.position, t.id])) as Record<Position, string>;
    for (const c of s.checks ?? []) await addCheck({ vehicleId: v.id, setId: row.id, tires: tireIds[s.label], ...c });
  }
  return { vehicleId: v.id, setIds, tireIds };
}

export async function addCheck({
  vehicleId,
  setId,
  tires,
  on,
  odometerKm,
  mm,
  perTire = {},
}: {
  vehicleId: string;
  setId: string;
  tires: Record<Position, string>;
  on: string;
  odometerKm: number;
  mm: number;
  perTire?: Partial<Record<Position, number>>;
}) {
  const [check] = await db.insert(treadCheck).values({ vehicleId, setId, checkedOn: on, odometerKm }).returning({ id: treadCheck.id });
  await db.insert(treadReading).values(
    Object.entries(tires).map(([position, tireId]) => {
      const d = perTire[position as Position] ?? mm;
      return { checkId: check.id, tireId, innerMm: d, centreMm: d + 0.2, outerMm: d + 0.1 };
    }),
  );
  return check.id;
}

export async function setPlan({ userId, plan, emailReminders, settings, timezone }: { userId: string; plan?: "free" | "plus"; emailReminders?: boolean; settings?: Record<string, unknown>; timezone?: string }) {
  // The plan comes from the stored subscription: Plus is an active one running for 30 more days.
  if (plan === "free") await db.delete(billingSubscription).where(eq(billingSubscription.userId, userId));
  if (plan === "plus") {
    const now = new Date();
    await db
      .insert(billingSubscription)
      .values({
        stripeSubscriptionId: `sub_fixture_${userId}`,
        userId,
        stripeCustomerId: `cus_fixture_${userId}`,
        status: "active",
        interval: "month",
        currentPeriodEnd: new Date(now.getTime() + 30 * 86_400_000),
        describedAt: now,
      })
      .onConflictDoUpdate({ target: billingSubscription.stripeSubscriptionId, set: { status: "active", currentPeriodEnd: new Date(now.getTime() + 30 * 86_400_000), describedAt: now } });
  }
  if (emailReminders === undefined && !settings && !timezone) return;
  await db
    .update(driverProfile)
    .set({
      ...(emailReminders !== undefined ? { emailReminders } : {}),
      ...(settings ? { reminderSettings: settings } : {}),
      ...(timezone ? { timezone } : {}),
    })
    .where(eq(driverProfile.userId, userId));
}

/** The household logbook most reminder tests use (see the expectations beside each test). */
export async function renwickStyleLogbook(ownerId: string) {
  return addVehicle({
    ownerId,
    nickname: "Blue estate",
    sets: [
      {
        label: "Meadowline summer",
        kind: "summer",
        dotCode: "DOT XB3 ABCDEF 2523",
        checks: [
          { on: "2025-09-10", odometerKm: 20_000, mm: 7.0 },
          { on: "2026-03-01", odometerKm: 30_000, mm: 6.0 },
        ],
      },
      { label: "Frostvale winter", kind: "winter", state: "stored", dotCode: "0722" },
    ],
  });
}
