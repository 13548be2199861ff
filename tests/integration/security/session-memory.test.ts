// A confirmed session kept in memory (lib/auth/session.ts) under its exact
// cookie and session_revision (migration 0014). What must hold: the same
// cookie is answered from memory; a sign-out, a revoke, a ban or any change
// of the user is seen at the next request; a cookie with another signature
// is never taken for a kept one; a session near its refresh or its end goes
// to the library.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { session as sessionTable, user } from "@/db/schema";
import { keptSessionStats, sessionFromRequest } from "@/lib/auth/session";
import { request, signUp } from "../../support/users";

const read = (cookie: string) => sessionFromRequest(new Request("http://fourpatch.test/api/vehicles", { headers: { cookie } }));

describe("a session kept in memory", () => {
  it("answers the same cookie again without the library", async () => {
    const u = await signUp({ name: "Tamsin Greer" });
    expect((await read(u.cookie))?.user.id).toBe(u.id);
    const s0 = keptSessionStats();
    expect((await read(u.cookie))?.user.id).toBe(u.id);
    expect(keptSessionStats().hits).toBe(s0.hits + 1);
    expect(keptSessionStats().misses).toBe(s0.misses);
  });

  it("ends at the next request after a sign-out or a revoke", async () => {
    const u = await signUp({ name: "Corin Ashby" });
    expect(await read(u.cookie)).not.toBeNull();
    await db.delete(sessionTable).where(eq(sessionTable.userId, u.id));
    expect(await read(u.cookie)).toBeNull();
  });

  it("sees a ban and a new name at the next request", async () => {
    const u = await signUp({ name: "Ilse Marrow" });
    expect((await read(u.cookie))?.user.banned).toBeFalsy();
    await db.update(user).set({ banned: true }).where(eq(user.id, u.id));
    expect((await read(u.cookie))?.user.banned).toBe(true);
    await db.update(user).set({ banned: false, name: "Ilse Marrow-Kade" }).where(eq(user.id, u.id));
    expect((await read(u.cookie))?.user.name).toBe("Ilse Marrow-Kade");
  });

  it("never takes a cookie with another signature for the kept one", async () => {
    const u = await signUp({ name: "Pell Varga" });
    expect(await read(u.cookie)).not.toBeNull();
    const forged = u.cookie.replace(/(better-auth\.session_token=[^.;]+\.)([^;]+)/, (_m, head: string, sig: string) => head + (sig.startsWith("A") ? "B" : "A") + sig.slice(1));
    expect(forged).not.toBe(u.cookie);
    expect(await read(forged)).toBeNull();
    // And a route handler given it answers as to no one.
    expect(await sessionFromRequest(request("/", { headers: { cookie: forged } }))).toBeNull();
  });

  it("goes to the library when the session is near its refresh", async () => {
    const u = await signUp({ name: "Odo Brannigan" });
    await read(u.cookie);
    // Six days and a bit of a seven-day session used up: the library refreshes it (and its row changes).
    await db.update(sessionTable).set({ expiresAt: new Date(Date.now() + 12 * 3600_000) }).where(eq(sessionTable.userId, u.id));
    const s0 = keptSessionStats();
    const s = await read(u.cookie);
    expect(keptSessionStats().misses).toBe(s0.misses + 1);
    expect(new Date(s!.session.expiresAt).getTime()).toBeGreaterThan(Date.now() + 6 * 24 * 3600_000);
  });
});
