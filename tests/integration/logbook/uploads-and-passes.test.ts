// Uploads (type from content, size, empty files, served only through the
// vehicle's access check) and writes under a shop pass (attributed to the
// shop, refused for a view-only or ended pass).
import fs from "node:fs";
import path from "node:path";
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { accessLog, attachment, shopPass, shopPassVehicle, tire, treadCheck } from "@/db/schema";
import { POST as upload } from "@/app/api/vehicles/[vehicleId]/attachments/route";
import { DELETE as removeFile, GET as download } from "@/app/api/attachments/[attachmentId]/route";
import { DELETE as deleteVehicle } from "@/app/api/vehicles/[vehicleId]/route";
import { addTreadCheck } from "@/db/queries/checks";
import { getVehicleLogbook } from "@/db/queries/logbook";
import type { LogbookAccess } from "@/lib/auth/logbook-access";
import { uploadsDir } from "@/lib/uploads";
import { todayIso, treadCheckSchema } from "@/lib/validation/logbook";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { makeSet, makeVehicle } from "./fixtures";

// A real 1×1 PNG.
const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==", "base64");
const PDF = Buffer.from("%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n");

function form(bytes: Uint8Array, name: string, type: string, extra: Record<string, string> = {}) {
  const f = new FormData();
  f.set("file", new File([new Uint8Array(bytes)], name, { type }));
  for (const [k, v] of Object.entries(extra)) f.set(k, v);
  return f;
}
const send = (vehicleId: string, body: FormData, as?: TestUser) => upload(request(`/api/vehicles/${vehicleId}/attachments`, { as, body }), ctx({ vehicleId }));
const files = async () => (await db.select({ n: count() }).from(attachment))[0].n;
const stored = () => (fs.existsSync(uploadsDir()) ? fs.readdirSync(uploadsDir()).length : 0);

describe("uploads", () => {
  it("keeps a PNG receipt under a random name and serves it back only to the owner", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId);
    const res = await send(vehicleId, form(PNG, "receipt.png", "image/png", { kind: "receipt", setId }), ada);
    expect(res.status).toBe(201);
    const { attachment: a } = (await res.json()) as { attachment: { id: string; mimeType: string } };
    expect(a.mimeType).toBe("image/png");
    const [row] = await db.select().from(attachment).where(eq(attachment.id, a.id));
    expect(row.storedName).not.toContain("receipt");
    expect(fs.readFileSync(path.join(uploadsDir(), row.storedName)).equals(PNG)).toBe(true);

    const got = await download(request(`/api/attachments/${a.id}`, { as: ada }), ctx({ attachmentId: a.id }));
    expect(got.status).toBe(200);
    expect(got.headers.get("content-type")).toBe("image/png");
    expect(Buffer.from(await got.arrayBuffer()).equals(PNG)).toBe(true);
    expect((await download(request(`/api/attachments/${a.id}`, { as: stranger }), ctx({ attachmentId: a.id }))).status).toBe(404);
    expect((await download(request(`/api/attachments/${a.id}`), ctx({ attachmentId: a.id }))).status).toBe(401);

    expect((await removeFile(request(`/api/attachments/${a.id}`, { method: "DELETE", as: stranger }), ctx({ attachmentId: a.id }))).status).toBe(404);
    expect((await removeFile(request(`/api/attachments/${a.id}`, { method: "DELETE", as: ada }), ctx({ attachmentId: a.id }))).status).toBe(200);
    expect(fs.existsSync(path.join(uploadsDir(), row.storedName))).toBe(false);
  });

  it("takes the type from the content: a PDF named .jpg is a PDF; text named .pdf is refused", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const pdf = await send(vehicleId, form(PDF, "photo.jpg", "image/jpeg"), ada);
    expect(pdf.status).toBe(201);
    expect(((await pdf.json()) as { attachment: { mimeType: string } }).attachment.mimeType).toBe("application/pdf");

    const [before, onDisk] = [await files(), stored()];
    const spoofed = await send(vehicleId, form(Buffer.from("<html><script>alert(1)</script></html>"), "invoice.pdf", "application/pdf"), ada);
    expect(spoofed.status).toBe(415);
    expect((await spoofed.json()).error.fields.file).toBeDefined();
    // A GIF is an image, but not one of the four kinds kept.
    const gif = await send(vehicleId, form(Buffer.from("GIF89a\x01\x00\x01\x00\x00\x00\x00;", "binary"), "a.gif", "image/gif"), ada);
    expect(gif.status).toBe(415);
    expect([await files(), stored()]).toEqual([before, onDisk]);
  });

  it("refuses an empty file (422) and one over 10 MB (413), writing nothing", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const [before, onDisk] = [await files(), stored()];
    const empty = await send(vehicleId, form(new Uint8Array(0), "empty.png", "image/png"), ada);
    expect(empty.status).toBe(422);
    expect((await empty.json()).error.message).toMatch(/empty/);
    const big = new Uint8Array(10 * 1024 * 1024 + 1);
    big.set(PNG);
    const large = await send(vehicleId, form(big, "big.png", "image/png"), ada);
    expect(large.status).toBe(413);
    const missing = await send(vehicleId, new FormData(), ada);
    expect(missing.status).toBe(422);
    expect([await files(), stored()]).toEqual([before, onDisk]);
  });

  it("another driver's vehicle is 404 and signed out 401; deleting the vehicle deletes its files", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const vehicleId = await makeVehicle(ada);
    expect((await send(vehicleId, form(PNG, "r.png", "image/png"), stranger)).status).toBe(404);
    expect((await send(vehicleId, form(PNG, "r.png", "image/png"))).status).toBe(401);
    const ok = await send(vehicleId, form(PNG, "r.png", "image/png"), ada);
    const { attachment: a } = (await ok.json()) as { attachment: { id: string } };
    const [row] = await db.select().from(attachment).where(eq(attachment.id, a.id));
    await deleteVehicle(request(`/api/vehicles/${vehicleId}`, { method: "DELETE", as: ada }), ctx({ vehicleId }));
    expect(fs.existsSync(path.join(uploadsDir(), row.storedName))).toBe(false);
  });
});

