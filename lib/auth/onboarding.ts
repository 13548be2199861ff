import "server-only";
import { db } from "@/db";
import { driverProfile } from "@/db/schema";

/** Side effects of a new account: every account gets a driver profile. */
export async function onboardNewUser({ userId }: { userId: string }) {
  await db.insert(driverProfile).values({ userId }).onConflictDoNothing();
}
