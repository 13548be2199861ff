// The printable tire history as a PDF: made with pdf-lib, read back with an
// independent PDF reader (Mozilla's pdf.js), and every DOT code of the
// vehicle is in its text. Owners, co-keepers and a shop under a live pass
// may print; others may not.
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { vehicleKeeper } from "@/db/schema";
import { GET as ownerPdf } from "@/app/api/vehicles/[vehicleId]/history-pdf/route";
import { GET as passPdf } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/history-pdf/route";
import { ctx, makeShop, request, signUp, type TestUser } from "../../support/users";
import { HOUR, insertPass, makeVehicle } from "../passes/helpers";
import { tire } from "@/db/schema";
import { eq } from "drizzle-orm";

async function pdfText(bytes: Uint8Array): Promise<{ text: string; pages: number; size: [number, number] }> {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: bytes, useSystemFonts: false, isEvalSupported: false, verbosity: 0 }).promise;
  let text = "";
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    text += content.items.map((it) => ("str" in it ? it.str : "")).join(" ") + "\n";
  }
  const first = await doc.getPage(1);
  const [, , w, h] = first.view;
  return { text, pages: doc.numPages, size: [Math.round(w), Math.round(h)] };
}

let owner: TestUser, keeper: TestUser, other: TestUser, tech: TestUser;
let car: Awaited<ReturnType<typeof makeVehicle>>;
let passId: string, endedPassId: string;
const DOTS = ["DOT XJ7K ABCD 3422", "DOT M5RT 8HQ2 0719", "DOT 4BNP LL9W 5120", "DOT HH3X 2KKV 1123"];

beforeAll(async () => {
  owner = await signUp({ name: "Lorna Pettifer" });
  keeper = await signUp({ name: "Abel Pettifer" });
  other = await signUp();
  tech = await signUp({ name: "Cass Whitlow" });
  const shopId = (await makeShop({ owner: await signUp(), technicians: [tech] })).id;
  car = await makeVehicle(owner, "Lorna's hatch");
  for (const [i, t] of car.tires.entries()) await db.update(tire).set({ dotCode: DOTS[i] }).where(eq(tire.id, t.id));
  await db.insert(vehicleKeeper).values({ vehicleId: car.vehicle.id, email: keeper.email, userId: keeper.id, tokenHash: "x".repeat(64), state: "active", expiresAt: new Date(), acceptedAt: new Date() });
  const now = Date.now();
  passId = (await insertPass({ driver: owner, shopId, vehicleIds: [car.vehicle.id], scope: "view", startsAt: new Date(now - HOUR), endsAt: new Date(now + HOUR) })).id;
  endedPassId = (await insertPass({ driver: owner, shopId, vehicleIds: [car.vehicle.id], startsAt: new Date(now - 3 * HOUR), endsAt: new Date(now - HOUR) })).id;
});

const get = (as: TestUser | undefined, paper = "a4") =>
  ownerPdf(request(`/api/vehicles/${car.vehicle.id}/history-pdf?paper=${paper}`, { as }), ctx({ vehicleId: car.vehicle.id }));

describe("tire history PDF", () => {
  it("holds every DOT code of the vehicle, the cautions, on A4 paper", async () => {
    const res = await get(owner);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const { text, size } = await pdfText(new Uint8Array(await res.arrayBuffer()));
    for (const dot of DOTS) expect(text).toContain(dot);
    expect(text).toContain("Lorna's hatch");
    expect(text).toMatch(/qualified tire technician/);
    // ISO 216 A4 is 210 × 297 mm = 595 × 842 pt.
    expect(size).toEqual([595, 842]);
  });

  it("comes on US Letter (8.5 × 11 in = 612 × 792 pt) when asked", async () => {
    const { size } = await pdfText(new Uint8Array(await (await get(owner, "letter")).arrayBuffer()));
    expect(size).toEqual([612, 792]);
  });

  it("a co-keeper and a technician under a live pass may print; another driver, an ended pass and a signed-out caller may not", async () => {
    expect((await get(keeper)).status).toBe(200);
    expect((await get(other)).status).toBe(404);
    expect((await get(undefined)).status).toBe(401);
    const shop = await passPdf(request(`/api/passes/${passId}/vehicles/${car.vehicle.id}/history-pdf`, { as: tech }), ctx({ passId, vehicleId: car.vehicle.id }));
    expect(shop.status).toBe(200);
    const { text } = await pdfText(new Uint8Array(await shop.arrayBuffer()));
    for (const dot of DOTS) expect(text).toContain(dot);
    const ended = await passPdf(request(`/api/passes/${endedPassId}/vehicles/${car.vehicle.id}/history-pdf`, { as: tech }), ctx({ passId: endedPassId, vehicleId: car.vehicle.id }));
    expect(ended.status).toBe(403);
    const stranger = await passPdf(request(`/api/passes/${passId}/vehicles/${car.vehicle.id}/history-pdf`, { as: other }), ctx({ passId, vehicleId: car.vehicle.id }));
    expect(stranger.status).toBe(404);
  });
});