describe("writes under a shop pass", () => {
  async function passFor(scope: "view" | "view_add", hours = 2) {
    const ada = await signUp();
    const owner = await signUp();
    const jo = await signUp({ name: "Jo Tester" });
    const shop = await makeShop({ name: "Testford Tyre Bay", owner, technicians: [jo] });
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId);
    const endsAt = new Date(Date.now() + hours * 3600_000);
    const [pass] = await db.insert(shopPass).values({ driverId: ada.id, shopId: shop.id, scope, startsAt: new Date(Date.now() - 3600_000), endsAt }).returning();
    await db.insert(shopPassVehicle).values({ passId: pass.id, vehicleId });
    const access: LogbookAccess = { kind: "pass", userId: jo.id, userName: jo.name, passId: pass.id, shopId: shop.id, shopName: "Testford Tyre Bay", scope, vehicleIds: [vehicleId], endsAt };
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    const input = treadCheckSchema.parse({ setId, odometer: "45500", readings: [{ tireId: tires[0].id, centre: "6" }] });
    return { access, vehicleId, input, jo, shop, pass };
  }

  it("a check under a view-and-add pass is attributed to the shop and logged for the driver", async () => {
    const { access, vehicleId, input, jo, shop, pass } = await passFor("view_add");
    const { id } = await addTreadCheck({ access, vehicleId, input });
    const [c] = await db.select().from(treadCheck).where(eq(treadCheck.id, id));
    expect(c).toMatchObject({ measuredBy: "shop", shopId: shop.id, authorUserId: jo.id, passId: pass.id });
    const log = await db.select().from(accessLog).where(eq(accessLog.passId, pass.id));
    expect(log.map((l) => l.action)).toContain("add_check");
    const book = await getVehicleLogbook({ access, vehicleId, today: todayIso() });
    expect(book.checks[0]).toMatchObject({ measuredBy: "shop", shopName: "Testford Tyre Bay" });
    // The access log is the driver's to see, not the shop's.
    expect(book.accessLog).toEqual([]);
  });

  it("a view-only pass cannot write, and an ended pass cannot read", async () => {
    const view = await passFor("view");
    await expect(addTreadCheck({ access: view.access, vehicleId: view.vehicleId, input: view.input })).rejects.toMatchObject({ code: "forbidden" });
    expect(await db.select().from(treadCheck).where(eq(treadCheck.vehicleId, view.vehicleId))).toHaveLength(0);
    const ended = await passFor("view_add", -1);
    await expect(getVehicleLogbook({ access: ended.access, vehicleId: ended.vehicleId, today: todayIso() })).rejects.toMatchObject({ code: "pass_ended" });
  });
});
