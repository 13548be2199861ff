import "server-only";
// Per-kind unsubscribe links that work without signing in: the token is the
// account and the e-mail kind, signed with an HMAC keyed from the auth
// secret, so nothing needs storing and nobody can forge another's link.
//
// Two addresses per link: the page (a confirm button, for people) and the
// one-click endpoint (RFC 8058 POST, for mail programs). Give the page URL
// to the template's footer and the one-click URL to sendEmail's
// `unsubscribeUrl`, which becomes the List-Unsubscribe header.
import { createHmac, timingSafeEqual } from "node:crypto";
import { auth } from "@/lib/auth/server";
import type { EmailKind } from "@/lib/email/send";
import { appUrl } from "@/lib/env";

/** Kinds a driver can opt out of; account e-mails (password reset, invitations) always go. */
export const OPTIONAL_KINDS = ["reminder-digest", "pass-received", "pass-ended", "shop-entry", "plus-receipt"] as const satisfies readonly EmailKind[];
export type OptionalKind = (typeof OPTIONAL_KINDS)[number];

export const KIND_LABELS: Record<OptionalKind, string> = {
  "reminder-digest": "tire reminder e-mails",
  "pass-received": "e-mails when a shop receives a pass",
  "pass-ended": "e-mails when a shop pass ends",
  "shop-entry": "e-mails when a shop adds to your logbook",
  "plus-receipt": "Plus plan receipts",
};

function key(): Buffer {
  // A key of its own, derived from the auth secret: an unsubscribe token can never pass for anything else.
  return createHmac("sha256", String(auth.options.secret)).update("fourpatch/unsubscribe/v1").digest();
}

function sign(payload: string): string {
  return createHmac("sha256", key()).update(payload).digest("base64url");
}

export function unsubscribeToken({ userId, kind }: { userId: string; kind: OptionalKind }): string {
  const payload = Buffer.from(JSON.stringify({ u: userId, k: kind }), "utf8").toString("base64url");
  return `${payload}.${sign(payload)}`;
}

/** The page with the confirm button (link in the e-mail's footer). */
export function unsubscribeUrl({ userId, kind }: { userId: string; kind: OptionalKind }): string {
  return `${appUrl()}/unsubscribe/${unsubscribeToken({ userId, kind })}`;
}

/** The RFC 8058 one-click address (List-Unsubscribe header). */
export function oneClickUnsubscribeUrl({ userId, kind }: { userId: string; kind: OptionalKind }): string {
  return `${unsubscribeUrl({ userId, kind })}/one-click`;
}

export function verifyUnsubscribe(token: string): { userId: string; kind: OptionalKind } | null {
  const [payload, sig, extra] = String(token ?? "").split(".");
  if (!payload || !sig || extra !== undefined) return null;
  const expected = Buffer.from(sign(payload));
  const given = Buffer.from(sig);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return null;
  try {
    const data = JSON.parse(Buffer.from(payload, "base64url").toString("utf8")) as { u?: unknown; k?: unknown };
    if (typeof data.u !== "string" || !(OPTIONAL_KINDS as readonly string[]).includes(String(data.k))) return null;
    return { userId: data.u, kind: data.k as OptionalKind };
  } catch {
    return null;
  }
}
