import "server-only";
// Shop passes: a driver's time-limited grant to one shop for some of the
// driver's vehicles. The rules live here, in one place: who may issue,
// extend and revoke (the driver who owns the pass), who may use one (a member
// of the pass's shop, while it has started, has not ended and is not
// revoked), and what each side sees. The clock is always passed in.
import { and, asc, desc, eq, gt, inArray, isNotNull, isNull, lt, lte, or, sql } from "drizzle-orm";
import { z } from "zod";
import { createElement } from "react";
import { db } from "@/db";
import { accessLog, driverProfile, member, organization, serviceEntry, shopPass, shopPassVehicle, treadCheck, user, vehicle } from "@/db/schema";
import { assertVehicleAccess } from "@/db/queries/access";
import PassEndedEmail from "@/emails/pass-ended";
import PassReceivedEmail from "@/emails/pass-received";
import ShopEntryEmail from "@/emails/shop-entry";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { membershipIn, membershipsOf, requireSession } from "@/lib/auth/roles";
import type { Session } from "@/lib/auth/session";
import { sendEmail } from "@/lib/email/send";
import { appUrl } from "@/lib/env";
import { AppError, forbidden, notFound } from "@/lib/errors";
import { decodeCursor, DEFAULT_PAGE, encodeCursor, timeIdCursor } from "@/lib/api/cursor";
import { formatter, prefsFrom, type FormatPrefs } from "@/lib/format";
import { requestPrefs } from "@/lib/format/server";
import {
  durationMs,
  MAX_PASS_DAYS,
  MAX_PASS_MS,
  passEndedAt,
  passState,
  SCOPE_LABEL,
  type PassScope,
  type PassState,
} from "@/lib/validation/passes";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** How long an ended pass stays, greyed, in the shop's list. */
export const ENDED_VISIBLE_MS = 48 * 60 * 60 * 1000;

/** A moment in an e-mail, in the driver's stored time zone, with the zone's name. */
function formatWhen(d: Date, timeZone = "UTC") {
  const { timeZone: zone } = prefsFrom({ timeZone });
  return d.toLocaleString("en-GB", { timeZone: zone, weekday: "long", day: "numeric", month: "long", hour: "2-digit", minute: "2-digit", timeZoneName: "short" });
}

async function driverTimeZone(userId: string): Promise<string> {
  const [p] = await db.select({ tz: driverProfile.timezone }).from(driverProfile).where(eq(driverProfile.userId, userId)).limit(1);
  return p?.tz ?? "UTC";
}

async function passVehicles(passIds: string[]) {
  if (passIds.length === 0) return new Map<string, { id: string; nickname: string; make: string; model: string; year: number | null }[]>();
  const rows = await db
    .select({ passId: shopPassVehicle.passId, id: vehicle.id, nickname: vehicle.nickname, make: vehicle.make, model: vehicle.model, year: vehicle.year })
    .from(shopPassVehicle)
    .innerJoin(vehicle, eq(vehicle.id, shopPassVehicle.vehicleId))
    .where(inArray(shopPassVehicle.passId, passIds))
    .orderBy(asc(vehicle.nickname));
  const out = new Map<string, { id: string; nickname: string; make: string; model: string; year: number | null }[]>();
  for (const { passId, ...v } of rows) out.set(passId, [...(out.get(passId) ?? []), v]);
  return out;
}

// ---------------------------------------------------------------------------
// Using a pass (the shop's side)

/**
 * The access a shop member has under a pass, checked afresh on every request.
 * A pass of a shop the user is not in is "not found" (its existence is not
 * revealed); an ended or revoked pass says so, in words the counter can act on.
 * `assertVehicleAccess` then checks the vehicle, the end again, the scope,
 * and writes the access-log row.
 */
