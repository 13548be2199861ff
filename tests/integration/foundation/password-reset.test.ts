import { describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { fakeOutbox } from "@/db/schema";
import { auth } from "@/lib/auth/server";
import { signUp } from "../../support/users";

describe("password reset by e-mail", () => {
  it("mails a one-time link whose token sets a new password, and the token cannot be used twice", async () => {
    const u = await signUp({ name: "Mirela Quint" });
    await auth.api.requestPasswordReset({ body: { email: u.email, redirectTo: "/reset-password" } });
    // The reset e-mail goes out after the answer (so the answer's timing says nothing about the address).
    const mail = await vi.waitFor(async () => {
      const mails = await db.select().from(fakeOutbox);
      const m = mails.find((x) => x.subject.includes("new Fourpatch password") && x.toAddresses.includes(u.email));
      if (!m) throw new Error("not yet");
      return m;
    });
    const link = mail!.html!.match(/href="([^"]*reset-password[^"]*)"/)?.[1];
    expect(link).toBeDefined();
    const token = new URL(link!.replaceAll("&amp;", "&")).pathname.split("/").pop()!;
    expect(token.length).toBeGreaterThan(10);

    await auth.api.resetPassword({ body: { newPassword: "a-brand-new-password", token } });
    const signedIn = await auth.api.signInEmail({ body: { email: u.email, password: "a-brand-new-password" } });
    expect(signedIn.user.id).toBe(u.id);
    await expect(auth.api.signInEmail({ body: { email: u.email, password: "correct-horse-battery" } })).rejects.toThrow();
    await expect(auth.api.resetPassword({ body: { newPassword: "yet-another-password", token } })).rejects.toThrow();
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    const before = (await db.select().from(fakeOutbox)).length;
    const res = await auth.api.requestPasswordReset({ body: { email: "nobody@example.test", redirectTo: "/reset-password" } });
    expect(res.status).toBe(true);
    expect((await db.select().from(fakeOutbox)).length).toBe(before);
  });
});
