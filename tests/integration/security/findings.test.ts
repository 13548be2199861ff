// One test per finding of the outside attack (issue 9), each written to fail
// on the code as it was before the fix. They call the real route handlers
// on a fresh database and compare row counts around every refusal.
import { count, eq } from "drizzle-orm";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { accessLog, attachment, fakeOutbox, member, organization, shopPass, treadCheck, vehicle } from "@/db/schema";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { POST as fakeResend } from "@/app/api/fake/resend/emails/route";
import { GET as accessLogGet } from "@/app/api/passes/access-log/route";
import { POST as passCheck } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/route";
import { GET as shopsGet } from "@/app/api/shops/route";
import { PATCH as shopPatch } from "@/app/api/shops/[shopId]/route";
import { POST as oneClick } from "@/app/unsubscribe/[token]/one-click/route";
import { POST as vehiclesPost } from "@/app/api/vehicles/route";
import { PATCH as vehiclePatch } from "@/app/api/vehicles/[vehicleId]/route";
import { POST as upload } from "@/app/api/vehicles/[vehicleId]/attachments/route";
import { POST as cronPost } from "@/app/api/cron/reminders/route";
import { assertFakesConfigured, checkDevFakeRequest, devFakeKey } from "@/lib/dev-fakes";
import { sendEmail } from "@/lib/email/send";
import { resetEnvForTests } from "@/lib/env";
import { createElement } from "react";
import { PEER_HEADER } from "@/lib/peer";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { HOUR, insertPass, makeVehicle } from "../passes/helpers";
import { vehicleBody } from "../logbook/fixtures";

const rows = async (t: typeof vehicle | typeof treadCheck | typeof accessLog | typeof shopPass | typeof attachment | typeof fakeOutbox) =>
  (await db.select({ n: count() }).from(t))[0].n;

let ada: TestUser, tech: TestUser, owner: TestUser, ops: TestUser;
let shopId: string;
beforeAll(async () => {
  ada = await signUp({ name: "Ada Pellworth" });
  tech = await signUp({ name: "Tamsin Okoro" });
  owner = await signUp({ name: "Wendel Ashby" });
  ops = await signUp({ name: "Ops Person", admin: true });
  shopId = (await makeShop({ name: "Harrowgate Tread Depot", owner, technicians: [tech] })).id;
});

afterEach(() => {
  process.env.FOURPATCH_DEV_FAKES = "on";
});

