import "server-only";
// The one switch of the local Stripe fake (its API, hosted checkout and
// invoice pages, and the developer page). Today it follows the e-mail fake:
// on only while no real STRIPE_SECRET_KEY is configured; in addition it
// answers only requests addressed to a loopback host and, where a forwarding
// header names the client, coming from loopback. When the shared gate for
// local fakes lands (explicit dev-fakes switch + loopback only), this
// function is the one place to swap to it.
import { usingFakeStripe } from "@/lib/env";

const LOOPBACK_HOSTS = /^(localhost|127(?:\.\d{1,3}){3}|\[::1\]|::1)$/i;
const LOOPBACK_ADDRESSES = /^(127(?:\.\d{1,3}){3}|::1|::ffff:127(?:\.\d{1,3}){3})$/i;

function hostnameOf(host: string | null): string {
  if (!host) return "";
  const h = host.trim();
  if (h.startsWith("[")) return h.slice(0, h.indexOf("]") + 1);
  return h.split(":")[0] ?? "";
}

export function fakeStripeAllowed(headers: Headers): boolean {
  if (!usingFakeStripe()) return false;
  if (!LOOPBACK_HOSTS.test(hostnameOf(headers.get("x-forwarded-host") ?? headers.get("host")))) return false;
  const forwarded = headers.get("x-forwarded-for");
  if (forwarded && !forwarded.split(",").every((a) => LOOPBACK_ADDRESSES.test(a.trim()))) return false;
  return true;
}
