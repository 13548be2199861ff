import "server-only";
import { headers } from "next/headers";
import { cache } from "react";
import { auth } from "./server";

export type Session = NonNullable<Awaited<ReturnType<typeof auth.api.getSession>>>;
export type SessionUser = Session["user"];

/** The session record of the current request, a disabled account's included (server actions answer it 403). */
export const getSessionRecord = cache(async (): Promise<Session | null> => {
  return auth.api.getSession({ headers: await headers() });
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
  return auth.api.getSession({ headers: req.headers });
}