describe("finding 1: the e-mail outbox and the fake e-mail API", () => {
  const mail = { from: "x@fourpatch.test", to: "victim@example.test", subject: "s", text: "t" };
  const fakeCall = (auth?: string) =>
    fakeResend(request("http://fourpatch.test/api/fake/resend/emails", { body: mail, headers: auth ? { authorization: auth } : {} }));

  it("the fake API refuses a request without this server's own key, even the key it used to accept", async () => {
    const before = await rows(fakeOutbox);
    expect((await fakeCall()).status).toBe(401);
    expect((await fakeCall("Bearer re_local_fake")).status).toBe(401);
    expect((await fakeCall("Bearer anything")).status).toBe(401);
    expect(await rows(fakeOutbox)).toBe(before);
    expect((await fakeCall(`Bearer ${devFakeKey("resend")}`)).status).toBe(200);
    expect(await rows(fakeOutbox)).toBe(before + 1);
  });

  it("without FOURPATCH_DEV_FAKES=on there is no fake: the API is a 404 and nothing readable is kept", async () => {
    delete process.env.FOURPATCH_DEV_FAKES;
    const before = await rows(fakeOutbox);
    expect((await fakeCall(`Bearer ${devFakeKey("resend")}`)).status).toBe(404);
    const sent = await sendEmail({ to: "victim@example.test", subject: "Reset", kind: "password-reset", react: createElement("p", null, "link") });
    expect(sent.ok).toBe(false);
    expect(await rows(fakeOutbox)).toBe(before);
    expect((await checkDevFakeRequest(request("/dev/outbox", { peer: "127.0.0.1" }))).ok).toBe(false);
  });

  it("the outbox answers only a loopback client or an operator; spoofed headers do not count", async () => {
    const from = (peer?: string, headers: Record<string, string> = {}, as?: TestUser) => checkDevFakeRequest(request("/dev/outbox", { peer, headers, as }));
    expect((await from("127.0.0.1")).ok).toBe(true);
    expect((await from("::1")).ok).toBe(true);
    expect((await from("::ffff:127.0.0.1")).ok).toBe(true);
    expect((await from("203.0.113.9")).ok).toBe(false);
    expect((await from("203.0.113.9", { "x-forwarded-for": "127.0.0.1", "x-real-ip": "127.0.0.1" })).ok).toBe(false);
    expect((await from(undefined, { [PEER_HEADER]: "127.0.0.1" })).ok).toBe(false);
    expect((await from(undefined, { [PEER_HEADER]: "wrongstamp 127.0.0.1" })).ok).toBe(false);
    expect((await from("203.0.113.9", {}, ada)).ok).toBe(false);
    expect((await from("203.0.113.9", {}, ops)).ok).toBe(true);
  });

  it("a production start without an e-mail key and without the fakes switch refuses to start", () => {
    const saved = { ...process.env };
    try {
      Object.assign(process.env, { NODE_ENV: "production" });
      delete process.env.FOURPATCH_DEV_FAKES;
      delete process.env.RESEND_API_KEY;
      expect(() => assertFakesConfigured([{ name: "e-mail", realKeyVar: "RESEND_API_KEY" }])).toThrow(/RESEND_API_KEY/);
      process.env.RESEND_API_KEY = "re_real";
      expect(() => assertFakesConfigured([{ name: "e-mail", realKeyVar: "RESEND_API_KEY" }])).not.toThrow();
      delete process.env.RESEND_API_KEY;
      process.env.FOURPATCH_DEV_FAKES = "on";
      expect(() => assertFakesConfigured([{ name: "e-mail", realKeyVar: "RESEND_API_KEY" }])).not.toThrow();
    } finally {
      for (const k of Object.keys(process.env)) if (!(k in saved)) delete process.env[k];
      Object.assign(process.env, saved);
    }
  });
});