export async function resolvePassAccess({ session, passId, now, prefs }: { session: Session | null; passId: string; now: Date; prefs?: FormatPrefs }): Promise<LogbookAccess & { kind: "pass" }> {
  const s = requireSession(session);
  if (!UUID.test(passId)) throw notFound("That pass");
  const [row] = await db
    .select({ pass: shopPass, shopName: organization.name, driverBanned: user.banned })
    .from(shopPass)
    .innerJoin(organization, eq(organization.id, shopPass.shopId))
    .innerJoin(user, eq(user.id, shopPass.driverId))
    .where(eq(shopPass.id, passId))
    .limit(1);
  if (!row || !row.pass.shopId) throw notFound("That pass");
  const shopId = row.pass.shopId;
  const membership = await membershipIn({ userId: s.user.id, shopId });
  if (!membership) throw notFound("That pass");
  const state = passState(row.pass, now);
  if (state === "revoked") {
    throw new AppError("pass_ended", "The driver withdrew this pass, so the logbook is closed to the shop. Entries already saved stay in the driver's logbook.");
  }
  // Said to the technician: in their own zone and locale (the request's, unless given).
  if (state === "expired") {
    const f = formatter(prefs ?? (await requestPrefs()));
    throw new AppError("pass_ended", `This pass ended on ${f.dateTime(row.pass.endsAt)}. Ask the driver for a new pass to go on.`);
  }
  if (state === "scheduled") throw forbidden(`This pass starts on ${formatter(prefs ?? (await requestPrefs())).dateTime(row.pass.startsAt)}.`);
  // A driver's account disabled by an operator: its passes stop with it.
  if (row.driverBanned) throw new AppError("pass_ended", "This pass has stopped: the driver's account is disabled.");
  const vehicles = await db.select({ id: shopPassVehicle.vehicleId }).from(shopPassVehicle).where(eq(shopPassVehicle.passId, passId));
  return {
    kind: "pass",
    userId: s.user.id,
    userName: s.user.name,
    passId,
    shopId,
    shopName: row.shopName,
    scope: row.pass.scope,
    vehicleIds: vehicles.map((v) => v.id),
    endsAt: row.pass.endsAt,
  };
}

export type ShopPassRow = {
  id: string;
  shopId: string;
  shopName: string;
  driverName: string;
  scope: PassScope;
  note: string | null;
  startsAt: Date;
  endsAt: Date;
  endedAt: Date;
  state: PassState;
  msLeft: number;
  vehicles: { id: string; nickname: string; make: string; model: string; year: number | null }[];
};

const shopPassCursor = z.object({ s: z.enum(["open", "ended"]), t: z.string().min(1).max(40), id: z.string().uuid() });

/**
 * The passes the user's shops hold, a page at a time: open ones first,
 * soonest to end first; then ended or revoked ones, most recently ended
 * first, for ENDED_VISIBLE_MS after they stopped, then gone. Both parts read
 * the (shop_id, ended_at) index.
 */
export async function pageShopPasses({
  session,
  shopId,
  now,
  cursor,
  limit = DEFAULT_PAGE,
}: {
  session: Session | null;
  shopId?: string;
  now: Date;
  cursor?: string | null;
  limit?: number;
}): Promise<{ passes: ShopPassRow[]; nextCursor: string | null }> {
  const s = requireSession(session);
  const after = decodeCursor(cursor, shopPassCursor);
  const shops = await membershipsOf({ userId: s.user.id });
  const shopIds = shopId ? shops.filter((m) => m.shopId === shopId).map((m) => m.shopId) : shops.map((m) => m.shopId);
  if (shopId && shopIds.length === 0) throw notFound("That shop");
  if (shopIds.length === 0) return { passes: [], nextCursor: null };
  const cutoff = new Date(now.getTime() - ENDED_VISIBLE_MS);
  const select = () =>
    db
      .select({ pass: shopPass, shopName: organization.name, driverName: user.name })
      .from(shopPass)
      .innerJoin(organization, eq(organization.id, shopPass.shopId))
      .innerJoin(user, eq(user.id, shopPass.driverId));

  const rows: Awaited<ReturnType<ReturnType<typeof select>["where"]>> = [];
  if (!after || after.s === "open") {
    const t = after ? new Date(after.t) : null;
    rows.push(
      ...(await select()
        .where(
          and(
            inArray(shopPass.shopId, shopIds),
            gt(shopPass.endedAt, now),
            t ? or(gt(shopPass.endedAt, t), and(eq(shopPass.endedAt, t), gt(shopPass.id, after!.id))) : undefined,
          ),
        )
        .orderBy(asc(shopPass.endedAt), asc(shopPass.id))
        .limit(limit + 1)),
    );
  }
  if (rows.length <= limit) {
    const t = after?.s === "ended" ? new Date(after.t) : null;
    rows.push(
      ...(await select()
        .where(
          and(
            inArray(shopPass.shopId, shopIds),
            // Still visible: ended (by time or by revocation) after the cutoff.
            gt(shopPass.endedAt, cutoff),
            lte(shopPass.endedAt, now),
            t ? or(lt(shopPass.endedAt, t), and(eq(shopPass.endedAt, t), lt(shopPass.id, after!.id))) : undefined,
          ),
        )
        .orderBy(desc(shopPass.endedAt), desc(shopPass.id))
        .limit(limit + 1 - rows.length)),
    );
  }
  const page = rows.slice(0, limit);
  const last = page.at(-1);
  const nextCursor =
    rows.length > limit && last ? encodeCursor({ s: last.pass.endedAt > now ? "open" : "ended", t: last.pass.endedAt.toISOString(), id: last.pass.id }) : null;
  const vehicles = await passVehicles(page.map((r) => r.pass.id));
  const passes = page.map(({ pass, shopName, driverName }): ShopPassRow => {
    const state = passState(pass, now);
    return {
      id: pass.id,
      shopId: pass.shopId ?? "",
      shopName,
      driverName,
      scope: pass.scope,
      note: pass.note,
      startsAt: pass.startsAt,
      endsAt: pass.endsAt,
      endedAt: passEndedAt(pass),
      state,
      msLeft: state === "active" ? pass.endsAt.getTime() - now.getTime() : 0,
      vehicles: vehicles.get(pass.id) ?? [],
    };
  });
  return { passes, nextCursor };
}

