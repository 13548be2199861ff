import "server-only";
import { headers } from "next/headers";
import { cache } from "react";
import { auth } from "./server";

export type Session = NonNullable<Awaited<ReturnType<typeof auth.api.getSession>>>;
export type SessionUser = Session["user"];

/** The session of the current request (pages, layouts, server actions). */
export const getSession = cache(async (): Promise<Session | null> => {
  return auth.api.getSession({ headers: await headers() });
});

/** The session of a route handler's request. */
export async function sessionFromRequest(req: Request): Promise<Session | null> {
  return auth.api.getSession({ headers: req.headers });
}
