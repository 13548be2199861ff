import "server-only";
// The operators' console: metadata about accounts and shops (never the
// contents of a logbook), disabling and re-enabling accounts, and the
// append-only audit log of every operator action. Lists are cursor-paged so
// a page never grows with the number of accounts.
import { and, count, desc, eq, ilike, lt, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { driverProfile, member, operatorAudit, organization, session as sessionTable, shopProfile, user, vehicle } from "@/db/schema";
import type { Session } from "@/lib/auth/session";
import { requireAdmin } from "@/lib/auth/roles";
import { plusSql } from "./billing";
import { AppError, notFound } from "@/lib/errors";

export const PAGE_SIZE = 25;

/** A cursor is the last row's sort key, opaque to the browser. */
function encodeCursor(parts: string[]) {
  return Buffer.from(JSON.stringify(parts), "utf8").toString("base64url");
}
function decodeCursor(cursor: string | null | undefined, n: number): string[] | null {
  if (!cursor) return null;
  try {
    const parts = JSON.parse(Buffer.from(cursor, "base64url").toString("utf8"));
    if (Array.isArray(parts) && parts.length === n && parts.every((p) => typeof p === "string" && p.length < 300)) return parts;
  } catch {
    /* fall through */
  }
  throw new AppError("invalid", "That page link is not valid; start from the first page.", { cursor: ["Not a valid cursor."] });
}

/** `%` and `_` typed in a search are letters, not wildcards. */
const likeTerm = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
const cleanQuery = (q: string | null | undefined) => (q ?? "").replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(0, 100);

export type AccountRow = {
  id: string;
  name: string;
  email: string;
  role: string | null;
  banned: boolean;
  createdAt: string;
  plan: "free" | "plus" | null;
  shops: number;
  vehicles: number;
};

export async function searchAccounts({ actor, q, cursor }: { actor: Session | null; q?: string | null; cursor?: string | null }): Promise<{ rows: AccountRow[]; next: string | null }> {
  requireAdmin(actor);
  const term = cleanQuery(q);
  const after = decodeCursor(cursor, 2);
  const filters: (SQL | undefined)[] = [term ? or(ilike(user.name, likeTerm(term)), ilike(user.email, likeTerm(term))) : undefined];
  if (after) {
    const at = new Date(after[0]);
    if (Number.isNaN(at.getTime())) throw new AppError("invalid", "That page link is not valid.", { cursor: ["Not a valid cursor."] });
    filters.push(or(lt(user.createdAt, at), and(eq(user.createdAt, at), lt(user.id, after[1]))));
  }
  const rows = await db
    .select({
      id: user.id,
      name: user.name,
      email: user.email,
      role: user.role,
      banned: user.banned,
      createdAt: user.createdAt,
      plan: sql<"plus" | "free">`case when ${plusSql(user.id)} then 'plus' else 'free' end`,
      shops: sql<number>`(select count(*)::int from ${member} where ${member.userId} = ${user.id})`,
      vehicles: sql<number>`(select count(*)::int from ${vehicle} where ${vehicle.ownerId} = ${user.id})`,
    })
    .from(user)
    .leftJoin(driverProfile, eq(driverProfile.userId, user.id))
    .where(and(...filters))
    .orderBy(desc(user.createdAt), desc(user.id))
    .limit(PAGE_SIZE + 1);
  const page = rows.slice(0, PAGE_SIZE);
  const last = page.at(-1);
  return {
    rows: page.map((r) => ({ ...r, banned: !!r.banned, createdAt: r.createdAt.toISOString() })),
    next: rows.length > PAGE_SIZE && last ? encodeCursor([last.createdAt.toISOString(), last.id]) : null,
  };
}

export type ShopRow = { id: string; name: string; town: string | null; createdAt: string; staff: number };

export async function searchShops({ actor, q, cursor }: { actor: Session | null; q?: string | null; cursor?: string | null }): Promise<{ rows: ShopRow[]; next: string | null }> {
  requireAdmin(actor);
  const term = cleanQuery(q);
  const after = decodeCursor(cursor, 2);
  const rows = await db
    .select({
      id: organization.id,
      name: organization.name,
      town: shopProfile.town,
      createdAt: organization.createdAt,
      staff: sql<number>`(select count(*)::int from ${member} where ${member.organizationId} = ${organization.id})`,
    })
    .from(organization)
    .leftJoin(shopProfile, eq(shopProfile.shopId, organization.id))
    .where(
      and(
        term ? or(ilike(organization.name, likeTerm(term)), ilike(shopProfile.town, likeTerm(term))) : undefined,
        after ? or(sql`${organization.name} > ${after[0]}`, and(eq(organization.name, after[0]), sql`${organization.id} > ${after[1]}`)) : undefined,
      ),
    )
    .orderBy(organization.name, organization.id)
    .limit(PAGE_SIZE + 1);
  const page = rows.slice(0, PAGE_SIZE);
  const last = page.at(-1);
  return {
    rows: page.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() })),
    next: rows.length > PAGE_SIZE && last ? encodeCursor([last.name, last.id]) : null,
  };
}