/** The first page of the shop's passes (see pageShopPasses). */
export async function listShopPasses(args: { session: Session | null; shopId?: string; now: Date; limit?: number }): Promise<ShopPassRow[]> {
  return (await pageShopPasses(args)).passes;
}

/**
 * What a shop keeps after its passes end: its own record of the work it did
 * (what, when, who, on which make and model), never the driver's logbook.
 */
export async function listShopWork({ session, shopId, limit = 50 }: { session: Session | null; shopId: string; limit?: number }) {
  const s = requireSession(session);
  const membership = await membershipIn({ userId: s.user.id, shopId });
  if (!membership) throw notFound("That shop");
  return db
    .select({
      id: serviceEntry.id,
      kind: serviceEntry.kind,
      performedOn: serviceEntry.performedOn,
      technician: user.name,
      make: vehicle.make,
      model: vehicle.model,
    })
    .from(serviceEntry)
    .innerJoin(vehicle, eq(vehicle.id, serviceEntry.vehicleId))
    .leftJoin(user, eq(user.id, serviceEntry.authorUserId))
    .where(eq(serviceEntry.shopId, shopId))
    .orderBy(desc(serviceEntry.performedOn), desc(serviceEntry.createdAt))
    .limit(limit);
}

// ---------------------------------------------------------------------------
// Giving a pass (the driver's side)

async function ownedVehicles(userId: string, vehicleIds: string[]) {
  const unique = [...new Set(vehicleIds)];
  if (unique.some((id) => !UUID.test(id))) throw notFound("That vehicle");
  const rows = await db
    .select({ id: vehicle.id, nickname: vehicle.nickname })
    .from(vehicle)
    .where(and(eq(vehicle.ownerId, userId), inArray(vehicle.id, unique)));
  if (rows.length !== unique.length) throw notFound("That vehicle");
  return rows;
}

async function shopMemberEmails(shopId: string) {
  const rows = await db
    .select({ email: user.email })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, shopId));
  return rows.map((r) => r.email);
}

export type IssuePassArgs = {
  session: Session | null;
  input: { shopId: string; vehicleIds: string[]; scope: PassScope; duration: string; customDays?: number; note?: string };
  now: Date;
};

/** A driver gives a shop a pass to some of the driver's own vehicles. */
export async function issuePass({ session, input, now }: IssuePassArgs) {
  const s = requireSession(session);
  const vehicles = await ownedVehicles(s.user.id, input.vehicleIds);
  const [shop] = await db.select({ id: organization.id, name: organization.name }).from(organization).where(eq(organization.id, input.shopId)).limit(1);
  if (!shop) throw new AppError("not_found", "That shop was not found. Choose one from the directory.", { shopId: ["Choose a shop from the directory."] });
  const ms = durationMs(input);
  if (ms > MAX_PASS_MS) throw new AppError("invalid", `A pass lasts at most ${MAX_PASS_DAYS} days.`, { customDays: [`At most ${MAX_PASS_DAYS} days.`] });
  const endsAt = new Date(now.getTime() + ms);

  const pass = await db.transaction(async (tx) => {
    const [p] = await tx
      .insert(shopPass)
      .values({ driverId: s.user.id, shopId: shop.id, shopName: shop.name, scope: input.scope, startsAt: now, endsAt, note: input.note ?? null })
      .returning();
    await tx.insert(shopPassVehicle).values(vehicles.map((v) => ({ passId: p.id, vehicleId: v.id })));
    return p;
  });

  // After the commit: a failed e-mail must not undo the pass.
  const to = await shopMemberEmails(shop.id);
  if (to.length > 0) {
    await sendEmail({
      to,
      subject: `${s.user.name} shared a logbook with ${shop.name}`,
      kind: "pass-received",
      react: createElement(PassReceivedEmail, {
        shopName: shop.name,
        driverName: s.user.name,
        vehicles: vehicles.map((v) => v.nickname),
        scopeLabel: SCOPE_LABEL[input.scope],
        endsAtText: formatWhen(endsAt, await driverTimeZone(s.user.id)),
        note: input.note,
        passUrl: `${appUrl()}/shop/passes/${pass.id}`,
      }),
    });
  }
  return { id: pass.id, endsAt: pass.endsAt };
}

