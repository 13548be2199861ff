import "server-only";
// Handing a vehicle's tire history to its next owner. The owner makes a
// one-time link (or sends it to an address); whoever holds it sees a
// summary, and the first account to accept takes the vehicle with its whole
// history. The accept is one conditional UPDATE of the hand-on row, so of
// two accepts at once exactly one wins and the other changes nothing.
import { createElement } from "react";
import { and, eq, gt, inArray, notExists } from "drizzle-orm";
import { db } from "@/db";
import { accessLog, attachment, serviceEntry, shopPass, shopPassVehicle, tireSet, user, vehicle, vehicleHandOn, vehicleKeeper, vehicleSnapshot } from "@/db/schema";
import HandOnEmail from "@/emails/hand-on";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { sendEmail } from "@/lib/email/send";
import { appUrl } from "@/lib/env";
import { AppError, forbidden, notFound } from "@/lib/errors";
import { printableHistory, type PrintableHistory } from "@/lib/print/history";
import { hashFeedToken as hashToken, newFeedToken as newToken } from "@/lib/reminders/token";
import { removeStoredFile } from "@/lib/uploads";
import { HAND_ON_DAYS, type HandOnInput } from "@/lib/validation/household";
import { todayIso } from "@/lib/validation/logbook";
import { formatter } from "@/lib/format";
import { requestPrefs } from "@/lib/format/server";
import { assertVehicleAccess } from "./access";
import { exportVehicles } from "./export";
import { getVehicleLogbook } from "./logbook";

const DAY = 24 * 60 * 60 * 1000;
const UUID = /^[0-9a-f-]{36}$/i;
// The link's end in the sender's zone and locale (the request's), with the zone named.
const dateText = async (d: Date) => formatter(await requestPrefs()).dateTime(d);

export async function createHandOn({
  access,
  vehicleId,
  input,
  now = new Date(),
}: {
  access: LogbookAccess;
  vehicleId: string;
  input: { email: string | null; includeReceipts: boolean; keepSnapshot: boolean };
  now?: Date;
}) {
  const token = newToken();
  const made = await db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, ownerOnly: true, action: "hand_on" }, tx);
    if (input.email && input.email === (await tx.select({ email: user.email }).from(user).where(eq(user.id, access.userId)))[0]?.email.toLowerCase()) {
      throw new AppError("invalid", "That is your own address.", { email: ["That is your own address."] });
    }
    // One open hand-on per vehicle: a new link replaces the older one.
    await tx.update(vehicleHandOn).set({ state: "cancelled" }).where(and(eq(vehicleHandOn.vehicleId, vehicleId), eq(vehicleHandOn.state, "open")));
    const [row] = await tx
      .insert(vehicleHandOn)
      .values({
        vehicleId,
        fromUserId: access.userId,
        toEmail: input.email,
        tokenHash: hashToken(token),
        includeReceipts: input.includeReceipts,
        keepSnapshot: input.keepSnapshot,
        expiresAt: new Date(now.getTime() + HAND_ON_DAYS * DAY),
      })
      .returning();
    const [v] = await tx.select({ nickname: vehicle.nickname }).from(vehicle).where(eq(vehicle.id, vehicleId));
    return { row, nickname: v.nickname };
  });
  const url = `${appUrl()}/take-on/${token}`;
  let emailed = false;
  if (input.email) {
    const sent = await sendEmail({
      to: input.email,
      subject: `${access.userName} hands you the tire history of ${made.nickname}`,
      kind: "hand-on",
      react: createElement(HandOnEmail, { kind: "offer", fromName: access.userName, vehicle: made.nickname, url, expiresText: await dateText(made.row.expiresAt) }),
      idempotencyKey: `hand-on-offer-${made.row.id}`,
    });
    emailed = sent.ok;
  }
  return { id: made.row.id, url, emailed, expiresAt: made.row.expiresAt.toISOString() };
}

/** The owner's open hand-on of a vehicle, if any (its link was shown once, at creation). */
export async function openHandOnOf({ access, vehicleId, now = new Date() }: { access: LogbookAccess; vehicleId: string; now?: Date }) {
  await assertVehicleAccess(access, { vehicleId, ownerOnly: true, action: "read_hand_on" });
  const [row] = await db
    .select({ id: vehicleHandOn.id, toEmail: vehicleHandOn.toEmail, expiresAt: vehicleHandOn.expiresAt, includeReceipts: vehicleHandOn.includeReceipts, keepSnapshot: vehicleHandOn.keepSnapshot })
    .from(vehicleHandOn)
    .where(and(eq(vehicleHandOn.vehicleId, vehicleId), eq(vehicleHandOn.state, "open"), gt(vehicleHandOn.expiresAt, now)))
    .limit(1);
  return row ? { ...row, expiresAt: row.expiresAt.toISOString() } : null;
}

