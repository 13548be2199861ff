// Tomas keeps Ada's estate car's logbook with her (an accepted co-keeper).
import { and, eq } from "drizzle-orm";
import { randomBytes } from "node:crypto";
import { db } from "@/db";
import { vehicleKeeper } from "@/db/schema";
import { hashFeedToken } from "@/lib/reminders/token";
import type { SeedContext } from "../seed";
import { DEMO_VEHICLES, demoVehicleId } from "./logbook";

export async function seedHousehold({ ids }: SeedContext) {
  const carId = await demoVehicleId(ids.ada, DEMO_VEHICLES.adaCar);
  if (!carId) return;
  const [existing] = await db.select({ id: vehicleKeeper.id }).from(vehicleKeeper).where(and(eq(vehicleKeeper.vehicleId, carId), eq(vehicleKeeper.userId, ids.tomas))).limit(1);
  if (existing) return;
  const now = new Date();
  await db.insert(vehicleKeeper).values({
    vehicleId: carId,
    email: "tomas@renwick.test",
    userId: ids.tomas,
    invitedByUserId: ids.ada,
    // The demo's invitation was "accepted" long ago: its secret is thrown away.
    tokenHash: hashFeedToken(randomBytes(32).toString("base64url")),
    state: "active",
    expiresAt: now,
    acceptedAt: now,
  });
}
