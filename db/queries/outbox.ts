import "server-only";
import { desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { fakeOutbox } from "@/db/schema";

/** Stores a message; a repeated idempotency key returns the first message's id and stores nothing. */
export async function storeFakeEmail({
  message,
  idempotencyKey,
}: {
  idempotencyKey?: string;
  message: {
    from: string;
    to: string[];
    subject: string;
    html?: string;
    text?: string;
    headers?: Record<string, string>;
    tags?: { name: string; value: string }[];
  };
}): Promise<string> {
  if (idempotencyKey) {
    const [seen] = await db.select({ id: fakeOutbox.id }).from(fakeOutbox).where(eq(fakeOutbox.idempotencyKey, idempotencyKey)).limit(1);
    if (seen) return seen.id;
  }
  const [row] = await db
    .insert(fakeOutbox)
    .values({
      fromAddress: message.from,
      toAddresses: message.to.map((a) => a.toLowerCase()),
      subject: message.subject,
      html: message.html,
      text: message.text,
      headers: message.headers,
      tags: message.tags,
      idempotencyKey,
    })
    .onConflictDoNothing({ target: fakeOutbox.idempotencyKey })
    .returning({ id: fakeOutbox.id });
  if (row) return row.id;
  // Lost a race with the same key: the other request stored it.
  const [first] = await db.select({ id: fakeOutbox.id }).from(fakeOutbox).where(eq(fakeOutbox.idempotencyKey, idempotencyKey!)).limit(1);
  return first.id;
}

export async function listFakeEmails({ to, limit = 100 }: { to?: string; limit?: number }) {
  const where = to ? sql`${fakeOutbox.toAddresses} @> ${JSON.stringify([to.toLowerCase()])}::jsonb` : undefined;
  return db
    .select({
      id: fakeOutbox.id,
      fromAddress: fakeOutbox.fromAddress,
      toAddresses: fakeOutbox.toAddresses,
      subject: fakeOutbox.subject,
      tags: fakeOutbox.tags,
      createdAt: fakeOutbox.createdAt,
    })
    .from(fakeOutbox)
    .where(where)
    .orderBy(desc(fakeOutbox.createdAt))
    .limit(limit);
}

export async function getFakeEmail({ id }: { id: string }) {
  const [row] = await db.select().from(fakeOutbox).where(eq(fakeOutbox.id, id)).limit(1);
  return row ?? null;
}
