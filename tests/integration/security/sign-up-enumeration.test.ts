// Finding 10 (account enumeration): sign-up answers an address that has an
// account exactly like a new one — same status, same body shape, no session,
// no sooner — and the owner gets an e-mail about the attempt instead. New
// accounts get no session until the link in the verification e-mail is
// followed; an unconfirmed account's sign-in says so and can ask for the link
// again. Password reset takes the same time whether or not the address exists.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { fakeOutbox, user } from "@/db/schema";
import { resetRateLimitsForTests } from "@/lib/rate-limit";
import { linkFromOutbox, request, signUp } from "../../support/users";

const { GET: authGet, POST: authPost } = await import("@/app/api/auth/[...all]/route");
const ORIGIN = { origin: "http://fourpatch.test" };
const post = (path: string, body: unknown, peer = "198.51.100.20") =>
  authPost(request(`http://fourpatch.test/api/auth${path}`, { peer, headers: ORIGIN, body }));

async function timed<T>(fn: () => Promise<T>): Promise<[T, number]> {
  const t = performance.now();
  const r = await fn();
  return [r, performance.now() - t];
}

const kindsTo = async (to: string) =>
  (await db.select({ to: fakeOutbox.toAddresses, tags: fakeOutbox.tags }).from(fakeOutbox))
    .filter((m) => m.to.includes(to))
    .map((m) => m.tags?.find((t) => t.name === "kind")?.value);

describe("sign-up does not tell whether an address has an account", () => {
  it("answers an existing address like a new one, and mails its owner instead", async () => {
    resetRateLimitsForTests();
    const owner = await signUp({ name: "Hester Quayle" });
    const fresh = `fresh-${Date.now()}@example.test`;
    const [a, ta] = await timed(() => post("/sign-up/email", { name: "Someone Else", email: owner.email, password: "a-long-enough-password", callbackURL: "/sign-in?verified=1&next=%2Fvehicles" }));
    const [b, tb] = await timed(() => post("/sign-up/email", { name: "Someone Else", email: fresh, password: "a-long-enough-password", callbackURL: "/sign-in?verified=1&next=%2Fvehicles" }));
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(a.headers.get("set-cookie")).toBeNull();
    expect(b.headers.get("set-cookie")).toBeNull();
    // Byte for byte the same body (the library's own answers differ: a made-up user with other defaults).
    expect(await a.text()).toBe(await b.text());
    // Both answers wait for the same floor (the mails are sent without waiting).
    expect(ta).toBeGreaterThanOrEqual(390);
    expect(tb).toBeGreaterThanOrEqual(390);

    expect(await db.$count(user, eq(user.email, owner.email))).toBe(1);
    const [existing] = await db.select().from(user).where(eq(user.email, owner.email));
    expect(existing.name).toBe("Hester Quayle");
    // The owner hears of the attempt, with a way in; the new address gets its confirmation link.
    expect(new URL(await linkFromOutbox(owner.email, "sign-up-attempt", "/sign-in")).pathname).toBe("/sign-in");
    expect(new URL(await linkFromOutbox(owner.email, "sign-up-attempt", "/forgot-password")).pathname).toBe("/forgot-password");
    expect(await linkFromOutbox(fresh, "verify-email", "/api/auth/verify-email")).toContain("callbackURL=");
    expect(await kindsTo(fresh)).toEqual(["verify-email"]);
  });

  it("an unconfirmed account cannot sign in, says why only to the right password, and can ask for the link again", async () => {
    resetRateLimitsForTests();
    const email = `unconfirmed-${Date.now()}@example.test`;
    expect((await post("/sign-up/email", { name: "Linnea Crail", email, password: "a-long-enough-password" })).status).toBe(200);
    const wrong = await post("/sign-in/email", { email, password: "not-the-password-1" });
    expect(wrong.status).toBe(401);
    const right = await post("/sign-in/email", { email, password: "a-long-enough-password" });
    expect(right.status).toBe(403);
    expect((await right.json()).code).toBe("EMAIL_NOT_VERIFIED");
    expect(right.headers.get("set-cookie") ?? "").not.toContain("session_token");

    const before = (await kindsTo(email)).length;
    const [again, t1] = await timed(() => post("/send-verification-email", { email, callbackURL: "/sign-in?verified=1&next=%2Fvehicles" }));
    const [unknown, t2] = await timed(() => post("/send-verification-email", { email: `nobody-${Date.now()}@example.test`, callbackURL: "/sign-in" }));
    expect([again.status, unknown.status]).toEqual([200, 200]);
    expect(await again.json()).toEqual(await unknown.json());
    expect(Math.min(t1, t2)).toBeGreaterThanOrEqual(490);
    await expect.poll(async () => (await kindsTo(email)).length).toBe(before + 1);

    // The link signs in and goes on to the callback; used twice, it says so.
    const link = await linkFromOutbox(email, "verify-email", "/api/auth/verify-email");
    const verified = await authGet(request(link.replace(/^https?:\/\/[^/]+/, "http://fourpatch.test"), { peer: "198.51.100.20" }));
    expect(verified.status).toBe(302);
    expect(verified.headers.get("location")).toBe("/sign-in?verified=1&next=%2Fvehicles");
    expect(verified.headers.get("set-cookie")).toContain("session_token");
    const [row] = await db.select().from(user).where(eq(user.email, email));
    expect(row.emailVerified).toBe(true);
    expect((await post("/sign-in/email", { email, password: "a-long-enough-password" })).status).toBe(200);
    // Followed again, the link only redirects: it is no lasting way in.
    const second = await authGet(request(link.replace(/^https?:\/\/[^/]+/, "http://fourpatch.test"), { peer: "198.51.100.20" }));
    expect(second.status).toBe(302);
    expect(second.headers.get("set-cookie") ?? "").not.toContain("session_token");

    const tampered = await authGet(request(`http://fourpatch.test/api/auth/verify-email?token=not.a.token&callbackURL=${encodeURIComponent("/sign-in?verified=1")}`));
    expect(tampered.status).toBe(302);
    expect(tampered.headers.get("location")).toMatch(/^\/sign-in\?verified=1&error=/);
  });

  it("a reset link confirms the address too", async () => {
    resetRateLimitsForTests();
    const email = `reset-unconfirmed-${Date.now()}@example.test`;
    await post("/sign-up/email", { name: "Bram Oakshott", email, password: "a-long-enough-password" });
    await post("/request-password-reset", { email, redirectTo: "/reset-password" });
    const link = await linkFromOutbox(email, "password-reset", "/reset-password");
    const token = new URL(link).pathname.split("/").pop()!;
    expect((await post("/reset-password", { token, newPassword: "another-long-password" })).status).toBe(200);
    expect((await post("/sign-in/email", { email, password: "another-long-password" })).status).toBe(200);
  });

  it("password reset takes no less time for an unknown address than for a known one", async () => {
    resetRateLimitsForTests();
    const known = await signUp({ name: "Cosima Venn" });
    const [, tk] = await timed(() => post("/request-password-reset", { email: known.email, redirectTo: "/reset-password" }, "198.51.100.31"));
    const [, tu] = await timed(() => post("/request-password-reset", { email: `nobody-${Date.now()}@example.test`, redirectTo: "/reset-password" }, "198.51.100.32"));
    expect(Math.min(tk, tu)).toBeGreaterThanOrEqual(390);
  });
});
