// Sign-in attempts are rate limited by better-auth in every deployment; the
// other integration files switch the limit off to sign in freely.
import { describe, expect, it } from "vitest";

process.env.FOURPATCH_AUTH_RATE_LIMIT = "on";
(globalThis as { __fourpatchAuth?: unknown }).__fourpatchAuth = undefined;

describe("auth rate limiting", () => {
  it("answers 429 after ten sign-in attempts a minute from one address, and other addresses are unaffected", async () => {
    const { auth } = await import("@/lib/auth/server");
    const attempt = (ip: string) =>
      auth.handler(
        new Request("http://fourpatch.test/api/auth/sign-in/email", {
          method: "POST",
          headers: { "content-type": "application/json", "x-forwarded-for": ip, origin: "http://fourpatch.test" },
          body: JSON.stringify({ email: "nobody@example.test", password: "wrong-password-1" }),
        }),
      );
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) statuses.push((await attempt("203.0.113.7")).status);
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses[10]).toBe(429);
    expect((await attempt("203.0.113.8")).status).toBe(401);
  });
});
