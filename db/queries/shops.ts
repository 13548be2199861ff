import "server-only";
// Shops (better-auth organizations with a profile row): creating one, its
// profile and staff, invitations, and the directory drivers choose from.
// Owner-only actions check the role here, on the server, every time.
import { randomUUID } from "node:crypto";
import { and, asc, eq, ilike, isNull, ne, or } from "drizzle-orm";
import { db } from "@/db";
import { invitation, member, organization, shopProfile, user } from "@/db/schema";
import { requireSession, requireShopMember } from "@/lib/auth/roles";
import { auth } from "@/lib/auth/server";
import type { Session } from "@/lib/auth/session";
import { AppError, notFound } from "@/lib/errors";

type ProfileInput = { name: string; town: string; address?: string; phone?: string; email?: string; about?: string };

function slugify(name: string) {
  const base = name
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 40);
  return `${base || "shop"}-${randomUUID().slice(0, 6)}`;
}

/**
 * A user opens a shop and becomes its owner: the organization, the owner's
 * membership and the profile are written in one transaction.
 */
export async function createShop({ session, input }: { session: Session | null; input: ProfileInput }) {
  const s = requireSession(session);
  const id = `shop_${randomUUID()}`;
  await db.transaction(async (tx) => {
    await tx.insert(organization).values({ id, name: input.name, slug: slugify(input.name) });
    await tx.insert(member).values({ id: `member_${randomUUID()}`, organizationId: id, userId: s.user.id, role: "owner" });
    await tx.insert(shopProfile).values({
      shopId: id,
      town: input.town,
      address: input.address ?? null,
      phone: input.phone ?? null,
      email: input.email ?? null,
      about: input.about ?? null,
    });
  });
  return { id };
}

export async function updateShopProfile({ session, shopId, input }: { session: Session | null; shopId: string; input: ProfileInput }) {
  await requireShopMember(session, { shopId, role: "owner" });
  await db.transaction(async (tx) => {
    await tx.update(organization).set({ name: input.name }).where(eq(organization.id, shopId));
    await tx
      .update(shopProfile)
      .set({
        town: input.town,
        address: input.address ?? null,
        phone: input.phone ?? null,
        email: input.email ?? null,
        about: input.about ?? null,
        updatedAt: new Date(),
      })
      .where(eq(shopProfile.shopId, shopId));
  });
  return { id: shopId };
}

/** The shop's profile, staff and open invitations, for its owner. */
export async function getShopForOwner({ session, shopId, now }: { session: Session | null; shopId: string; now: Date }) {
  const { membership } = await requireShopMember(session, { shopId, role: "owner" });
  const [profile] = await db
    .select({
      id: organization.id,
      name: organization.name,
      town: shopProfile.town,
      address: shopProfile.address,
      phone: shopProfile.phone,
      email: shopProfile.email,
      about: shopProfile.about,
    })
    .from(organization)
    .leftJoin(shopProfile, eq(shopProfile.shopId, organization.id))
    .where(eq(organization.id, shopId));
  const staff = await db
    .select({ memberId: member.id, userId: user.id, name: user.name, email: user.email, role: member.role, since: member.createdAt })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, shopId))
    .orderBy(asc(member.createdAt));
  const invitations = await db
    .select({ id: invitation.id, email: invitation.email, expiresAt: invitation.expiresAt, status: invitation.status })
    .from(invitation)
    .where(and(eq(invitation.organizationId, shopId), eq(invitation.status, "pending")))
    .orderBy(asc(invitation.createdAt));
  return {
    membership,
    profile,
    staff: staff.map((m) => ({ ...m, role: m.role === "owner" ? ("owner" as const) : ("technician" as const) })),
    invitations: invitations.map((i) => ({ ...i, expired: i.expiresAt <= now })),
  };
}

/**
 * The owner invites a technician by e-mail. better-auth keeps the invitation
 * and sends the e-mail (lib/auth/invitations.ts) with a link to /join/<id>.
 */
export async function inviteTechnician({ session, headers, shopId, email }: { session: Session | null; headers: Headers; shopId: string; email: string }) {
  await requireShopMember(session, { shopId, role: "owner" });
  const [already] = await db
    .select({ id: member.id })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(and(eq(member.organizationId, shopId), eq(user.email, email)))
    .limit(1);
  if (already) throw new AppError("conflict", "That person already works at the shop.", { email: ["Already on the staff."] });
  try {
    const inv = await auth.api.createInvitation({ body: { email, role: "technician", organizationId: shopId, resend: true }, headers });
    return { id: inv.id, email: inv.email, expiresAt: inv.expiresAt };
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    throw new AppError("conflict", `The invitation could not be sent: ${message}`, { email: [message] });
  }
}

