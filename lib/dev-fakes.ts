// The one gate in front of every local fake (the e-mail outbox and fake
// Resend API; the payments fake uses it too). A fake is on only when
// FOURPATCH_DEV_FAKES=on is set explicitly, so a deployment that forgets a
// setting exposes nothing. Its pages answer only loopback clients or an
// operator's session; its APIs answer only this server, which holds a key
// made fresh in each process.
import crypto from "node:crypto";
import { clientAddress, isLoopback } from "@/lib/peer";

export const DEV_FAKES_SWITCH = "FOURPATCH_DEV_FAKES";

/** True only when development fakes were switched on explicitly. */
export function devFakesEnabled(): boolean {
  return process.env[DEV_FAKES_SWITCH] === "on";
}

const g = globalThis as unknown as { __fourpatchFakeKeys?: Map<string, string> };

/** The API key this process gives its SDK for the fake named `service`; unknowable outside the process. */
export function devFakeKey(service: string): string {
  g.__fourpatchFakeKeys ??= new Map();
  let key = g.__fourpatchFakeKeys.get(service);
  if (!key) {
    key = `fake_${service}_${crypto.randomBytes(24).toString("base64url")}`;
    g.__fourpatchFakeKeys.set(service, key);
  }
  return key;
}

function bearer(headers: Headers): string | null {
  const h = headers.get("authorization") ?? "";
  return h.startsWith("Bearer ") ? h.slice(7) : null;
}

export type DevFakeVerdict = { ok: true } | { ok: false; status: 401 | 404; reason: string };

async function isOperator(headers: Headers): Promise<boolean> {
  const { auth } = await import("@/lib/auth/server");
  const session = await auth.api.getSession({ headers }).catch(() => null);
  return !!session && session.user.role === "admin" && !session.user.banned;
}

/**
 * Judges a request to a local fake.
 * - `{ key: "resend" }` (fake APIs): the fakes are on and the request carries
 *   this process's key for that service (`devFakeKey`).
 * - no key (fake pages such as /dev/outbox): the fakes are on and the client
 *   is on the loopback interface or signed in as an operator.
 * A refusal is a 404 (the thing does not exist) or, for a fake API with a
 * missing or wrong key, a 401.
 */
export async function checkDevFakeRequest(input: Request | Headers, opts: { key?: string } = {}): Promise<DevFakeVerdict> {
  if (!devFakesEnabled()) return { ok: false, status: 404, reason: "fakes are off" };
  const headers = input instanceof Headers ? input : input.headers;
  if (opts.key) {
    const given = Buffer.from(bearer(headers) ?? "");
    const expected = Buffer.from(devFakeKey(opts.key));
    const match = given.length === expected.length && crypto.timingSafeEqual(given, expected);
    return match ? { ok: true } : { ok: false, status: 401, reason: "missing or wrong API key" };
  }
  if (isLoopback(clientAddress(headers))) return { ok: true };
  if (await isOperator(headers)) return { ok: true };
  return { ok: false, status: 404, reason: "not a loopback client or an operator" };
}

/** Like checkDevFakeRequest, but throws the ready answer: `catch (e) { if (e instanceof Response) return e; }`. */
export async function assertDevFakeRequest(input: Request | Headers, opts: { key?: string } = {}): Promise<void> {
  const v = await checkDevFakeRequest(input, opts);
  if (v.ok) return;
  throw Response.json(
    v.status === 401 ? { name: "missing_api_key", message: "Missing or invalid API key" } : { message: "Not found" },
    { status: v.status },
  );
}

/**
 * At server start: a production server that would fall back to a fake
 * (no real key) without the fakes switched on refuses to start.
 */
export function assertFakesConfigured(services: { name: string; realKeyVar: string }[]): void {
  if (process.env.NODE_ENV !== "production" || devFakesEnabled()) return;
  const missing = services.filter((s) => !process.env[s.realKeyVar]?.trim());
  if (missing.length === 0) return;
  const names = missing.map((s) => `${s.realKeyVar} (${s.name})`).join(", ");
  throw new Error(
    `Fourpatch will not start: ${names} not set. Set the real key, or for a local trial only ` +
      `start with ${DEV_FAKES_SWITCH}=on to use the local fakes (see README: Security).`,
  );
}
