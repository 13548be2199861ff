// Finding 2: limits key on the real peer address (never a header the client
// chooses), accounts back off after wrong passwords, and the other entry
// points (password reset, sign-up, invitation acceptance, the feed, uploads)
// have limits of their own.
import { count } from "drizzle-orm";
import { afterAll, describe, expect, it, onTestFinished } from "vitest";
import { db } from "@/db";
import { fakeOutbox } from "@/db/schema";
import { setAuthTimingFloorsForTests } from "@/lib/auth/endpoints";
import { resetRateLimitsForTests } from "@/lib/rate-limit";
import { ctx, request, signUp } from "../../support/users";

process.env.FOURPATCH_AUTH_RATE_LIMIT = "on";
(globalThis as { __fourpatchAuth?: unknown }).__fourpatchAuth = undefined;
afterAll(() => {
  delete process.env.FOURPATCH_TRUSTED_PROXY;
});

const { POST: authPost } = await import("@/app/api/auth/[...all]/route");
const signIn = (opts: { peer?: string; xff?: string; email: string; password?: string }) =>
  authPost(
    request("http://fourpatch.test/api/auth/sign-in/email", {
      peer: opts.peer,
      headers: { origin: "http://fourpatch.test", ...(opts.xff ? { "x-forwarded-for": opts.xff } : {}) },
      body: { email: opts.email, password: opts.password ?? "wrong-password-1" },
    }),
  );

describe("sign-in limits", () => {
  it("rotating X-Forwarded-For does not escape the per-address limit, and another address is unaffected", async () => {
    resetRateLimitsForTests();
    const statuses: number[] = [];
    // A different account each time, so only the address limit (10 a minute) is in play.
    for (let i = 0; i < 11; i++) statuses.push((await signIn({ peer: "203.0.113.7", xff: `198.51.100.${i}`, email: `nobody${i}@example.test` })).status);
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses[10]).toBe(429);
    expect((await signIn({ peer: "203.0.113.8", email: "someone@example.test" })).status).toBe(401);
  });

  it("behind a configured trusted proxy, the address the proxy saw is the key", async () => {
    resetRateLimitsForTests();
    process.env.FOURPATCH_TRUSTED_PROXY = "10.0.0.5";
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) statuses.push((await signIn({ peer: "10.0.0.5", xff: `198.51.100.${i}`, email: `proxied${i}@example.test` })).status);
    expect(statuses.every((s) => s === 401)).toBe(true);
    for (let i = 0; i < 10; i++) await signIn({ peer: "10.0.0.5", xff: "spoof, 198.51.100.99", email: `same${i}@example.test` });
    // The client can prepend anything; the right-most entry (added by the proxy) decides.
    expect((await signIn({ peer: "10.0.0.5", xff: "1.2.3.4, 198.51.100.99", email: "same-x@example.test" })).status).toBe(429);
    delete process.env.FOURPATCH_TRUSTED_PROXY;
  });

  it("one account backs off after five wrong passwords from any addresses, even for the right password", async () => {
    resetRateLimitsForTests();
    const u = await signUp({ name: "Target Driver" });
    for (let i = 0; i < 5; i++) expect((await signIn({ peer: `192.0.2.${i + 1}`, email: u.email })).status).toBe(401);
    const locked = await signIn({ peer: "192.0.2.50", email: u.email, password: "correct-horse-battery" });
    expect(locked.status).toBe(429);
    expect(Number(locked.headers.get("retry-after"))).toBeGreaterThan(0);
    // Other accounts from the same addresses are not locked.
    expect((await signIn({ peer: "192.0.2.1", email: "other@example.test" })).status).toBe(401);
  });
});

describe("other entry points", () => {
  it("at most three reset e-mails an hour to one address; the answer is the same", async () => {
    resetRateLimitsForTests();
    const u = await signUp({ name: "Reset Target" });
    const mails = async () => (await db.select({ n: count() }).from(fakeOutbox))[0].n;
    const before = await mails();
    const answers: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await authPost(request("http://fourpatch.test/api/auth/request-password-reset", { peer: `198.51.100.${i}`, body: { email: u.email, redirectTo: "/reset-password" } }));
      answers.push(res.status);
    }
    expect(answers.every((s) => s === 200)).toBe(true);
    await new Promise((r) => setTimeout(r, 500));
    expect((await mails()) - before).toBe(3);
  });

  it("sign-up is limited per address", async () => {
    resetRateLimitsForTests();
    // Each accepted sign-up waits for the anti-enumeration floor; only the count matters here.
    setAuthTimingFloorsForTests({ signUpMs: 0 });
    onTestFinished(() => setAuthTimingFloorsForTests({ signUpMs: 400 }));
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) {
      const res = await authPost(request("http://fourpatch.test/api/auth/sign-up/email", { peer: "203.0.113.70", body: { name: `Bulk ${i}`, email: `bulk${i}-${Date.now()}@example.test`, password: "long-enough-pass" } }));
      statuses.push(res.status);
    }
    expect(statuses[10]).toBe(429);
  });

  it("the feed, invitation acceptance and uploads answer 429 past their limits", async () => {
    resetRateLimitsForTests();
    const { GET: feed } = await import("@/app/api/feed/[token]/route");
    let last = 0;
    for (let i = 0; i < 121; i++) last = (await feed(request(`/api/feed/guess${i}`, { peer: "203.0.113.80" }), ctx({ token: `guess${i}` }))).status;
    expect(last).toBe(429);
    expect((await feed(request("/api/feed/guess", { peer: "203.0.113.81" }), ctx({ token: "guess" }))).status).toBe(404);

    const u = await signUp({ name: "Joiner" });
    const { POST: join } = await import("@/app/api/shops/join/[invitationId]/route");
    const joins: number[] = [];
    for (let i = 0; i < 11; i++) joins.push((await join(request(`/api/shops/join/inv${i}`, { as: u, method: "POST" }), ctx({ invitationId: `inv${i}` }))).status);
    expect(joins[10]).toBe(429);

    const { POST: upload } = await import("@/app/api/vehicles/[vehicleId]/attachments/route");
    const ups: number[] = [];
    const id = "00000000-0000-4000-8000-000000000000";
    for (let i = 0; i < 31; i++) ups.push((await upload(request(`/api/vehicles/${id}/attachments`, { as: u, method: "POST" }), ctx({ vehicleId: id }))).status);
    expect(ups[0]).toBe(404);
    expect(ups[30]).toBe(429);
  });
});
