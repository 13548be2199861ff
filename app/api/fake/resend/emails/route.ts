// The local fake of the Resend API's `POST /emails`, used by the resend SDK
// when no real key is configured and development fakes are switched on. It
// keeps each message in the outbox, and answers only this server's own key
// (lib/dev-fakes.ts): anyone else gets a 404 or a 401.
import { NextResponse } from "next/server";
import { z } from "zod";
import { storeFakeEmail } from "@/db/queries/outbox";
import { assertDevFakeRequest } from "@/lib/dev-fakes";
import { usingFakeEmail } from "@/lib/env";

const addresses = z.union([z.string(), z.array(z.string())]).transform((v) => (Array.isArray(v) ? v : [v]));

const sendSchema = z.object({
  from: z.string().min(1),
  to: addresses,
  subject: z.string().min(1),
  html: z.string().optional(),
  text: z.string().optional(),
  headers: z.record(z.string(), z.string()).optional(),
  tags: z.array(z.object({ name: z.string(), value: z.string() })).optional(),
});

export async function POST(req: Request) {
  try {
    await assertDevFakeRequest(req, { key: "resend" });
  } catch (refusal) {
    if (refusal instanceof Response) return refusal;
    throw refusal;
  }
  if (!usingFakeEmail()) return NextResponse.json({ message: "Not found" }, { status: 404 });
  const parsed = sendSchema.safeParse(await req.json().catch(() => null));
  if (!parsed.success) {
    return NextResponse.json({ name: "validation_error", message: parsed.error.issues[0]?.message ?? "Invalid" }, { status: 422 });
  }
  const id = await storeFakeEmail({ message: parsed.data, idempotencyKey: req.headers.get("idempotency-key") ?? undefined });
  return NextResponse.json({ id });
}
