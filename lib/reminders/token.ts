// Secrets of the reminder feed: 256 random bits, base64url in the URL, and
// only their SHA-256 in the database, so a copy of the database opens no feed.
import { createHash, randomBytes } from "node:crypto";

export function newFeedToken(): string {
  return randomBytes(32).toString("base64url");
}

export function hashFeedToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** Accepts `<token>` and `<token>.ics`; anything that is not base64url of the right length is no token. */
export function tokenFromPath(segment: string): string | null {
  const t = segment.endsWith(".ics") ? segment.slice(0, -4) : segment;
  return /^[A-Za-z0-9_-]{43}$/.test(t) ? t : null;
}

/** The feed's two addresses: https for copying, webcal:// for a one-tap subscribe. */
export function feedUrls(token: string, baseUrl: string): { https: string; webcal: string } {
  const https = `${baseUrl}/api/feed/${token}.ics`;
  return { https, webcal: https.replace(/^https?:\/\//, "webcal://") };
}
