// The invented household, shop and operator of the demo. No real people,
// brands, shops or places.
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { driverProfile, member, organization, shopProfile, user } from "@/db/schema";
import { auth } from "@/lib/auth/server";

export const DEMO_PASSWORD = "tread-carefully-26";

export const demoAccounts = {
  ada: { name: "Ada Renwick", email: "ada@renwick.test", role: "driver (Plus plan)" },
  tomas: { name: "Tomas Renwick", email: "tomas@renwick.test", role: "driver (Free plan)" },
  wren: { name: "Wren Halloway", email: "wren@quillby-tread.test", role: "shop owner" },
  jo: { name: "Jo Marsh", email: "jo@quillby-tread.test", role: "technician" },
  ops: { name: "Fourpatch Operations", email: "ops@fourpatch.test", role: "admin" },
} as const;

export type DemoIds = { -readonly [K in keyof typeof demoAccounts]: string } & { shopId: string };

export const DEMO_SHOP = {
  id: "shop_quillby_tread_works",
  name: "Quillby Tread Works",
  slug: "quillby-tread-works",
  town: "Quillby Ford",
  address: "4 Kettle Lane, Quillby Ford",
  phone: "+00 555 0142",
  email: "desk@quillby-tread.test",
};

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
  await db.update(driverProfile).set({ plan: "plus", emailReminders: true }).where(eq(driverProfile.userId, ids.ada));

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