/** The figures at the top of the console. */
export async function operatorCounts({ actor }: { actor: Session | null }) {
  requireAdmin(actor);
  const [[accounts], [disabled], [plus], [shops], [vehicles]] = await Promise.all([
    db.select({ n: count() }).from(user),
    db.select({ n: count() }).from(user).where(eq(user.banned, true)),
    db.select({ n: count() }).from(user).where(plusSql(user.id)),
    db.select({ n: count() }).from(organization),
    db.select({ n: count() }).from(vehicle),
  ]);
  return { accounts: accounts.n, disabled: disabled.n, plus: plus.n, shops: shops.n, vehicles: vehicles.n };
}

/**
 * Disables or re-enables an account, and writes the audit entry in the same
 * transaction. Disabling ends every session at once; sign-in is refused
 * while disabled (better-auth's admin plugin reads `banned`), and the
 * account's passes and calendar feed stop (checked where they are used).
 */
export async function setAccountDisabled({ actor, userId, disable, now = new Date() }: { actor: Session | null; userId: string; disable: boolean; now?: Date }) {
  const op = requireAdmin(actor);
  if (userId === op.user.id) throw new AppError("conflict", "You cannot disable your own operator account.");
  return db.transaction(async (tx) => {
    const [target] = await tx.select({ id: user.id, email: user.email, banned: user.banned }).from(user).where(eq(user.id, userId)).for("update").limit(1);
    if (!target) throw notFound("That account");
    await tx
      .update(user)
      .set(disable ? { banned: true, banReason: "Disabled by an operator", banExpires: null, updatedAt: now } : { banned: false, banReason: null, banExpires: null, updatedAt: now })
      .where(eq(user.id, userId));
    if (disable) await tx.delete(sessionTable).where(eq(sessionTable.userId, userId));
    await tx.insert(operatorAudit).values({
      actorUserId: op.user.id,
      actorEmail: op.user.email,
      action: disable ? "disable_account" : "enable_account",
      targetKind: "account",
      targetId: userId,
      targetLabel: target.email,
      detail: disable ? (target.banned ? "was already disabled" : null) : !target.banned ? "was already enabled" : null,
      at: now,
    });
    return { userId, disabled: disable };
  });
}

export type AuditRow = { id: string; at: string; actorEmail: string; action: string; targetKind: string; targetLabel: string | null; targetId: string; detail: string | null };

export async function readAudit({ actor, cursor }: { actor: Session | null; cursor?: string | null }): Promise<{ rows: AuditRow[]; next: string | null }> {
  requireAdmin(actor);
  const after = decodeCursor(cursor, 2);
  const at = after ? new Date(after[0]) : null;
  if (at && Number.isNaN(at.getTime())) throw new AppError("invalid", "That page link is not valid.", { cursor: ["Not a valid cursor."] });
  const rows = await db
    .select()
    .from(operatorAudit)
    .where(at && after ? or(lt(operatorAudit.at, at), and(eq(operatorAudit.at, at), lt(operatorAudit.id, after[1]))) : undefined)
    .orderBy(desc(operatorAudit.at), desc(operatorAudit.id))
    .limit(PAGE_SIZE + 1);
  const page = rows.slice(0, PAGE_SIZE);
  const last = page.at(-1);
  return {
    rows: page.map((r) => ({ id: r.id, at: r.at.toISOString(), actorEmail: r.actorEmail, action: r.action, targetKind: r.targetKind, targetLabel: r.targetLabel, targetId: r.targetId, detail: r.detail })),
    next: rows.length > PAGE_SIZE && last ? encodeCursor([last.at.toISOString(), last.id]) : null,
  };
}
