// Test accounts made through better-auth itself, with the session cookie a
// browser would send.
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { member, organization, shopProfile, user } from "@/db/schema";
import { auth } from "@/lib/auth/server";
import { PEER_HEADER, peerHeaderForTests } from "@/lib/peer";

export type TestUser = { id: string; email: string; name: string; headers: Headers; cookie: string };

let counter = 0;

export async function signUp(opts: { name?: string; email?: string; admin?: boolean } = {}): Promise<TestUser> {
  counter += 1;
  const name = opts.name ?? `Test Driver ${counter}`;
  const email = opts.email ?? `driver${counter}-${Math.random().toString(36).slice(2, 8)}@example.test`;
  const { headers: resHeaders, response } = await auth.api.signUpEmail({
    body: { name, email, password: "correct-horse-battery" },
    returnHeaders: true,
  });
  const setCookie = resHeaders.getSetCookie?.() ?? [resHeaders.get("set-cookie") ?? ""];
  const cookie = setCookie.map((c) => c.split(";")[0]).join("; ");
  if (opts.admin) await db.update(user).set({ role: "admin" }).where(eq(user.id, response.user.id));
  return { id: response.user.id, email, name, cookie, headers: new Headers({ cookie }) };
}

export async function makeShop(opts: { name?: string; town?: string; owner: TestUser; technicians?: TestUser[] }) {
  counter += 1;
  const id = `shop_test_${counter}_${Math.random().toString(36).slice(2, 8)}`;
  await db.insert(organization).values({ id, name: opts.name ?? `Test Shop ${counter}`, slug: id });
  await db.insert(shopProfile).values({ shopId: id, town: opts.town ?? "Testford" });
  await db.insert(member).values({ id: `${id}_owner`, organizationId: id, userId: opts.owner.id, role: "owner" });
  for (const [i, t] of (opts.technicians ?? []).entries()) {
    await db.insert(member).values({ id: `${id}_tech_${i}`, organizationId: id, userId: t.id, role: "technician" });
  }
  return { id };
}

/** Builds a Request for a route handler, signed in as `as` when given. */
export function request(
  url: string,
  opts: { method?: string; body?: unknown; as?: TestUser; headers?: Record<string, string>; peer?: string } = {},
): Request {
  const headers = new Headers(opts.headers);
  // The socket address the server would stamp on the request (lib/peer.ts).
  if (opts.peer) headers.set(PEER_HEADER, peerHeaderForTests(opts.peer));
  if (opts.as) headers.set("cookie", opts.as.cookie);
  let body: BodyInit | undefined;
  if (opts.body instanceof FormData) body = opts.body;
  else if (opts.body !== undefined) {
    headers.set("content-type", "application/json");
    body = JSON.stringify(opts.body);
  }
  return new Request(new URL(url, "http://fourpatch.test"), { method: opts.method ?? (body ? "POST" : "GET"), headers, body });
}

/** The `ctx` argument Next passes to a route handler. */
export const ctx = <P extends Record<string, string>>(params: P) => ({ params: Promise.resolve(params) });
