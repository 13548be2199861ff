import "server-only";
// Household co-keepers: the owner of a vehicle invites someone by e-mail;
// the invited account accepts with the link's secret and then reads and
// writes the logbook through assertVehicleAccess until either side ends it.
import { createElement } from "react";
import { and, asc, eq, gt, inArray } from "drizzle-orm";
import { db } from "@/db";
import { user, vehicle, vehicleKeeper } from "@/db/schema";
import KeeperInvitationEmail from "@/emails/keeper-invitation";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { sendEmail } from "@/lib/email/send";
import { appUrl } from "@/lib/env";
import { AppError, forbidden, notFound } from "@/lib/errors";
import { hashFeedToken as hashToken, newFeedToken as newToken } from "@/lib/reminders/token";
import { KEEPER_INVITE_DAYS } from "@/lib/validation/household";
import { formatter } from "@/lib/format";
import { requestPrefs } from "@/lib/format/server";
import { assertVehicleAccess } from "./access";

const DAY = 24 * 60 * 60 * 1000;
const UUID = /^[0-9a-f-]{36}$/i;

export type KeeperRow = {
  id: string;
  email: string;
  name: string | null;
  state: "invited" | "active" | "ended";
  expiresAt: string;
  acceptedAt: string | null;
};

/** The co-keepers of a vehicle: the owner sees everyone invited or active; a co-keeper sees the owner and the others. */
export async function listKeepers({ access, vehicleId, now = new Date() }: { access: LogbookAccess; vehicleId: string; now?: Date }) {
  const role = await assertVehicleAccess(access, { vehicleId, action: "list_keepers" });
  if (role === "pass") throw notFound("That vehicle");
  const [owner] = await db
    .select({ name: user.name, email: user.email })
    .from(vehicle)
    .innerJoin(user, eq(user.id, vehicle.ownerId))
    .where(eq(vehicle.id, vehicleId))
    .limit(1);
  const rows = await db
    .select({ k: vehicleKeeper, name: user.name })
    .from(vehicleKeeper)
    .leftJoin(user, eq(user.id, vehicleKeeper.userId))
    .where(
      and(
        eq(vehicleKeeper.vehicleId, vehicleId),
        role === "owner" ? inArray(vehicleKeeper.state, ["invited", "active"]) : eq(vehicleKeeper.state, "active"),
      ),
    )
    .orderBy(asc(vehicleKeeper.createdAt));
  const keepers: KeeperRow[] = rows
    // An invitation past its date is no longer worth showing as pending.
    .filter((r) => r.k.state === "active" || r.k.expiresAt > now)
    .map((r) => ({
      id: r.k.id,
      email: r.k.email,
      name: r.name,
      state: r.k.state,
      expiresAt: r.k.expiresAt.toISOString(),
      acceptedAt: r.k.acceptedAt?.toISOString() ?? null,
    }));
  const mine = rows.find((r) => r.k.userId === access.userId && r.k.state === "active");
  return { role, owner: { name: owner?.name ?? "" }, keepers, myKeeperId: mine?.k.id ?? null };
}

/** The owner invites someone by e-mail. Returns the link (also e-mailed). */
export async function inviteKeeper({
  access,
  vehicleId,
  email,
  now = new Date(),
}: {
  access: LogbookAccess;
  vehicleId: string;
  email: string;
  now?: Date;
}): Promise<{ id: string; url: string; emailed: boolean }> {
  const token = newToken();
  const result = await db.transaction(async (tx) => {
    await assertVehicleAccess(access, { vehicleId, write: true, ownerOnly: true, action: "invite_keeper" }, tx);
    const [v] = await tx
      .select({ nickname: vehicle.nickname, ownerEmail: user.email, ownerName: user.name })
      .from(vehicle)
      .innerJoin(user, eq(user.id, vehicle.ownerId))
      .where(eq(vehicle.id, vehicleId))
      .limit(1);
    if (v.ownerEmail.toLowerCase() === email) {
      throw new AppError("invalid", "That is your own address: you already keep this logbook.", { email: ["That is your own address."] });
    }
    const live = await tx
      .select({ id: vehicleKeeper.id, state: vehicleKeeper.state })
      .from(vehicleKeeper)
      .where(
        and(
          eq(vehicleKeeper.vehicleId, vehicleId),
          eq(vehicleKeeper.email, email),
          inArray(vehicleKeeper.state, ["invited", "active"]),
        ),
      );
    if (live.some((l) => l.state === "active")) {
      throw new AppError("conflict", "That person already keeps this logbook with you.", { email: ["Already a co-keeper."] });
    }
    // A new invitation replaces an older pending one to the same address.
    if (live.length) {
      await tx
        .update(vehicleKeeper)
        .set({ state: "ended", endedAt: now, endedByUserId: access.userId })
        .where(and(eq(vehicleKeeper.vehicleId, vehicleId), eq(vehicleKeeper.email, email), eq(vehicleKeeper.state, "invited")));
    }
    const [row] = await tx
      .insert(vehicleKeeper)
      .values({ vehicleId, email, invitedByUserId: access.userId, tokenHash: hashToken(token), expiresAt: new Date(now.getTime() + KEEPER_INVITE_DAYS * DAY) })
      .returning();
    return { row, vehicle: v };
  });
  const url = `${appUrl()}/keep/${token}`;
  const sent = await sendEmail({
    to: email,
    subject: `${result.vehicle.ownerName} asks you to keep a tire logbook together`,
    kind: "keeper-invitation",
    react: createElement(KeeperInvitationEmail, {
      ownerName: result.vehicle.ownerName,
      vehicle: result.vehicle.nickname,
      acceptUrl: url,
      expiresText: formatter(await requestPrefs()).dateTime(result.row.expiresAt),
    }),
    idempotencyKey: `keeper-invitation-${result.row.id}`,
  });
  return { id: result.row.id, url, emailed: sent.ok };
}