async function ownPass(userId: string, passId: string) {
  if (!UUID.test(passId)) throw notFound("That pass");
  const [row] = await db
    .select()
    .from(shopPass)
    .where(and(eq(shopPass.id, passId), eq(shopPass.driverId, userId)))
    .limit(1);
  if (!row) throw notFound("That pass");
  return row;
}

/** Lengthens an active pass; it may reach at most 30 days ahead of now. */
export async function extendPass({ session, passId, input, now }: { session: Session | null; passId: string; input: { duration: string; customDays?: number }; now: Date }) {
  const s = requireSession(session);
  const pass = await ownPass(s.user.id, passId);
  const state = passState(pass, now);
  if (state === "revoked" || state === "expired") {
    throw new AppError("conflict", "This pass has already ended. Give the shop a new pass instead.");
  }
  const endsAt = new Date(pass.endsAt.getTime() + durationMs(input));
  if (endsAt.getTime() - now.getTime() > MAX_PASS_MS) {
    throw new AppError("invalid", `A pass can reach at most ${MAX_PASS_DAYS} days ahead. Choose a shorter extension.`, {
      duration: [`At most ${MAX_PASS_DAYS} days from now.`],
    });
  }
  // Guarded by the same "still open" condition, so a revoke in between wins.
  const [row] = await db
    .update(shopPass)
    .set({ endsAt })
    .where(and(eq(shopPass.id, pass.id), isNull(shopPass.revokedAt), gt(shopPass.endsAt, now)))
    .returning({ endsAt: shopPass.endsAt });
  if (!row) throw new AppError("conflict", "This pass has already ended. Give the shop a new pass instead.");
  return row;
}

/** Ends a pass now. Revoking an ended pass changes nothing. */
export async function revokePass({ session, passId, now }: { session: Session | null; passId: string; now: Date }) {
  const s = requireSession(session);
  const pass = await ownPass(s.user.id, passId);
  if (passState(pass, now) === "active" || passState(pass, now) === "scheduled") {
    await db
      .update(shopPass)
      .set({ revokedAt: now })
      .where(and(eq(shopPass.id, pass.id), isNull(shopPass.revokedAt)));
  }
  await sendPassEndedNotice({ passId: pass.id, now });
  const [after] = await db.select().from(shopPass).where(eq(shopPass.id, pass.id));
  return { id: after.id, state: passState(after, now), revokedAt: after.revokedAt };
}

export type DriverPassRow = {
  id: string;
  shopId: string;
  shopName: string;
  shopTown: string | null;
  scope: PassScope;
  note: string | null;
  startsAt: Date;
  endsAt: Date;
  revokedAt: Date | null;
  state: PassState;
  msLeft: number;
  vehicles: { id: string; nickname: string; make: string; model: string; year: number | null }[];
};

