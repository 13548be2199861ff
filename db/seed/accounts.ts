// The invented household, shop and operator of the demo. No real people,
// brands, shops or places.
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { driverProfile, member, organization, shopProfile, user } from "@/db/schema";
import { auth } from "@/lib/auth/server";
import { DEMO_PASSWORD, DEMO_SHOP, demoAccounts } from "./demo-accounts";

export { DEMO_PASSWORD, DEMO_SHOP, demoAccounts };

export type DemoIds = { -readonly [K in keyof typeof demoAccounts]: string } & { shopId: string };

async function ensureUser(name: string, email: string): Promise<string> {
  const [existing] = await db.select({ id: user.id }).from(user).where(eq(user.email, email)).limit(1);
  if (existing) return existing.id;
  const res = await auth.api.signUpEmail({ body: { name, email, password: DEMO_PASSWORD } });
  await db.update(user).set({ emailVerified: true }).where(eq(user.id, res.user.id));
  return res.user.id;
}

export async function seedAccounts(): Promise<DemoIds> {
  const ids = {} as DemoIds;
  for (const [key, a] of Object.entries(demoAccounts) as [keyof typeof demoAccounts, (typeof demoAccounts)[keyof typeof demoAccounts]][]) {
    ids[key] = await ensureUser(a.name, a.email);
  }
  await db.update(user).set({ role: "admin" }).where(eq(user.id, ids.ops));
  await db.update(driverProfile).set({ emailReminders: true }).where(eq(driverProfile.userId, ids.ada));

  await db
    .insert(organization)
    .values({ id: DEMO_SHOP.id, name: DEMO_SHOP.name, slug: DEMO_SHOP.slug })
    .onConflictDoNothing();
  await db
    .insert(shopProfile)
    .values({ shopId: DEMO_SHOP.id, town: DEMO_SHOP.town, address: DEMO_SHOP.address, phone: DEMO_SHOP.phone, email: DEMO_SHOP.email })
    .onConflictDoNothing();
  await db
    .insert(member)
    .values([
      { id: "member_demo_wren", organizationId: DEMO_SHOP.id, userId: ids.wren, role: "owner" },
      { id: "member_demo_jo", organizationId: DEMO_SHOP.id, userId: ids.jo, role: "technician" },
    ])
    .onConflictDoNothing();
  ids.shopId = DEMO_SHOP.id;
  return ids;
}
