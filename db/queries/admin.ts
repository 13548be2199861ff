import "server-only";
import { count, desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { driverProfile, member, organization, shopProfile, user } from "@/db/schema";
import type { Session } from "@/lib/auth/session";
import { requireAdmin } from "@/lib/auth/roles";
import { plusSql } from "./billing";

export async function listAccounts({ actor }: { actor: Session | null }) {
  requireAdmin(actor);
  return db
    .select({
      id: user.id,
      name: user.name,
      email: user.email,
      role: user.role,
      banned: user.banned,
      createdAt: user.createdAt,
      plan: sql<"plus" | "free">`case when ${plusSql(user.id)} then 'plus' else 'free' end`,
      shops: sql<number>`(select count(*)::int from ${member} where ${member.userId} = ${user.id})`,
    })
    .from(user)
    .leftJoin(driverProfile, eq(driverProfile.userId, user.id))
    .orderBy(desc(user.createdAt));
}

export async function listShops({ actor }: { actor: Session | null }) {
  requireAdmin(actor);
  return db
    .select({
      id: organization.id,
      name: organization.name,
      town: shopProfile.town,
      createdAt: organization.createdAt,
      staff: count(member.id),
    })
    .from(organization)
    .leftJoin(shopProfile, eq(shopProfile.shopId, organization.id))
    .leftJoin(member, eq(member.organizationId, organization.id))
    .groupBy(organization.id, shopProfile.town)
    .orderBy(organization.name);
}