/** The driver's passes, active first, each with its state at `now`. */
export async function listDriverPasses({ session, now }: { session: Session | null; now: Date }): Promise<DriverPassRow[]> {
  const s = requireSession(session);
  const rows = await db
    .select({
      pass: shopPass,
      // A shop that has closed keeps its name on the driver's rows.
      shopName: sql<string>`coalesce(${organization.name}, ${shopPass.shopName}, 'A closed shop')`,
      shopTown: sql<string | null>`(select town from shop_profile where shop_id = ${shopPass.shopId})`,
    })
    .from(shopPass)
    .leftJoin(organization, eq(organization.id, shopPass.shopId))
    .where(eq(shopPass.driverId, s.user.id))
    .orderBy(desc(shopPass.createdAt))
    .limit(200);
  const vehicles = await passVehicles(rows.map((r) => r.pass.id));
  const out = rows.map(({ pass, shopName, shopTown }): DriverPassRow => {
    const state = passState(pass, now);
    return {
      id: pass.id,
      shopId: pass.shopId ?? "",
      shopName,
      shopTown,
      scope: pass.scope,
      note: pass.note,
      startsAt: pass.startsAt,
      endsAt: pass.endsAt,
      revokedAt: pass.revokedAt,
      state,
      msLeft: state === "active" ? pass.endsAt.getTime() - now.getTime() : 0,
      vehicles: vehicles.get(pass.id) ?? [],
    };
  });
  return out.sort((a, b) => Number(b.state === "active") - Number(a.state === "active"));
}

/** The driver's own vehicles, for choosing what a pass covers. */
export async function listPassableVehicles({ session }: { session: Session | null }) {
  const s = requireSession(session);
  return db
    .select({ id: vehicle.id, nickname: vehicle.nickname, make: vehicle.make, model: vehicle.model, year: vehicle.year })
    .from(vehicle)
    .where(eq(vehicle.ownerId, s.user.id))
    .orderBy(asc(vehicle.createdAt));
}

/**
 * Who opened what under a pass, newest first, a page at a time. Only the
 * vehicle's owner reads it: a pass holder is refused (the log is the
 * driver's view of the shop). Reads of one visit are one row with a count.
 */
export async function pageAccessLog({ access, vehicleId, cursor, limit = DEFAULT_PAGE }: { access: LogbookAccess; vehicleId?: string; cursor?: string | null; limit?: number }) {
  if (access.kind !== "owner") throw forbidden("The access log is the driver's to read.");
  const after = decodeCursor(cursor, timeIdCursor);
  if (vehicleId) await assertVehicleAccess(access, { vehicleId, action: "read_access_log" });
  const t = after ? new Date(after.t) : null;
  if (t && Number.isNaN(t.getTime())) throw new AppError("invalid", "The page cursor is not valid. Start again from the first page.", { cursor: ["Not a cursor of this list."] });
  const rows = await db
    .select({
      id: accessLog.id,
      at: accessLog.at,
      action: accessLog.action,
      detail: accessLog.detail,
      actorName: accessLog.actorName,
      count: accessLog.count,
      lastAt: accessLog.lastAt,
      shopName: sql<string>`coalesce(${organization.name}, ${accessLog.shopName}, 'A closed shop')`,
      passId: accessLog.passId,
      vehicleId: accessLog.vehicleId,
      vehicleNickname: vehicle.nickname,
    })
    .from(accessLog)
    .innerJoin(vehicle, eq(vehicle.id, accessLog.vehicleId))
    .leftJoin(organization, eq(organization.id, accessLog.shopId))
    .where(
      and(
        eq(vehicle.ownerId, access.userId),
        vehicleId ? eq(accessLog.vehicleId, vehicleId) : undefined,
        t ? or(lt(accessLog.at, t), and(eq(accessLog.at, t), lt(accessLog.id, after!.id))) : undefined,
      ),
    )
    .orderBy(desc(accessLog.at), desc(accessLog.id))
    .limit(limit + 1);
  const entries = rows.slice(0, limit);
  const last = entries.at(-1);
  return { entries, nextCursor: rows.length > limit && last ? encodeCursor({ t: last.at.toISOString(), id: last.id }) : null };
}

/** The newest access-log rows (see pageAccessLog). */
export async function listAccessLog(args: { access: LogbookAccess; vehicleId?: string; limit?: number }) {
  return (await pageAccessLog(args)).entries;
}

// ---------------------------------------------------------------------------
// Notices

async function entriesUnderPass(passId: string) {
  const [services, checks] = await Promise.all([
    db.select({ n: sql<number>`count(*)::int` }).from(serviceEntry).where(eq(serviceEntry.passId, passId)),
    db.select({ n: sql<number>`count(*)::int` }).from(treadCheck).where(and(eq(treadCheck.passId, passId), isNull(treadCheck.serviceEntryId))),
  ]);
  return (services[0]?.n ?? 0) + (checks[0]?.n ?? 0);
}

/**
 * Sends the "pass ended" e-mail for one pass if it has ended and no notice
 * went out yet. The claim (setting end_notice_sent_at) comes first and is
 * conditional, so two callers never both send.
 */
