import "server-only";
// The one Stripe client. With STRIPE_SECRET_KEY it talks to Stripe; without
// it the very same SDK is pointed, by host/port/protocol only, at the app's
// own fake of the Stripe API (served under /v1 by this server, see
// app/api/fake/stripe). No code path skips the SDK.
import Stripe from "stripe";
import { appUrl, env, usingFakeStripe } from "@/lib/env";
import { fakeStripeKey } from "./config";

/** Where the SDK finds the fake: STRIPE_API_BASE, or this server's own address. */
export function fakeStripeBase(): URL {
  return new URL(process.env.STRIPE_API_BASE || appUrl());
}

let client: Stripe | undefined;
let clientBase: string | undefined;

export function stripe(): Stripe {
  if (!usingFakeStripe()) {
    client ??= new Stripe(env().STRIPE_SECRET_KEY!, { maxNetworkRetries: 2 });
    return client;
  }
  const base = fakeStripeBase();
  if (!client || clientBase !== base.href) {
    const protocol = base.protocol === "https:" ? "https" : "http";
    client = new Stripe(fakeStripeKey(), {
      host: base.hostname,
      port: Number(base.port || (protocol === "https" ? 443 : 80)),
      protocol,
      // As with Stripe: a 409 for a request still in flight under the same idempotency key is retried, and then answered with the first result.
      maxNetworkRetries: 2,
      telemetry: false,
    });
    clientBase = base.href;
  }
  return client;
}

/** The SDK's own webhook helpers (signing for the fake, verifying for the route). */
export const stripeWebhooks = Stripe.webhooks;

/** Only for tests: forget the client after changing the environment. */
export function resetStripeClientForTests() {
  client = undefined;
  clientBase = undefined;
}