/** The owner takes a technician off the staff; the owner cannot be removed. */
export async function removeStaff({ session, shopId, memberId }: { session: Session | null; shopId: string; memberId: string }) {
  await requireShopMember(session, { shopId, role: "owner" });
  const [row] = await db
    .select({ id: member.id, role: member.role })
    .from(member)
    .where(and(eq(member.id, memberId), eq(member.organizationId, shopId)))
    .limit(1);
  if (!row) throw notFound("That staff member");
  if (row.role === "owner") throw new AppError("conflict", "The owner cannot be removed from the shop.");
  await db.delete(member).where(and(eq(member.id, memberId), eq(member.organizationId, shopId), ne(member.role, "owner")));
  return { removed: memberId };
}

/** The owner withdraws an invitation that was not used yet. */
export async function cancelInvitation({ session, shopId, invitationId }: { session: Session | null; shopId: string; invitationId: string }) {
  await requireShopMember(session, { shopId, role: "owner" });
  const rows = await db
    .update(invitation)
    .set({ status: "canceled" })
    .where(and(eq(invitation.id, invitationId), eq(invitation.organizationId, shopId), eq(invitation.status, "pending")))
    .returning({ id: invitation.id });
  if (rows.length === 0) throw notFound("That invitation");
  return { canceled: invitationId };
}

export type InvitationView = {
  id: string;
  shopName: string;
  email: string;
  state: "open" | "used" | "expired" | "canceled";
  expiresAt: Date;
};

/** What the /join page shows: anyone holding the link may see whom it is for. */
export async function getInvitation({ invitationId, now }: { invitationId: string; now: Date }): Promise<InvitationView | null> {
  if (!/^[A-Za-z0-9_-]{8,64}$/.test(invitationId)) return null;
  const [row] = await db
    .select({ id: invitation.id, email: invitation.email, status: invitation.status, expiresAt: invitation.expiresAt, shopName: organization.name })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .where(eq(invitation.id, invitationId))
    .limit(1);
  if (!row) return null;
  const state: InvitationView["state"] =
    row.status === "accepted" ? "used" : row.status === "pending" ? (row.expiresAt <= now ? "expired" : "open") : "canceled";
  return { id: row.id, shopName: row.shopName, email: row.email, state, expiresAt: row.expiresAt };
}

/** The invited person, signed in with the invited address, joins the shop once. */
export async function acceptInvitation({ session, headers, invitationId, now }: { session: Session | null; headers: Headers; invitationId: string; now: Date }) {
  const s = requireSession(session);
  const inv = await getInvitation({ invitationId, now });
  if (!inv) throw notFound("That invitation");
  if (inv.state === "used") throw new AppError("conflict", "This invitation was already used. Sign in with the account that accepted it.");
  if (inv.state === "expired") throw new AppError("conflict", "This invitation has expired. Ask the shop's owner to send a new one.");
  if (inv.state === "canceled") throw new AppError("conflict", "This invitation was withdrawn by the shop.");
  if (inv.email.toLowerCase() !== s.user.email.toLowerCase()) {
    throw new AppError("forbidden", `This invitation is for ${inv.email}. Sign in with that address to accept it.`);
  }
  try {
    await auth.api.acceptInvitation({ body: { invitationId }, headers });
  } catch (err) {
    throw new AppError("conflict", `The invitation could not be accepted: ${err instanceof Error ? err.message : String(err)}`);
  }
  return { shopName: inv.shopName };
}

/** The public directory: shops by name or town. */
export async function searchShops({ q, limit = 30 }: { q: string; limit?: number }) {
  const term = q.trim().replace(/[%_\\]/g, (c) => `\\${c}`);
  return db
    .select({
      id: organization.id,
      name: organization.name,
      town: shopProfile.town,
      address: shopProfile.address,
      phone: shopProfile.phone,
      email: shopProfile.email,
    })
    .from(organization)
    .innerJoin(shopProfile, eq(shopProfile.shopId, organization.id))
    .where(term ? or(ilike(organization.name, `%${term}%`), ilike(shopProfile.town, `%${term}%`)) : undefined)
    .orderBy(asc(shopProfile.town), asc(organization.name))
    .limit(limit);
}

/**
 * The shops whose staff this account joined (an accepted invitation to its
 * e-mail) and has since left or been removed from: the shop workspace says so
 * instead of a bare "not for this account".
 */
export async function formerShopsOf({ userId, email }: { userId: string; email: string }): Promise<string[]> {
  const rows = await db
    .selectDistinct({ name: organization.name })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .leftJoin(member, and(eq(member.organizationId, invitation.organizationId), eq(member.userId, userId)))
    .where(and(eq(invitation.email, email.toLowerCase()), eq(invitation.status, "accepted"), isNull(member.id)));
  return rows.map((r) => r.name);
}