export async function cancelHandOn({ access, handOnId }: { access: LogbookAccess; handOnId: string }) {
  if (access.kind !== "owner" || !UUID.test(handOnId)) throw notFound("That hand-on");
  const rows = await db
    .update(vehicleHandOn)
    .set({ state: "cancelled" })
    .where(and(eq(vehicleHandOn.id, handOnId), eq(vehicleHandOn.fromUserId, access.userId), eq(vehicleHandOn.state, "open")))
    .returning({ id: vehicleHandOn.id });
  if (rows.length === 0) throw notFound("That hand-on");
  return { cancelled: true };
}

export type HandOnSummary = {
  history: PrintableHistory;
  fromName: string;
  toEmail: string | null;
  expiresAt: string;
  receipts: { prices: { set: string; price: string }[]; files: string[] } | null;
};

export type HandOnView = { state: "unknown" } | { state: "used" | "expired" | "cancelled"; fromName: string; vehicle: string } | { state: "open"; summary: HandOnSummary };

async function findByToken(token: string) {
  if (!/^[A-Za-z0-9_-]{43}$/.test(token)) return null;
  const [row] = await db
    .select({ h: vehicleHandOn, fromName: user.name, nickname: vehicle.nickname, ownerId: vehicle.ownerId })
    .from(vehicleHandOn)
    .innerJoin(user, eq(user.id, vehicleHandOn.fromUserId))
    .innerJoin(vehicle, eq(vehicle.id, vehicleHandOn.vehicleId))
    .where(eq(vehicleHandOn.tokenHash, hashToken(token)))
    .limit(1);
  return row ?? null;
}

/** What the link shows: the summary while it is open, else why it no longer works. */
export async function handOnView({ token, now = new Date() }: { token: string; now?: Date }): Promise<HandOnView> {
  const row = await findByToken(token);
  if (!row) return { state: "unknown" };
  const base = { fromName: row.fromName, vehicle: row.nickname };
  if (row.h.state === "accepted") return { state: "used", ...base };
  if (row.h.state === "cancelled" || row.ownerId !== row.h.fromUserId) return { state: "cancelled", ...base };
  if (row.h.expiresAt <= now) return { state: "expired", ...base };
  const today = todayIso(now);
  // Read as the seller would: the link's secret stands for their consent to show this much.
  const book = await getVehicleLogbook({ access: { kind: "owner", userId: row.h.fromUserId, userName: row.fromName }, vehicleId: row.h.vehicleId, today, action: "hand_on_summary" });
  const history = printableHistory(book, today);
  const receipts = row.h.includeReceipts
    ? {
        prices: book.sets.filter((s) => s.priceCents != null).map((s) => ({ set: s.label ?? s.size, price: `${(s.priceCents! / 100).toFixed(2)} ${s.currency}` })),
        files: book.attachments.map((a) => a.fileName),
      }
    : null;
  return { state: "open", summary: { history, fromName: row.fromName, toEmail: row.h.toEmail, expiresAt: row.h.expiresAt.toISOString(), receipts } };
}

/**
 * The recipient takes the vehicle. Moves the vehicle and its whole history
 * to them; ends its passes and co-keepers; without receipts ticked, drops
 * prices and files; keeps the seller's frozen copy if they chose one.
 */
