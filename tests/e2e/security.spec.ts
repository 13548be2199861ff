import { expect, test } from "@playwright/test";

// Issue 9 against the production build: headers on pages and API answers,
// the CSP nonce on Next's own scripts (the page still works), a server action
// from another origin, and the routes that must not answer outsiders.
test.describe("security of the running server", () => {
  test("pages carry a nonce CSP and anti-framing headers, and still hydrate", async ({ page }) => {
    const res = await page.goto("/sign-in");
    const h = res!.headers();
    const csp = h["content-security-policy"];
    expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-inline'/);
    expect(h["x-frame-options"]).toBe("DENY");
    expect(h["x-content-type-options"]).toBe("nosniff");
    expect(h["referrer-policy"]).toBe("strict-origin-when-cross-origin");
    const nonce = csp.match(/'nonce-([^']+)'/)![1];
    // Next put this response's nonce on its scripts (browsers hide the attribute from the DOM, so read the HTML).
    expect(await res!.text()).toContain(`nonce="${nonce}"`);
    // Hydrated: the client-side form validation answers.
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByText(/e-mail address/i).first()).toBeVisible();
  });

  test("API answers carry the headers; logbook JSON is not cached", async ({ request }) => {
    const res = await request.get("/api/vehicles");
    expect(res.status()).toBe(401);
    expect(res.headers()["x-content-type-options"]).toBe("nosniff");
    expect(res.headers()["cache-control"]).toContain("no-store");
    // API answers skip proxy.ts and get a CSP that allows nothing from next.config.mjs.
    for (const path of ["/api/vehicles", "/api/auth/ok", "/api/feed/not-a-token.ics"]) {
      const h = (await request.get(path)).headers();
      expect(h["content-security-policy"], path).toContain("default-src 'none'");
      expect(h["content-security-policy"], path).toContain("frame-ancestors 'none'");
      expect(h["x-frame-options"], path).toBe("DENY");
      expect(h["x-content-type-options"], path).toBe("nosniff");
    }
  });

  test("a server action posted from another origin is a 403, not a 500", async ({ request }) => {
    const res = await request.post("/reminders", { headers: { "next-action": "0123456789abcdef", origin: "http://evil.test" }, data: "[]" });
    expect(res.status()).toBe(403);
  });

  test("a cross-site JSON write is refused; a text/plain one too", async ({ request }) => {
    const foreign = await request.post("/api/vehicles", { headers: { origin: "http://localhost:9999", "content-type": "application/json" }, data: "{}" });
    expect(foreign.status()).toBe(403);
    const plain = await request.post("/api/vehicles", { headers: { "content-type": "text/plain" }, data: "{}" });
    expect(plain.status()).toBe(415);
  });

  test("the fake e-mail API wants the server's own key; the auth library's organization API is closed", async ({ request }) => {
    const fake = await request.post("/api/fake/resend/emails", { headers: { authorization: "Bearer re_local_fake", "content-type": "application/json" }, data: { from: "a@b.test", to: "c@d.test", subject: "x", text: "y" } });
    expect(fake.status()).toBe(401);
    const org = await request.post("/api/auth/organization/delete", { data: { organizationId: "x" } });
    expect(org.status()).toBe(404);
    const imp = await request.post("/api/auth/admin/impersonate-user", { data: { userId: "x" } });
    expect(imp.status()).toBe(404);
  });

  test("the outbox answers this machine (loopback) but ignores a spoofed forwarding header", async ({ request }) => {
    expect((await request.get("/dev/outbox")).status()).toBe(200);
    expect((await request.get("/dev/outbox", { headers: { "x-forwarded-for": "203.0.113.5" } })).status()).toBe(200);
  });
});
