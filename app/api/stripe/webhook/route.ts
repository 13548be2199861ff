// Stripe's webhooks (and the local fake's, signed the same way).
//
// AUTHENTICATED BY SIGNATURE, NOT BY SESSION OR ORIGIN: this route does not
// use the route() wrapper on purpose. It reads the raw body (the signature
// covers its exact bytes), verifies the Stripe-Signature header with the
// SDK's constructEvent (timestamp within 5 minutes, v1 HMAC-SHA256 with the
// webhook secret) and only then dispatches. A missing, bad, stale or
// wrong-secret signature is a 400 and changes nothing. Any CSRF/Origin or
// content-type check for state-changing routes must leave this route out.
import type Stripe from "stripe";
import { webhookSecret } from "@/lib/billing/config";
import { stripe } from "@/lib/billing/stripe";
import { applyEvent } from "@/lib/billing/webhook";

export const dynamic = "force-dynamic";

const MAX_BODY = 512 * 1024;
const TOLERANCE_SECONDS = 300;

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json", "cache-control": "no-store" } });

export async function POST(req: Request): Promise<Response> {
  const signature = req.headers.get("stripe-signature");
  if (!signature) return json(400, { error: { code: "invalid", message: "Missing Stripe-Signature header.", fields: { "stripe-signature": ["missing"] } } });
  if (Number(req.headers.get("content-length") ?? 0) > MAX_BODY) return json(413, { error: { code: "too_large", message: "Webhook body too large." } });
  const raw = await req.text();
  if (raw.length > MAX_BODY) return json(413, { error: { code: "too_large", message: "Webhook body too large." } });

  const secret = webhookSecret();
  // Without a configured secret (and without the local fake) nothing can verify: refuse every event.
  if (!secret) return json(400, { error: { code: "invalid", message: "Webhooks are not configured on this server.", fields: { "stripe-signature": ["not verifiable"] } } });
  let event: Stripe.Event;
  try {
    event = stripe().webhooks.constructEvent(raw, signature, secret, TOLERANCE_SECONDS);
  } catch {
    return json(400, { error: { code: "invalid", message: "The Stripe-Signature does not match this body.", fields: { "stripe-signature": ["invalid"] } } });
  }
  if (typeof event?.id !== "string" || typeof event.type !== "string" || typeof event.data?.object !== "object") {
    return json(400, { error: { code: "invalid", message: "The event has no id, type or data.", fields: { body: ["invalid"] } } });
  }
  try {
    const outcome = await applyEvent(event);
    return json(200, { received: true, outcome });
  } catch (err) {
    const e = err as { type?: string; statusCode?: number; message?: string };
    console.error("stripe webhook:", event.type, event.id, e?.message ?? err);
    // Stripe retries a non-2xx answer later; nothing of this event was recorded.
    return json(503, { error: { code: "internal", message: "The event could not be applied now; it will be retried." } });
  }
}
