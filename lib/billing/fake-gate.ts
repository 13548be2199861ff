import "server-only";
// The one switch of the local Stripe fake's pages (hosted checkout, invoice
// pages, the developer page): the shared gate of every local fake
// (lib/dev-fakes.ts: switched on explicitly, loopback clients or an
// operator), and only while no real STRIPE_SECRET_KEY is configured. The
// fake's API checks this process's own key instead (see its route).
import { checkDevFakeRequest } from "@/lib/dev-fakes";
import { usingFakeStripe } from "@/lib/env";

export async function fakeStripeAllowed(headers: Headers): Promise<boolean> {
  if (!usingFakeStripe()) return false;
  return (await checkDevFakeRequest(headers)).ok;
}
