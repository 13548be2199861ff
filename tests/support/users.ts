// Test accounts made through better-auth itself, with the session cookie a
// browser would send.
import { desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { fakeOutbox, member, organization, shopProfile, user } from "@/db/schema";
import { auth } from "@/lib/auth/server";
import { PEER_HEADER, peerHeaderForTests } from "@/lib/peer";

export type TestUser = { id: string; email: string; name: string; headers: Headers; cookie: string };

let counter = 0;

export async function signUp(opts: { name?: string; email?: string; admin?: boolean } = {}): Promise<TestUser> {
  counter += 1;
  const name = opts.name ?? `Test Driver ${counter}`;
  const email = opts.email ?? `driver${counter}-${Math.random().toString(36).slice(2, 8)}@example.test`;
  const response = await auth.api.signUpEmail({ body: { name, email, password: "correct-horse-battery" } });
  // No session before the address is confirmed: follow the link of the
  // verification e-mail, as the new driver would, and keep its session cookie.
  const token = new URL(await linkFromOutbox(email, "verify-email", "/api/auth/verify-email")).searchParams.get("token")!;
  const { headers: resHeaders } = await auth.api.verifyEmail({ query: { token }, returnHeaders: true });
  const setCookie = resHeaders.getSetCookie?.() ?? [resHeaders.get("set-cookie") ?? ""];
  const cookie = setCookie.map((c) => c.split(";")[0]).join("; ");
  if (!cookie.includes("session_token")) throw new Error(`verifying ${email} gave no session`);
  if (opts.admin) await db.update(user).set({ role: "admin" }).where(eq(user.id, response.user.id));
  return { id: response.user.id, email, name, cookie, headers: new Headers({ cookie }) };
}

/**
 * The first link containing `path` in the newest e-mail of `kind` to `to` in
 * the fake's outbox. Mails that depend on whether an account exists are sent
 * without being awaited, so this waits for it (up to 5 s).
 */
export async function linkFromOutbox(to: string, kind: string, path: string): Promise<string> {
  for (let i = 0; i < 250; i++) {
    const rows = await db
      .select({ text: fakeOutbox.text, tags: fakeOutbox.tags })
      .from(fakeOutbox)
      .where(sql`${fakeOutbox.toAddresses} @> ${JSON.stringify([to])}::jsonb`)
      .orderBy(desc(fakeOutbox.createdAt));
    const mail = rows.find((r) => r.tags?.some((t) => t.name === "kind" && t.value === kind));
    const link = mail?.text?.match(/https?:\/\/\S+/g)?.find((u) => u.includes(path));
    if (link) return link.replace(/[\])>.,]+$/, "");
    await new Promise((r) => setTimeout(r, 20));
  }
  throw new Error(`no ${kind} e-mail with a ${path} link reached ${to}`);
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
