import "server-only";
// In-process rate limits (the app runs as one process on its PGlite folder).
// Buckets are keyed by the client's real address (lib/peer.ts) or by account,
// never by a header the client chooses.
import { AppError } from "@/lib/errors";

export class RateLimitedError extends AppError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super("rate_limited", message);
  }
}

type Bucket = { count: number; resetAt: number };
type Backoff = { failures: number; lockedUntil: number; lastFailure: number };

const g = globalThis as unknown as { __fourpatchLimits?: Map<string, Bucket>; __fourpatchBackoff?: Map<string, Backoff> };
const buckets = () => (g.__fourpatchLimits ??= new Map());
const backoffs = () => (g.__fourpatchBackoff ??= new Map());

export function rateLimitsEnabled(): boolean {
  return process.env.FOURPATCH_RATE_LIMIT !== "off" && process.env.FOURPATCH_AUTH_RATE_LIMIT !== "off";
}

function sweep(now: number) {
  const m = buckets();
  if (m.size < 10_000) return;
  for (const [k, b] of m) if (b.resetAt <= now) m.delete(k);
}

export type Limit = { name: string; max: number; windowMs: number };

/** Counts one hit of `key` against a fixed window; throws RateLimitedError over the limit. */
export function hitLimit(limit: Limit, key: string, now = Date.now()): void {
  if (!rateLimitsEnabled()) return;
  sweep(now);
  const id = `${limit.name}:${key}`;
  const m = buckets();
  let b = m.get(id);
  if (!b || b.resetAt <= now) {
    b = { count: 0, resetAt: now + limit.windowMs };
    m.set(id, b);
  }
  b.count += 1;
  if (b.count > limit.max) {
    const retry = Math.max(1, Math.ceil((b.resetAt - now) / 1000));
    throw new RateLimitedError(`Too many requests. Try again in ${retry} seconds.`, retry);
  }
}

// Per-account backoff for password guesses: the first FREE failures cost
// nothing, then each failure doubles the wait (1 s, 2 s, 4 s … at most 15
// minutes). A success clears it; an hour without failures forgets it.
const FREE_FAILURES = 5;
const MAX_LOCK_MS = 15 * 60_000;
const FORGET_MS = 60 * 60_000;

export function accountLockedFor(account: string, now = Date.now()): number {
  if (!rateLimitsEnabled()) return 0;
  const b = backoffs().get(account.toLowerCase());
  if (!b) return 0;
  if (now - b.lastFailure > FORGET_MS) {
    backoffs().delete(account.toLowerCase());
    return 0;
  }
  return Math.max(0, b.lockedUntil - now);
}

export function recordAccountFailure(account: string, now = Date.now()): void {
  if (!rateLimitsEnabled()) return;
  const key = account.toLowerCase();
  const m = backoffs();
  const b = m.get(key) ?? { failures: 0, lockedUntil: 0, lastFailure: now };
  b.failures += 1;
  b.lastFailure = now;
  if (b.failures >= FREE_FAILURES) b.lockedUntil = now + Math.min(MAX_LOCK_MS, 1000 * 2 ** (b.failures - FREE_FAILURES));
  m.set(key, b);
  if (m.size > 50_000) for (const [k, v] of m) if (now - v.lastFailure > FORGET_MS) m.delete(k);
}

export function recordAccountSuccess(account: string): void {
  backoffs().delete(account.toLowerCase());
}

/** Only for tests. */
export function resetRateLimitsForTests(): void {
  buckets().clear();
  backoffs().clear();
}

// The limits of the app's own routes (better-auth's own limiter covers its
// endpoints by the same client address, see lib/auth/server.ts).
export const LIMITS = {
  upload: { name: "upload", max: 30, windowMs: 60 * 60_000 },
  feed: { name: "feed", max: 120, windowMs: 60 * 60_000 },
  joinShop: { name: "join", max: 10, windowMs: 15 * 60_000 },
  writes: { name: "writes", max: 600, windowMs: 60_000 },
} satisfies Record<string, Limit>;
