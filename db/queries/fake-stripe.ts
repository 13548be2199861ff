import "server-only";
// Storage of the local Stripe fake: objects in Stripe's JSON shapes, keyed by
// their Stripe-style id, and remembered Idempotency-Key answers. Only the
// fake (lib/billing/fake) and its developer page use these.
import { and, desc, eq, inArray } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { fakeStripeIdempotency, fakeStripeObject } from "@/db/schema";

type Exec = typeof db | Transaction;

export type FakeObject = { id: string; objectType: string; customerId: string | null; data: Record<string, unknown>; fakeFlags: Record<string, unknown>; createdAt: Date };

export async function getFakeObject({ id, type, tx = db }: { id: string; type?: string; tx?: Exec }): Promise<FakeObject | null> {
  const [row] = await tx
    .select()
    .from(fakeStripeObject)
    .where(type ? and(eq(fakeStripeObject.id, id), eq(fakeStripeObject.objectType, type)) : eq(fakeStripeObject.id, id))
    .limit(1);
  return row ?? null;
}

export async function putFakeObject({
  object,
  fakeFlags,
  tx = db,
}: {
  object: Record<string, unknown> & { id: string; object: string };
  fakeFlags?: Record<string, unknown>;
  tx?: Exec;
}) {
  const customerId = typeof object.customer === "string" ? object.customer : object.object === "customer" ? object.id : null;
  await tx
    .insert(fakeStripeObject)
    .values({ id: object.id, objectType: object.object, customerId, data: object, fakeFlags: fakeFlags ?? {} })
    .onConflictDoUpdate({
      target: fakeStripeObject.id,
      set: { data: object, customerId, ...(fakeFlags ? { fakeFlags } : {}) },
    });
}

export async function listFakeObjects({ type, customerId, limit = 100, tx = db }: { type: string | string[]; customerId?: string; limit?: number; tx?: Exec }) {
  const types = Array.isArray(type) ? type : [type];
  return tx
    .select()
    .from(fakeStripeObject)
    .where(and(inArray(fakeStripeObject.objectType, types), customerId ? eq(fakeStripeObject.customerId, customerId) : undefined))
    .orderBy(desc(fakeStripeObject.createdAt), desc(fakeStripeObject.id))
    .limit(Math.min(Math.max(limit, 1), 500));
}

/** Reserves an Idempotency-Key; returns the stored answer when the key was seen, or null when this request owns it. */
export async function reserveIdempotencyKey({ apiKey, key }: { apiKey: string; key: string }): Promise<{ status: number; body: unknown } | null> {
  const [won] = await db
    .insert(fakeStripeIdempotency)
    .values({ apiKey, key, status: 0, body: {} })
    .onConflictDoNothing()
    .returning({ key: fakeStripeIdempotency.key });
  if (won) return null;
  const [seen] = await db
    .select({ status: fakeStripeIdempotency.status, body: fakeStripeIdempotency.body })
    .from(fakeStripeIdempotency)
    .where(and(eq(fakeStripeIdempotency.apiKey, apiKey), eq(fakeStripeIdempotency.key, key)))
    .limit(1);
  return seen ?? { status: 0, body: {} };
}

export async function settleIdempotencyKey({ apiKey, key, status, body }: { apiKey: string; key: string; status: number; body: unknown }) {
  // A server error is not remembered, like Stripe: the client may retry with the same key.
  if (status >= 500) {
    await db.delete(fakeStripeIdempotency).where(and(eq(fakeStripeIdempotency.apiKey, apiKey), eq(fakeStripeIdempotency.key, key)));
    return;
  }
  await db
    .update(fakeStripeIdempotency)
    .set({ status, body: body as object })
    .where(and(eq(fakeStripeIdempotency.apiKey, apiKey), eq(fakeStripeIdempotency.key, key)));
}