export async function sendPassEndedNotice({ passId, now }: { passId: string; now: Date }): Promise<boolean> {
  const [claimed] = await db
    .update(shopPass)
    .set({ endNoticeSentAt: now })
    .where(
      and(
        eq(shopPass.id, passId),
        isNull(shopPass.endNoticeSentAt),
        or(and(isNotNull(shopPass.revokedAt), lte(shopPass.revokedAt, now)), lte(shopPass.endsAt, now)),
      ),
    )
    .returning();
  if (!claimed) return false;
  const [info] = await db
    .select({ driverName: user.name, driverEmail: user.email, shopName: organization.name })
    .from(shopPass)
    .innerJoin(user, eq(user.id, shopPass.driverId))
    .innerJoin(organization, eq(organization.id, shopPass.shopId))
    .where(eq(shopPass.id, passId));
  const vehicles = (await passVehicles([passId])).get(passId) ?? [];
  const how = claimed.revokedAt && claimed.revokedAt < claimed.endsAt ? "revoked" : "expired";
  const res = await sendEmail({
    to: info.driverEmail,
    subject: `${info.shopName} can no longer open your logbook`,
    kind: "pass-ended",
    react: createElement(PassEndedEmail, {
      driverName: info.driverName.split(" ")[0],
      shopName: info.shopName,
      vehicles: vehicles.map((v) => v.nickname),
      how,
      entriesAdded: await entriesUnderPass(passId),
      passesUrl: `${appUrl()}/passes`,
    }),
  });
  // Give the claim back when the e-mail could not go out, so the next run retries.
  if (!res.ok && process.env.FOURPATCH_EMAIL_DELIVERY !== "skip") {
    await db.update(shopPass).set({ endNoticeSentAt: null }).where(eq(shopPass.id, passId));
    return false;
  }
  return true;
}

/** The daily job: a notice for every pass that ended since the last run. */
export async function sendDuePassEndedNotices({ now }: { now: Date }) {
  const due = await db
    .select({ id: shopPass.id })
    .from(shopPass)
    // ended_at is the earlier of the end and the revocation: "ended by time or revoked", one indexed range.
    .where(and(isNull(shopPass.endNoticeSentAt), lte(shopPass.endedAt, now)))
    // Oldest first, in the partial index's order: with LIMIT the planner then reads the index, not the table.
    .orderBy(asc(shopPass.endedAt))
    .limit(500);
  let sent = 0;
  for (const p of due) if (await sendPassEndedNotice({ passId: p.id, now })) sent += 1;
  return { due: due.length, sent };
}

/** Writes under a pass closer together than this make one visit: one e-mail, not one per entry. */
export const ENTRY_NOTICE_WINDOW_MS = 2 * 60 * 60 * 1000;
const WRITE_ACTIONS = ["add_service", "add_check", "add_set"];

/**
 * Tells the driver that the shop added to a vehicle's logbook: once per
 * visit (the first write of the pass in ENTRY_NOTICE_WINDOW_MS), so a busy
 * bay does not fill the driver's inbox; the "pass ended" e-mail counts them all.
 */
export async function notifyShopEntry({ access, vehicleId, summary, now = new Date() }: { access: LogbookAccess & { kind: "pass" }; vehicleId: string; summary: string; now?: Date }) {
  const [recent] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(accessLog)
    .where(
      and(
        eq(accessLog.passId, access.passId),
        eq(accessLog.vehicleId, vehicleId),
        inArray(accessLog.action, WRITE_ACTIONS),
        gt(accessLog.at, new Date(now.getTime() - ENTRY_NOTICE_WINDOW_MS)),
      ),
    );
  // The write being reported is one of them; any other means the driver was already told.
  if ((recent?.n ?? 0) > 1) return false;
  const [row] = await db
    .select({ nickname: vehicle.nickname, driverName: user.name, driverEmail: user.email })
    .from(vehicle)
    .innerJoin(user, eq(user.id, vehicle.ownerId))
    .where(eq(vehicle.id, vehicleId));
  if (!row) return;
  await sendEmail({
    to: row.driverEmail,
    subject: `${access.shopName} added to the logbook of ${row.nickname}`,
    kind: "shop-entry",
    react: createElement(ShopEntryEmail, {
      driverName: row.driverName.split(" ")[0],
      shopName: access.shopName,
      technicianName: access.userName,
      vehicle: row.nickname,
      summary,
      logbookUrl: `${appUrl()}/vehicles/${vehicleId}`,
    }),
  });
  return true;
}