export async function acceptHandOn({ token, userId, userEmail, now = new Date() }: { token: string; userId: string; userEmail: string; now?: Date }) {
  const row = await findByToken(token);
  if (!row) throw notFound("That hand-on link");
  if (row.h.fromUserId === userId) throw new AppError("conflict", "This is your own vehicle's link: send it to the next owner.");
  if (row.h.toEmail && row.h.toEmail !== userEmail.toLowerCase()) throw forbidden(`This link was sent to ${row.h.toEmail}. Sign in with that address to accept it.`);
  // The seller's copy is read before the write; it is kept only if this accept wins.
  let snapshot: { title: string; data: unknown } | null = null;
  if (row.h.keepSnapshot && row.h.state === "open") {
    const today = todayIso(now);
    const book = await getVehicleLogbook({ access: { kind: "owner", userId: row.h.fromUserId, userName: row.fromName }, vehicleId: row.h.vehicleId, today, action: "hand_on_snapshot" }).catch(() => null);
    if (book) {
      const { doc } = await exportVehicles({ accountId: row.h.fromUserId, vehicleIds: [row.h.vehicleId] });
      snapshot = { title: book.vehicle.nickname, data: { history: printableHistory(book, today), document: doc } };
    }
  }
  const result = await db.transaction(async (tx) => {
    // The one statement that decides the race.
    const won = await tx
      .update(vehicleHandOn)
      .set({ state: "accepted", acceptedByUserId: userId, acceptedAt: now })
      .where(and(eq(vehicleHandOn.id, row.h.id), eq(vehicleHandOn.state, "open"), gt(vehicleHandOn.expiresAt, now)))
      .returning({ id: vehicleHandOn.id });
    if (won.length !== 1) {
      const [again] = await tx.select({ state: vehicleHandOn.state }).from(vehicleHandOn).where(eq(vehicleHandOn.id, row.h.id));
      if (again?.state === "accepted") throw new AppError("conflict", "This link was already used: the vehicle has a new owner. It works once.");
      if (again?.state === "cancelled") throw new AppError("conflict", "The owner withdrew this link.");
      throw new AppError("conflict", "This link has expired. Ask the owner for a new one.");
    }
    const [me] = await tx.select({ banned: user.banned }).from(user).where(eq(user.id, userId));
    if (!me || me.banned) throw forbidden("This account cannot take on a vehicle.");
    const moved = await tx
      .update(vehicle)
      .set({ ownerId: userId, updatedAt: now })
      .where(and(eq(vehicle.id, row.h.vehicleId), eq(vehicle.ownerId, row.h.fromUserId)))
      .returning({ id: vehicle.id, nickname: vehicle.nickname });
    if (moved.length !== 1) throw new AppError("conflict", "The owner withdrew this link.");
    const vehicleId = row.h.vehicleId;
    let files: string[] = [];
    if (row.h.includeReceipts) {
      await tx.update(attachment).set({ ownerId: userId }).where(eq(attachment.vehicleId, vehicleId));
    } else {
      files = (await tx.delete(attachment).where(eq(attachment.vehicleId, vehicleId)).returning({ storedName: attachment.storedName })).map((f) => f.storedName);
      await tx.update(tireSet).set({ priceCents: null }).where(eq(tireSet.vehicleId, vehicleId));
      await tx.update(serviceEntry).set({ costCents: null }).where(eq(serviceEntry.vehicleId, vehicleId));
    }
    // Shops lose the vehicle; a pass left with no vehicle ends. The seller's access log of it goes with their passes.
    const passIds = (await tx.delete(shopPassVehicle).where(eq(shopPassVehicle.vehicleId, vehicleId)).returning({ passId: shopPassVehicle.passId })).map((p) => p.passId);
    await tx.delete(accessLog).where(eq(accessLog.vehicleId, vehicleId));
    if (passIds.length) {
      await tx
        .update(shopPass)
        .set({ revokedAt: now })
        .where(and(inArray(shopPass.id, passIds), notExists(tx.select({ p: shopPassVehicle.passId }).from(shopPassVehicle).where(eq(shopPassVehicle.passId, shopPass.id)))));
    }
    await tx
      .update(vehicleKeeper)
      .set({ state: "ended", endedAt: now, endedByUserId: row.h.fromUserId })
      .where(and(eq(vehicleKeeper.vehicleId, vehicleId), inArray(vehicleKeeper.state, ["invited", "active"])));
    await tx.update(vehicleHandOn).set({ state: "cancelled" }).where(and(eq(vehicleHandOn.vehicleId, vehicleId), eq(vehicleHandOn.state, "open")));
    if (snapshot) await tx.insert(vehicleSnapshot).values({ ownerId: row.h.fromUserId, title: snapshot.title, handedOnAt: now, data: snapshot.data });
    const [seller] = await tx.select({ email: user.email }).from(user).where(eq(user.id, row.h.fromUserId));
    const [buyer] = await tx.select({ name: user.name }).from(user).where(eq(user.id, userId));
    return { vehicleId, nickname: moved[0].nickname, files, sellerEmail: seller?.email, buyerName: buyer?.name ?? "The new owner" };
  });
  await Promise.all(result.files.map((f) => removeStoredFile(f)));
  await Promise.all([
    result.sellerEmail
      ? sendEmail({
          to: result.sellerEmail,
          subject: `${result.nickname} has a new owner`,
          kind: "hand-on",
          react: createElement(HandOnEmail, { kind: "done-seller", vehicle: result.nickname, toName: result.buyerName, keptCopy: !!snapshot, url: `${appUrl()}/vehicles` }),
          idempotencyKey: `hand-on-done-seller-${row.h.id}`,
        })
      : null,
    sendEmail({
      to: userEmail,
      subject: `The tire logbook of ${result.nickname} is yours`,
      kind: "hand-on",
      react: createElement(HandOnEmail, { kind: "done-buyer", vehicle: result.nickname, fromName: row.fromName, url: `${appUrl()}/vehicles/${result.vehicleId}` }),
      idempotencyKey: `hand-on-done-buyer-${row.h.id}`,
    }),
  ]);
  return { vehicleId: result.vehicleId };
}

/** The seller's frozen copies. */
export async function listSnapshots({ userId }: { userId: string }) {
  const rows = await db
    .select({ id: vehicleSnapshot.id, title: vehicleSnapshot.title, handedOnAt: vehicleSnapshot.handedOnAt })
    .from(vehicleSnapshot)
    .where(eq(vehicleSnapshot.ownerId, userId))
    .orderBy(vehicleSnapshot.handedOnAt);
  return rows.map((r) => ({ ...r, handedOnAt: r.handedOnAt.toISOString() }));
}

export async function getSnapshot({ userId, snapshotId }: { userId: string; snapshotId: string }) {
  if (!UUID.test(snapshotId)) throw notFound("That copy");
  const [row] = await db.select().from(vehicleSnapshot).where(and(eq(vehicleSnapshot.id, snapshotId), eq(vehicleSnapshot.ownerId, userId))).limit(1);
  if (!row) throw notFound("That copy");
  return { id: row.id, title: row.title, handedOnAt: row.handedOnAt.toISOString(), history: (row.data as { history: PrintableHistory }).history };
}

export type { HandOnInput };