export type KeeperInvitationView =
  | { state: "unknown" }
  | { state: "used" | "expired" | "withdrawn" | "open"; id: string; email: string; ownerName: string; vehicle: string; expiresAt: string };

/** What the invitation link shows, before anyone signs in. */
export async function keeperInvitation({ token, now = new Date() }: { token: string; now?: Date }): Promise<KeeperInvitationView> {
  if (!/^[A-Za-z0-9_-]{43}$/.test(token)) return { state: "unknown" };
  const [row] = await db
    .select({ k: vehicleKeeper, vehicle: vehicle.nickname, ownerName: user.name })
    .from(vehicleKeeper)
    .innerJoin(vehicle, eq(vehicle.id, vehicleKeeper.vehicleId))
    .innerJoin(user, eq(user.id, vehicle.ownerId))
    .where(eq(vehicleKeeper.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) return { state: "unknown" };
  const base = { id: row.k.id, email: row.k.email, ownerName: row.ownerName, vehicle: row.vehicle, expiresAt: row.k.expiresAt.toISOString() };
  if (row.k.acceptedAt) return { ...base, state: "used" };
  if (row.k.state === "ended") return { ...base, state: "withdrawn" };
  if (row.k.expiresAt <= now) return { ...base, state: "expired" };
  return { ...base, state: "open" };
}

/** The signed-in account takes up the invitation; only the invited address can, and only once. */
export async function acceptKeeper({
  token,
  userId,
  userEmail,
  now = new Date(),
}: {
  token: string;
  userId: string;
  userEmail: string;
  now?: Date;
}): Promise<{ vehicleId: string }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ k: vehicleKeeper, ownerId: vehicle.ownerId })
      .from(vehicleKeeper)
      .innerJoin(vehicle, eq(vehicle.id, vehicleKeeper.vehicleId))
      .where(eq(vehicleKeeper.tokenHash, hashToken(token)))
      .limit(1);
    if (!row) throw notFound("That invitation");
    if (row.k.acceptedAt) throw new AppError("conflict", "This invitation was already used. It works once.");
    if (row.k.state !== "invited") throw new AppError("conflict", "This invitation was withdrawn by the vehicle's owner.");
    if (row.k.expiresAt <= now) throw new AppError("conflict", "This invitation has expired. Ask the owner for a new one.");
    if (row.k.email !== userEmail.toLowerCase()) {
      throw forbidden(`This invitation is for ${row.k.email}. Sign in with that address to accept it.`);
    }
    if (row.ownerId === userId) throw new AppError("conflict", "You own this vehicle already.");
    // The state guard makes a second accept of the same link change nothing.
    const taken = await tx
      .update(vehicleKeeper)
      .set({ state: "active", userId, acceptedAt: now })
      .where(and(eq(vehicleKeeper.id, row.k.id), eq(vehicleKeeper.state, "invited"), gt(vehicleKeeper.expiresAt, now)))
      .returning({ id: vehicleKeeper.id });
    if (taken.length !== 1) throw new AppError("conflict", "This invitation was already used. It works once.");
    return { vehicleId: row.k.vehicleId };
  });
}

/** Ends an arrangement or withdraws an invitation: the owner for anyone, a co-keeper for themselves. */
export async function endKeeper({ access, keeperId, now = new Date() }: { access: LogbookAccess; keeperId: string; now?: Date }) {
  if (access.kind !== "owner") throw forbidden("Only the vehicle's owner or the co-keeper can end this.");
  if (!UUID.test(keeperId)) throw notFound("That co-keeper");
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ k: vehicleKeeper, ownerId: vehicle.ownerId })
      .from(vehicleKeeper)
      .innerJoin(vehicle, eq(vehicle.id, vehicleKeeper.vehicleId))
      .where(eq(vehicleKeeper.id, keeperId))
      .for("update")
      .limit(1);
    const mayEnd = row && (row.ownerId === access.userId || (row.k.userId === access.userId && row.k.state === "active"));
    if (!row || !mayEnd) throw notFound("That co-keeper");
    if (row.k.state === "ended") return { ended: true, vehicleId: row.k.vehicleId };
    await tx.update(vehicleKeeper).set({ state: "ended", endedAt: now, endedByUserId: access.userId }).where(eq(vehicleKeeper.id, keeperId));
    return { ended: true, vehicleId: row.k.vehicleId };
  });
}
