import "server-only";
// Who may do what. Every check here runs on the server for every request;
// pages hide what a role cannot use, but hiding is never the check.
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { member, organization } from "@/db/schema";
import { AppError, forbidden, unauthenticated } from "@/lib/errors";
import type { ShopRole } from "./access";
import type { Session } from "./session";

export type Membership = { shopId: string; shopName: string; shopSlug: string; role: ShopRole };

export function isAdmin(session: Session | null): boolean {
  return !!session && session.user.role === "admin";
}

export async function membershipsOf({ userId }: { userId: string }): Promise<Membership[]> {
  const rows = await db
    .select({ shopId: organization.id, shopName: organization.name, shopSlug: organization.slug, role: member.role })
    .from(member)
    .innerJoin(organization, eq(member.organizationId, organization.id))
    .where(eq(member.userId, userId))
    .orderBy(organization.name);
  return rows.map((r) => ({ ...r, role: r.role === "owner" ? "owner" : "technician" }));
}

export async function membershipIn({ userId, shopId }: { userId: string; shopId: string }): Promise<Membership | null> {
  const rows = await db
    .select({ shopId: organization.id, shopName: organization.name, shopSlug: organization.slug, role: member.role })
    .from(member)
    .innerJoin(organization, eq(member.organizationId, organization.id))
    .where(and(eq(member.userId, userId), eq(member.organizationId, shopId)))
    .limit(1);
  const r = rows[0];
  return r ? { ...r, role: r.role === "owner" ? "owner" : "technician" } : null;
}

export function requireSession(session: Session | null): Session {
  if (!session) throw unauthenticated();
  if (session.user.banned) throw new AppError("forbidden", "This account is disabled.");
  return session;
}

export function requireAdmin(session: Session | null): Session {
  const s = requireSession(session);
  if (!isAdmin(s)) throw forbidden("Only the operators of Fourpatch can open this.");
  return s;
}

/** The acting user's membership of a shop, optionally with the owner role. */
export async function requireShopMember(
  session: Session | null,
  { shopId, role }: { shopId: string; role?: "owner" },
): Promise<{ session: Session; membership: Membership }> {
  const s = requireSession(session);
  const membership = await membershipIn({ userId: s.user.id, shopId });
  // A shop a user does not belong to is reported as absent, not as forbidden.
  if (!membership) throw new AppError("not_found", "That shop was not found.");
  if (role === "owner" && membership.role !== "owner") throw forbidden("Only the shop's owner can do that.");
  return { session: s, membership };
}

/** Where a freshly signed-in account lands. */
export async function homeFor(session: Session): Promise<string> {
  if (isAdmin(session)) return "/admin";
  const shops = await membershipsOf({ userId: session.user.id });
  return shops.length > 0 ? "/shop" : "/vehicles";
}