describe("finding 5: cross-site request forgery", () => {
  const post = (headers: Record<string, string>, body: string) =>
    vehiclesPost(new Request("http://fourpatch.test/api/vehicles", { method: "POST", headers: { cookie: ada.cookie, ...headers }, body }), ctx({}));
  const json = JSON.stringify(vehicleBody);

  it("refuses text/plain, form and multipart bodies and foreign origins, and writes nothing", async () => {
    const before = await rows(vehicle);
    expect((await post({ "content-type": "text/plain" }, json)).status).toBe(415);
    expect((await post({ "content-type": "application/x-www-form-urlencoded" }, "nickname=x")).status).toBe(415);
    expect((await post({}, json)).status).toBe(415);
    expect((await post({ "content-type": "application/json", origin: "http://fourpatch.test:3001" }, json)).status).toBe(403);
    expect((await post({ "content-type": "application/json", origin: "http://evil.fourpatch.test" }, json)).status).toBe(403);
    expect((await post({ "content-type": "application/json", "sec-fetch-site": "same-site" }, json)).status).toBe(403);
    expect((await post({ "content-type": "application/json", "sec-fetch-site": "cross-site" }, json)).status).toBe(403);
    const refused = await post({ "content-type": "text/plain", origin: "http://fourpatch.test:3001" }, json);
    expect((await refused.json()).error.code).toBe("forbidden");
    expect(await rows(vehicle)).toBe(before);
    const ok = await post({ "content-type": "application/json", origin: "http://fourpatch.test", "sec-fetch-site": "same-origin" }, json);
    expect(ok.status).toBe(201);
    expect(await rows(vehicle)).toBe(before + 1);
  });

  it("the same on PATCH; the cron and one-click routes are the declared exceptions (secret or signature, no cookie)", async () => {
    const car = await makeVehicle(ada);
    const res = await vehiclePatch(
      new Request(`http://fourpatch.test/api/vehicles/${car.vehicle.id}`, { method: "PATCH", headers: { cookie: ada.cookie, "content-type": "text/plain", origin: "http://fourpatch.test:8080" }, body: JSON.stringify({ ...vehicleBody, nickname: "Owned" }) }),
      ctx({ vehicleId: car.vehicle.id }),
    );
    expect(res.status).toBe(403);
    expect((await db.select().from(vehicle).where(eq(vehicle.id, car.vehicle.id)))[0].nickname).not.toBe("Owned");
    // The cron route takes a bearer secret from a scheduler: no cookie, so no CSRF; a wrong secret is still a 401.
    process.env.CRON_SECRET = "test-cron-secret";
    resetEnvForTests();
    const cron = (auth: string) => cronPost(new Request("http://fourpatch.test/api/cron/reminders", { method: "POST", headers: { authorization: auth, origin: "http://elsewhere.test" } }));
    expect((await cron("Bearer wrong")).status).toBe(401);
    expect((await cron("Bearer test-cron-secret")).status).toBe(200);
    delete process.env.CRON_SECRET;
    resetEnvForTests();
    // Mail programs post the one-click form from anywhere; an unsigned token is a 404, never a 5xx.
    const click = await oneClick(new Request("http://fourpatch.test/unsubscribe/x/one-click", { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded" }, body: "List-Unsubscribe=One-Click" }), ctx({ token: "bad%token" }));
    expect(click.status).toBe(404);
  });
});

describe("finding 3: a shop owner cannot erase a driver's access log and pass history", () => {
  it("the auth library's organization and impersonation endpoints are not reachable", async () => {
    const call = (path: string, as: TestUser, body: unknown) => authPost(request(`http://fourpatch.test/api/auth${path}`, { as, body, headers: { origin: "http://fourpatch.test" } }));
    const orgs = await rows(organization as never);
    expect((await call("/organization/delete", owner, { organizationId: shopId })).status).toBe(404);
    expect((await call("/organization/update", owner, { organizationId: shopId, data: { name: "Renamed" } })).status).toBe(404);
    expect((await call("/organization/create", ada, { name: "Sneaky", slug: "sneaky" })).status).toBe(404);
    expect((await call("/organization/remove-member", owner, { organizationId: shopId, memberIdOrEmail: tech.email })).status).toBe(404);
    expect((await call("/admin/impersonate-user", ops, { userId: ada.id })).status).toBe(404);
    expect((await call("/update-user", ada, { name: "Changed" })).status).toBe(404);
    expect(await rows(organization as never)).toBe(orgs);
    expect((await db.select().from(organization).where(eq(organization.id, shopId)))[0].name).toBe("Harrowgate Tread Depot");
  });

  it("when a shop is deleted anyway, the driver keeps the passes and the access log, with the shop's name", async () => {
    const closingOwner = await signUp({ name: "Ilse Marrow" });
    const closing = (await makeShop({ name: "Brackwater Tyre Hut", owner: closingOwner, technicians: [] })).id;
    const car = await makeVehicle(ada, "Ada's van");
    const pass = await insertPass({ driver: ada, shopId: closing, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) });
    await db.insert(accessLog).values({ passId: pass.id, vehicleId: car.vehicle.id, shopId: closing, shopName: "Brackwater Tyre Hut", actorName: "Ilse Marrow", action: "read_logbook" });
    const [passesBefore, logBefore] = [await rows(shopPass), await rows(accessLog)];
    await db.delete(organization).where(eq(organization.id, closing));
    expect(await rows(shopPass)).toBe(passesBefore);
    expect(await rows(accessLog)).toBe(logBefore);
    const res = await accessLogGet(request(`/api/passes/access-log?vehicleId=${car.vehicle.id}`, { as: ada }), ctx({}));
    const { entries } = (await res.json()) as { entries: { shopName: string }[] };
    expect(entries.map((e) => e.shopName)).toContain("Brackwater Tyre Hut");
  });
});

describe("finding 4: writes do not land after a pass is withdrawn or a technician removed", () => {
  /** A request whose body arrives only when `release` is called, after the route has resolved the pass. */
  function slowRequest(url: string, body: unknown, as: TestUser) {
    let release!: () => void;
    let started!: () => void;
    const reading = new Promise<void>((r) => (started = r));
    const gate = new Promise<void>((r) => (release = r));
    const bytes = new TextEncoder().encode(JSON.stringify(body));
    const stream = new ReadableStream<Uint8Array>({
      async pull(c) {
        started();
        await gate;
        c.enqueue(bytes);
        c.close();
      },
    });
    const req = new Request(new URL(url, "http://fourpatch.test"), { method: "POST", headers: { cookie: as.cookie, "content-type": "application/json" }, body: stream, duplex: "half" } as RequestInit);
    return { req, reading, release };
  }

  for (const change of ["revoked", "staff removed"] as const) {
    it(`a slow body that outlives the pass (${change}) is refused and writes nothing`, async () => {
      const t = await signUp({ name: `Slow Tech ${change}` });
      await db.insert(member).values({ id: `m_${t.id}`, organizationId: shopId, userId: t.id, role: "technician" });
      const car = await makeVehicle(ada);
      const pass = await insertPass({ driver: ada, shopId, vehicleIds: [car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) });
      const url = `/api/passes/${pass.id}/vehicles/${car.vehicle.id}/checks`;
      const { req, reading, release } = slowRequest(url, { setId: car.set.id, readings: car.tires.map((x) => ({ tireId: x.id, centre: "5.5" })) }, t);
      const before = await rows(treadCheck);
      const pending = passCheck(req, ctx({ passId: pass.id, vehicleId: car.vehicle.id }));
      await reading;
      if (change === "revoked") await db.update(shopPass).set({ revokedAt: new Date() }).where(eq(shopPass.id, pass.id));
      else await db.delete(member).where(eq(member.id, `m_${t.id}`));
      release();
      const res = await pending;
      expect([403, 404]).toContain(res.status);
      expect(await rows(treadCheck)).toBe(before);
    });
  }
});

describe("finding 6: uploads are cut off at the limit while streaming, and count against a quota", () => {
  it("a chunked 12 MB body with no length is refused with 413 after reading at most the limit", async () => {
    const car = await makeVehicle(ada);
    let sent = 0;
    const chunk = new Uint8Array(256 * 1024);
    const stream = new ReadableStream<Uint8Array>({
      pull(c) {
        if (sent >= 12 * 1024 * 1024) return c.close();
        sent += chunk.byteLength;
        c.enqueue(chunk);
      },
    });
    const req = new Request(`http://fourpatch.test/api/vehicles/${car.vehicle.id}/attachments`, {
      method: "POST",
      headers: { cookie: ada.cookie, "content-type": "multipart/form-data; boundary=xyz" },
      body: stream,
      duplex: "half",
    } as RequestInit);
    const before = await rows(attachment);
    const res = await upload(req, ctx({ vehicleId: car.vehicle.id }));
    expect(res.status).toBe(413);
    expect(sent).toBeLessThanOrEqual(10 * 1024 * 1024 + 64 * 1024 + 2 * chunk.byteLength);
    expect(await rows(attachment)).toBe(before);
  });
});

describe("a body that breaks off mid-way (the client went away or its connection broke)", () => {
  /** Half a body, then the error Node's HTTP server gives a request stream whose client hung up. */
  function brokenRequest(url: string, contentType: string, half: Uint8Array) {
    const stream = new ReadableStream<Uint8Array>({
      start(c) {
        c.enqueue(half);
        c.error(Object.assign(new Error("aborted"), { code: "ECONNRESET" }));
      },
    });
    return new Request(new URL(url, "http://fourpatch.test"), { method: "POST", headers: { cookie: ada.cookie, "content-type": contentType }, body: stream, duplex: "half" } as RequestInit);
  }

  it("is a 4xx naming what was cut off, writes nothing and logs no error (JSON, upload)", async () => {
    const logged = vi.spyOn(console, "error").mockImplementation(() => {});
    try {
      const car = await makeVehicle(ada);
      const before = { vehicles: await rows(vehicle), files: await rows(attachment) };
      const json = JSON.stringify(vehicleBody);
      const res = await vehiclesPost(brokenRequest("/api/vehicles", "application/json", new TextEncoder().encode(json.slice(0, json.length / 2))), ctx({}));
      expect(res.status).toBe(422);
      expect(((await res.json()) as { error: { fields: Record<string, string[]> } }).error.fields._form).toEqual(["The body was cut off."]);
      const up = await upload(brokenRequest(`/api/vehicles/${car.vehicle.id}/attachments`, "multipart/form-data; boundary=xyz", new TextEncoder().encode("--xyz\r\nContent-Disposition: form-data; name=\"file\"")), ctx({ vehicleId: car.vehicle.id }));
      expect(up.status).toBe(422);
      expect(((await up.json()) as { error: { fields: Record<string, string[]> } }).error.fields.file).toEqual(["The body was cut off."]);
      expect({ vehicles: await rows(vehicle), files: await rows(attachment) }).toEqual(before);
      expect(logged).not.toHaveBeenCalled();
    } finally {
      logged.mockRestore();
    }
  });
});

describe("finding 8: hostile text is a 4xx naming the field, never a 5xx", () => {
  it("a NUL or control character in a body field, a query string or a path segment", async () => {
    const before = await rows(vehicle);
    const res = await vehiclesPost(request("/api/vehicles", { as: ada, body: { ...vehicleBody, nickname: "Van\u0000" } }), ctx({}));
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields).toHaveProperty("nickname");
    const nested = await vehiclesPost(request("/api/vehicles", { as: ada, body: { ...vehicleBody, extra: { deep: ["ok", "bad\u001b[31m"] } } }), ctx({}));
    expect((await nested.json()).error.fields).toHaveProperty(["extra.deep.1"]);
    const surrogate = await vehiclesPost(request("/api/vehicles", { as: ada, body: { ...vehicleBody, model: "Strand\ud800" } }), ctx({}));
    expect(surrogate.status).toBe(422);
    expect(await rows(vehicle)).toBe(before);
    const q = await shopsGet(request("/api/shops?q=tread%00", { as: ada }), ctx({}));
    expect(q.status).toBe(422);
    expect((await q.json()).error.fields).toHaveProperty("q");
    const long = await shopsGet(request(`/api/shops?q=${"x".repeat(5000)}`, { as: ada }), ctx({}));
    expect(long.status).toBe(422);
    const path = await vehiclePatch(request("/api/vehicles/x", { as: ada, method: "PATCH", body: vehicleBody }), ctx({ vehicleId: "abc\u0000" }));
    expect(path.status).toBe(422);
    expect((await path.json()).error.fields).toHaveProperty("vehicleId");
  });

  it("hex and exponent strings are not numbers", async () => {
    const res = await vehiclesPost(request("/api/vehicles", { as: ada, body: { ...vehicleBody, year: "0x7E3" } }), ctx({}));
    expect(res.status).toBe(422);
  });

  it("a display name with a line break is refused at sign-up (it reaches e-mail subjects)", async () => {
    const res = await authPost(request("http://fourpatch.test/api/auth/sign-up/email", { body: { name: "Eve\r\nBcc: all@example.test", email: "eve@example.test", password: "long-enough-password" } }));
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields).toHaveProperty("name");
  });

  it("a shop name with a line break is refused too (it reaches e-mail subjects)", async () => {
    const res = await shopPatch(request(`/api/shops/${shopId}`, { as: owner, method: "PATCH", body: { name: "Harrowgate\nBcc: x", town: "Testford" } }), ctx({ shopId }));
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields).toHaveProperty("name");
  });

  it("the shop profile route checks the owner role before it judges the body", async () => {
    const res = await shopPatch(request(`/api/shops/${shopId}`, { as: tech, method: "PATCH", body: { name: "" } }), ctx({ shopId }));
    expect(res.status).toBe(403);
  });
});

describe("finding 10: the data-folder lock does not travel with a copied app folder", () => {
  it("lives outside the app and data folders, named after the folder's real path", async () => {
    const { lockPathFor } = await import("@/db/lock");
    const fs = await import("node:fs");
    const os = await import("node:os");
    const path = await import("node:path");
    const app = fs.mkdtempSync(path.join(os.tmpdir(), "fourpatch-app-"));
    const copy = `${app}-copy`;
    fs.mkdirSync(path.join(app, "data"));
    fs.mkdirSync(path.join(copy, "data"), { recursive: true });
    const lock = lockPathFor(path.join(app, "data"));
    expect(lock.startsWith(app + path.sep)).toBe(false);
    expect(lockPathFor(path.join(copy, "data"))).not.toBe(lock);
    fs.symlinkSync(path.join(app, "data"), path.join(copy, "link"));
    expect(lockPathFor(path.join(copy, "link"))).toBe(lock);
    fs.rmSync(app, { recursive: true, force: true });
    fs.rmSync(copy, { recursive: true, force: true });
  });
});
