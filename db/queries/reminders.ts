import "server-only";
// Reminders of one driver: the settings, the computed items, the calendar
// feed's secret and the e-mail deliveries. Every query takes the acting
// driver (or, for the feed, the secret that stands for them).
import { and, eq, inArray, isNull, lt, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { billingSubscription, driverProfile, emailOptOut, reminderDelivery, reminderFeed, user } from "@/db/schema";
import { plusSql } from "@/db/queries/billing";
import { planFromSubscriptions } from "@/lib/billing/entitlement";
import { loadLogbookInput } from "@/db/queries/logbook-input";
import { planAllowsKind, type Plan } from "@/lib/plan";
import { hashFeedToken, newFeedToken } from "@/lib/reminders/token";
import { computeReminders, JURISDICTIONS, type Jurisdiction, type LogbookInput, type ReminderItem, type Skipped } from "@/lib/tires";
import { parseStoredSettings, type StoredReminderSettings } from "@/lib/validation/reminders";

export type ReminderProfile = {
  userId: string;
  name: string;
  email: string;
  plan: Plan;
  timezone: string;
  jurisdiction: Jurisdiction;
  emailReminders: boolean;
  settings: StoredReminderSettings;
  optedOut: string[];
};

export async function reminderProfile({ userId }: { userId: string }): Promise<ReminderProfile | null> {
  // One round trip (the calendar feed asks on every poll): the opt-outs and the subscriptions come as JSON beside the profile.
  const [row] = await db
    .select({
      p: driverProfile,
      name: user.name,
      email: user.email,
      optedOut: sql<string[]>`coalesce((select json_agg(${emailOptOut.kind}) from ${emailOptOut} where ${emailOptOut.userId} = ${driverProfile.userId}), '[]'::json)`,
      subscriptions: sql<{ status: string; currentPeriodEnd: string | null }[]>`coalesce((select json_agg(json_build_object('status', ${billingSubscription.status}, 'currentPeriodEnd', ${billingSubscription.currentPeriodEnd})) from ${billingSubscription} where ${billingSubscription.userId} = ${driverProfile.userId}), '[]'::json)`,
    })
    .from(driverProfile)
    .innerJoin(user, eq(user.id, driverProfile.userId))
    .where(eq(driverProfile.userId, userId))
    .limit(1);
  if (!row) return null;
  const opt = row.optedOut.map((kind) => ({ kind }));
  const jurisdiction = (JURISDICTIONS as string[]).includes(row.p.jurisdiction) ? (row.p.jurisdiction as Jurisdiction) : "EU";
  return {
    userId,
    name: row.name,
    email: row.email,
    // From the stored subscriptions (status and period end), never a column set by hand; the same rule as planOf().
    plan: planFromSubscriptions(
      row.subscriptions.map((s) => ({ status: s.status, currentPeriodEnd: s.currentPeriodEnd ? new Date(s.currentPeriodEnd) : null })),
      new Date(),
    ),
    timezone: row.p.timezone,
    jurisdiction,
    emailReminders: row.p.emailReminders,
    settings: parseStoredSettings(row.p.reminderSettings),
    optedOut: opt.map((o) => o.kind),
  };
}

export type DriverReminders = { profile: ReminderProfile; items: ReminderItem[]; skipped: Skipped[]; error?: string };

/**
 * The driver's coming reminders in date order: the core's computation over
 * their whole logbook, narrowed to the kinds they chose and their plan allows.
 */
export async function remindersFor({ userId, today, logbook }: { userId: string; today: string; logbook?: LogbookInput }): Promise<DriverReminders | null> {
  const profile = await reminderProfile({ userId });
  if (!profile) return null;
  return { profile, ...(await computeFor({ profile, today, logbook })) };
}

/** `logbook`: the driver's whole logbook when the caller loaded it already (the overview). */
export async function computeFor({ profile, today, logbook: loaded }: { profile: ReminderProfile; today: string; logbook?: LogbookInput }) {
  const logbook = loaded ?? (await loadLogbookInput({ ownerId: profile.userId }));
  const s = profile.settings;
  const result = computeReminders(
    logbook,
    {
      jurisdiction: profile.jurisdiction,
      customDepthMm: s.customDepthMm,
      rotationIntervalKm: s.rotationIntervalKm,
      autumnSwap: s.autumnSwap,
      springSwap: s.springSwap,
    },
    { today },
  );
  if (!result.ok) return { items: [], skipped: [], error: result.error };
  const items = result.items.filter((i) => s.kinds.includes(i.kind) && planAllowsKind({ plan: profile.plan, kind: i.kind }));
  return { items, skipped: result.skipped };
}

export async function saveReminderSettings({
  userId,
  jurisdiction,
  emailReminders,
  settings,
  timezone,
}: {
  userId: string;
  jurisdiction: Jurisdiction;
  emailReminders: boolean;
  settings: StoredReminderSettings;
  timezone: string;
}) {
  await db
    .update(driverProfile)
    .set({ jurisdiction, emailReminders, reminderSettings: settings, timezone, updatedAt: new Date() })
    .where(eq(driverProfile.userId, userId));
}

// ---- the calendar feed -------------------------------------------------

export type FeedState = { createdAt: Date; lastFetchedAt: Date | null } | null;

export async function activeFeedOf({ userId }: { userId: string }): Promise<FeedState> {
  const [row] = await db
    .select({ createdAt: reminderFeed.createdAt, lastFetchedAt: reminderFeed.lastFetchedAt })
    .from(reminderFeed)
    .where(and(eq(reminderFeed.userId, userId), isNull(reminderFeed.revokedAt)))
    .limit(1);
  return row ?? null;
}

/** A new secret for the driver's feed; every older one stops working in the same transaction. */
export async function regenerateFeed({ userId }: { userId: string }): Promise<string> {
  const token = newFeedToken();
  await db.transaction(async (tx) => {
    await tx.update(reminderFeed).set({ revokedAt: new Date() }).where(and(eq(reminderFeed.userId, userId), isNull(reminderFeed.revokedAt)));
    await tx.insert(reminderFeed).values({ userId, tokenHash: hashFeedToken(token) });
  });
  return token;
}

export async function revokeFeed({ userId }: { userId: string }): Promise<void> {
  await db.update(reminderFeed).set({ revokedAt: new Date() }).where(and(eq(reminderFeed.userId, userId), isNull(reminderFeed.revokedAt)));
}

/** How stale the feed's "a calendar app last read it" may be: one write per hour at most, not one per poll. */
export const FEED_FETCH_STAMP_MS = 60 * 60 * 1000;

export type LiveFeed = { id: string; userId: string; contentTag: string | null; contentChangedAt: Date | null };

/** The live feed a secret stands for, or null. Notes the fetch at most once per FEED_FETCH_STAMP_MS. */
export async function feedForToken({ token, now = new Date() }: { token: string; now?: Date }): Promise<LiveFeed | null> {
  const [row] = await db
    .select({
      id: reminderFeed.id,
      userId: reminderFeed.userId,
      lastFetchedAt: reminderFeed.lastFetchedAt,
      contentTag: reminderFeed.contentTag,
      contentChangedAt: reminderFeed.contentChangedAt,
      banned: user.banned,
    })
    .from(reminderFeed)
    .innerJoin(user, eq(user.id, reminderFeed.userId))
    .where(and(eq(reminderFeed.tokenHash, hashFeedToken(token)), isNull(reminderFeed.revokedAt)))
    .limit(1);
  if (!row || row.banned) return null;
  if (!row.lastFetchedAt || now.getTime() - row.lastFetchedAt.getTime() >= FEED_FETCH_STAMP_MS) {
    await db.update(reminderFeed).set({ lastFetchedAt: now }).where(eq(reminderFeed.id, row.id));
  }
  return { id: row.id, userId: row.userId, contentTag: row.contentTag, contentChangedAt: row.contentChangedAt };
}

/** The driver a live feed secret stands for, or null. */
export async function userForFeedToken({ token }: { token: string }): Promise<string | null> {
  return (await feedForToken({ token }))?.userId ?? null;
}

/**
 * Records what the feed now serves. Returns when that content first appeared:
 * unchanged content keeps its old time (and writes nothing).
 */
export async function noteFeedContent({ feed, tag, now }: { feed: LiveFeed; tag: string; now: Date }): Promise<Date> {
  if (feed.contentTag === tag && feed.contentChangedAt) return feed.contentChangedAt;
  // Whole seconds: HTTP dates carry no fractions, and If-Modified-Since compares them.
  const at = new Date(Math.floor(now.getTime() / 1000) * 1000);
  await db.update(reminderFeed).set({ contentTag: tag, contentChangedAt: at }).where(eq(reminderFeed.id, feed.id));
  return at;
}

// ---- e-mail deliveries -------------------------------------------------

/** Plus drivers with e-mail reminders on who have not opted out of the digest. */
export async function driversForDelivery(): Promise<string[]> {
  const rows = await db
    .select({ userId: driverProfile.userId })
    .from(driverProfile)
    .innerJoin(user, eq(user.id, driverProfile.userId))
    .leftJoin(emailOptOut, and(eq(emailOptOut.userId, driverProfile.userId), eq(emailOptOut.kind, "reminder-digest")))
    .where(
      and(
        plusSql(driverProfile.userId),
        eq(driverProfile.emailReminders, true),
        isNull(emailOptOut.userId),
        or(isNull(user.banned), eq(user.banned, false)),
      ),
    );
  return rows.map((r) => r.userId);
}

export type Claimed = { id: string; reminderId: string; dueOn: string; claimId: string };

/**
 * Claims the deliveries this run may send for one driver: new rows it wins
 * by inserting first (the unique key lets exactly one run win each), and
 * pending rows whose claim is older than `staleBefore` (a run that crashed
 * or failed). Each claim is one atomic statement, so two overlapping runs
 * never hold the same row.
 *
 * Rows keep the grouping of the message they were claimed for: new rows get
 * `claimId`, and the rows of each earlier claim get a claim of their own
 * (`claimId#md5(earlier claim)`). A message is one claim's rows, so a retry
 * rebuilds exactly the message that may have gone out before a crash, with
 * the same idempotency key, even when other reminders have come due since.
 */
export async function claimDeliveries({
  userId,
  due,
  claimId,
  now,
  staleBefore,
}: {
  userId: string;
  due: { reminderId: string; dueOn: string }[];
  claimId: string;
  now: Date;
  staleBefore: Date;
}): Promise<Claimed[]> {
  const won = due.length
    ? await db
        .insert(reminderDelivery)
        .values(due.map((d) => ({ userId, reminderId: d.reminderId, dueOn: d.dueOn, channel: "email", status: "pending", claimId, claimedAt: now, attempts: 1 })))
        .onConflictDoNothing()
        .returning({ id: reminderDelivery.id, reminderId: reminderDelivery.reminderId, dueOn: reminderDelivery.dueOn, claimId: reminderDelivery.claimId })
    : [];
  // The same table under another name: in UPDATE … FROM it shows each row as it was before this statement.
  const before = alias(reminderDelivery, "before");
  // The rule cannot see the .where() after .from(): it is there, scoped to this driver's stale pending rows.
  // eslint-disable-next-line drizzle/enforce-update-with-where
  const retaken = await db
    .update(reminderDelivery)
    .set({ claimId: sql`${claimId} || '#' || md5(coalesce(${before.claimId}, ''))`, claimedAt: now, attempts: sql`${reminderDelivery.attempts} + 1` })
    .from(before)
    .where(
      and(
        eq(before.id, reminderDelivery.id),
        eq(reminderDelivery.userId, userId),
        eq(reminderDelivery.channel, "email"),
        eq(reminderDelivery.status, "pending"),
        or(isNull(reminderDelivery.claimedAt), lt(reminderDelivery.claimedAt, staleBefore)),
      ),
    )
    .returning({ id: reminderDelivery.id, reminderId: reminderDelivery.reminderId, dueOn: reminderDelivery.dueOn, claimId: reminderDelivery.claimId });
  return [...won, ...retaken].map((r) => ({ ...r, claimId: r.claimId! }));
}

export async function markDeliveries({
  userId,
  ids,
  claimId,
  outcome,
}: {
  userId: string;
  ids: string[];
  claimId: string;
  outcome: { status: "sent"; providerMessageId: string } | { status: "cancelled" } | { status: "failed"; error: string; retryNow: boolean };
}) {
  if (ids.length === 0) return;
  const mine = and(eq(reminderDelivery.userId, userId), inArray(reminderDelivery.id, ids), eq(reminderDelivery.claimId, claimId));
  if (outcome.status === "sent") {
    await db.update(reminderDelivery).set({ status: "sent", sentAt: new Date(), providerMessageId: outcome.providerMessageId, lastError: null }).where(mine);
  } else if (outcome.status === "cancelled") {
    await db.update(reminderDelivery).set({ status: "cancelled" }).where(mine);
  } else {
    // A refusal we know about can be retried by the next run; an unknown
    // outcome (exception) keeps its claim until the retry window passes.
    await db
      .update(reminderDelivery)
      .set({ lastError: outcome.error.slice(0, 500), ...(outcome.retryNow ? { claimedAt: null } : {}) })
      .where(mine);
  }
}

export async function deliveriesOf({ userId }: { userId: string }) {
  return db.select().from(reminderDelivery).where(eq(reminderDelivery.userId, userId));
}

// ---- e-mail opt-outs ---------------------------------------------------

export async function optOut({ userId, kind }: { userId: string; kind: string }) {
  await db.insert(emailOptOut).values({ userId, kind }).onConflictDoNothing();
}

export async function optBackIn({ userId, kind }: { userId: string; kind: string }) {
  await db.delete(emailOptOut).where(and(eq(emailOptOut.userId, userId), eq(emailOptOut.kind, kind)));
}

export async function isOptedOut({ userId, kind }: { userId: string; kind: string }): Promise<boolean> {
  const [row] = await db
    .select({ kind: emailOptOut.kind })
    .from(emailOptOut)
    .where(and(eq(emailOptOut.userId, userId), eq(emailOptOut.kind, kind)))
    .limit(1);
  return !!row;
}
