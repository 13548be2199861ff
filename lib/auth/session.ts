import "server-only";
import { headers } from "next/headers";
import { cache } from "react";
import { LRUCache } from "lru-cache";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { sessionRevision } from "@/db/schema";
import { auth } from "./server";

export type Session = NonNullable<Awaited<ReturnType<typeof auth.api.getSession>>>;
export type SessionUser = Session["user"];

// A confirmed session is kept in memory under its exact cookie and the
// database's session revision (migration 0014: any change or deletion of a
// session or a user moves it). A request with the same cookie then costs one
// small query instead of the library's two queries and its signature check.
// A session near its refresh time or its end always goes to the library,
// which refreshes or ends it. FOURPATCH_CACHE_CHECK=1 (the tests) asks the
// library every time as well and fails when the answers differ.
const kept = new LRUCache<string, { session: Session; revision: number }>({ max: 10_000 });
const stats = { hits: 0, misses: 0 };

/** How many sessions came from memory and how many from the library, since the process started. */
export function keptSessionStats() {
  return { ...stats };
}

/** better-auth's session cookies (plain and __Secure- on https), and the "do not remember me" one. */
const SESSION_COOKIE = /(?:^|;\s*)((?:__Secure-)?better-auth\.(?:session_token|dont_remember))=([^;]*)/g;

function cookieKey(h: Headers): string | null {
  const cookie = h.get("cookie");
  if (!cookie || cookie.length > 8192) return null;
  let key = "";
  let token = false;
  for (const m of cookie.matchAll(SESSION_COOKIE)) {
    key += `${m[1]}=${m[2]};`;
    if (m[1].endsWith("session_token")) token = true;
  }
  return token ? key : null;
}

async function currentRevision(): Promise<number> {
  const [row] = await db.select({ revision: sessionRevision.revision }).from(sessionRevision).where(eq(sessionRevision.id, 1)).limit(1);
  return row?.revision ?? 0;
}

/** The library's own refresh rule (better-auth getSession): a day before expiry by default. */
const DAY_MS = 24 * 60 * 60 * 1000;
function dueForLibrary(s: Session, now: number): boolean {
  const expires = new Date(s.session.expiresAt).getTime();
  return expires - 7 * DAY_MS + DAY_MS <= now || expires - 60_000 <= now;
}

async function sessionOf(h: Headers): Promise<Session | null> {
  const key = cookieKey(h);
  if (!key) return auth.api.getSession({ headers: h });
  // Read before the library is asked: a change in between leaves an older number beside a newer answer, never the reverse.
  const revision = await currentRevision();
  const found = kept.get(key);
  if (found && found.revision === revision && !dueForLibrary(found.session, Date.now())) {
    stats.hits += 1;
    if (process.env.FOURPATCH_CACHE_CHECK === "1") {
      const fresh = await auth.api.getSession({ headers: h });
      if (JSON.stringify(fresh) !== JSON.stringify(found.session)) {
        throw new Error(`The session kept in memory is stale: a change did not move session_revision.\nkept:  ${JSON.stringify(found.session)}\nfresh: ${JSON.stringify(fresh)}`);
      }
    }
    return found.session;
  }
  stats.misses += 1;
  const fresh = await auth.api.getSession({ headers: h });
  if (fresh) kept.set(key, { session: fresh, revision });
  else kept.delete(key);
  return fresh;
}

/** The session record of the current request, a disabled account's included (server actions answer it 403). */
export const getSessionRecord = cache(async (): Promise<Session | null> => {
  return sessionOf(await headers());
});

/**
 * The session of the current request for pages and layouts. A disabled
 * account has none: disabling deletes its sessions, and one that survived
 * (made before the flag was set) opens no page either — every area sends it
 * to sign-in, which says the account is disabled.
 */
export const getSession = cache(async (): Promise<Session | null> => {
  const s = await getSessionRecord();
  return s && !s.user.banned ? s : null;
});

/** The session of a route handler's request. */
export async function sessionFromRequest(req: Request): Promise<Session | null> {
  return sessionOf(req.headers);
}
