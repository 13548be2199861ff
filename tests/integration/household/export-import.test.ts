// Export → import → export on the demo garage, through the real route
// handlers: the documents match (ids and the import's own times aside), the
// document validates against the committed JSON Schema with an independent
// validator (ajv), and every refused import writes nothing.
import fs from "node:fs";
import path from "node:path";
import Ajv2020 from "ajv/dist/2020";
import addFormats from "ajv-formats";
import { sql } from "drizzle-orm";
import { strToU8, unzipSync, zipSync } from "fflate";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { attachment, serviceEntry, tire, tireSet, treadCheck, treadReading, vehicle } from "@/db/schema";
import { GET as exportRoute } from "@/app/api/account/export/route";
import { POST as importRoute } from "@/app/api/account/import/route";
import { seedDemo } from "@/db/seed";
import { exportJsonSchema, type ExportDocument } from "@/lib/export/document";
import { IMPORT_MAX_BYTES } from "@/db/queries/import";
import { uploadsDir } from "@/lib/uploads";
import { todayIso } from "@/lib/validation/logbook";
import { ctx, request, signUp, type TestUser } from "../../support/users";

const schemaFile = path.join(process.cwd(), "docs/fourpatch-export.schema.json");
let ada: TestUser;
let adaZip: Uint8Array;
let adaDoc: ExportDocument;

async function exportOf(as: TestUser) {
  const res = await exportRoute(request("/api/account/export", { as }), ctx({}));
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toBe("application/zip");
  const zip = new Uint8Array(await res.arrayBuffer());
  const entries = unzipSync(zip);
  const doc = JSON.parse(new TextDecoder().decode(entries["fourpatch-export.json"])) as ExportDocument;
  return { zip, entries, doc };
}

function importAs(as: TestUser, body: Uint8Array | ReadableStream<Uint8Array>, mode = "empty") {
  const req = new Request(`http://fourpatch.test/api/account/import?mode=${mode}`, {
    method: "POST",
    headers: { cookie: as.cookie, "content-type": "application/zip" },
    body: body as BodyInit,
    duplex: "half",
  } as RequestInit);
  return importRoute(req, ctx({}));
}

/** The document with ids replaced by what they point at, so two exports of the same logbook compare equal. */
function canonical(doc: ExportDocument) {
  const strip = <T extends object>(o: T, keys: string[]) => Object.fromEntries(Object.entries(o).filter(([k]) => !keys.includes(k)));
  const vehicles = new Map(doc.vehicles.map((v) => [v.id, JSON.stringify(strip(v, ["id"]))]));
  const sets = new Map(doc.sets.map((s) => [s.id, `${vehicles.get(s.vehicleId)}|${JSON.stringify(strip(s, ["id", "vehicleId"]))}`]));
  const tires = new Map(doc.tires.map((t) => [t.id, `${sets.get(t.setId)}|${JSON.stringify(strip(t, ["id", "setId"]))}`]));
  const services = new Map(doc.serviceEntries.map((s) => [s.id, `${vehicles.get(s.vehicleId)}|${s.setId ? sets.get(s.setId) : "-"}|${JSON.stringify(strip(s, ["id", "vehicleId", "setId"]))}`]));
  const checks = new Map(
    doc.treadChecks.map((c) => [c.id, `${sets.get(c.setId)}|${c.serviceEntryId ? services.get(c.serviceEntryId) : "-"}|${JSON.stringify(strip(c, ["id", "vehicleId", "setId", "serviceEntryId"]))}`]),
  );
  const sorted = (xs: Iterable<string>) => [...xs].sort();
  return {
    profile: doc.profile,
    vehicles: sorted(vehicles.values()),
    sets: sorted(sets.values()),
    tires: sorted(tires.values()),
    services: sorted(services.values()),
    checks: sorted(checks.values()),
    readings: sorted(doc.treadReadings.map((r) => `${checks.get(r.checkId)}|${tires.get(r.tireId)}|${JSON.stringify(strip(r, ["id", "checkId", "tireId"]))}`)),
    odometer: sorted(doc.odometerReadings.map((o) => `${vehicles.get(o.vehicleId)}|${JSON.stringify(strip(o, ["id", "vehicleId"]))}`)),
    files: sorted(
      doc.attachments.map(
        (a) =>
          `${vehicles.get(a.vehicleId)}|${a.setId ? sets.get(a.setId) : "-"}|${a.serviceEntryId ? services.get(a.serviceEntryId) : "-"}|${JSON.stringify({ ...strip(a, ["id", "vehicleId", "setId", "serviceEntryId", "path"]), name: a.path.replace(/^files\/[0-9a-f-]{36}-/, "") })}`,
      ),
    ),
  };
}

async function rowCounts() {
  const c = async (t: typeof vehicle | typeof tireSet | typeof tire | typeof treadCheck | typeof treadReading | typeof serviceEntry | typeof attachment) =>
    (await db.select({ n: sql<number>`count(*)::int` }).from(t))[0].n;
  const files = fs.existsSync(uploadsDir()) ? fs.readdirSync(uploadsDir()).length : 0;
  return { v: await c(vehicle), s: await c(tireSet), t: await c(tire), c: await c(treadCheck), r: await c(treadReading), e: await c(serviceEntry), a: await c(attachment), files };
}

function rezip(entries: Record<string, Uint8Array>, change: (doc: Record<string, unknown>) => void) {
  const doc = JSON.parse(new TextDecoder().decode(entries["fourpatch-export.json"]));
  change(doc);
  return zipSync({ ...entries, "fourpatch-export.json": strToU8(JSON.stringify(doc)) });
}

beforeAll(async () => {
  const { ids } = await seedDemo({ today: todayIso() });
  // The demo's accounts are made through better-auth; sign Ada in the same way a browser does.
  ada = await signUp({ name: "Placeholder" });
  await db.execute(sql`update vehicle set owner_id = ${ada.id} where owner_id = ${ids.ada}`);
  await db.execute(sql`update attachment set owner_id = ${ada.id} where owner_id = ${ids.ada}`);
  await db.execute(sql`update shop_pass set driver_id = ${ada.id} where driver_id = ${ids.ada}`);
  const first = await exportOf(ada);
  adaZip = first.zip;
  adaDoc = first.doc;
});

describe("export", () => {
  it("is one zip with the document, a CSV per record kind and the files; the committed JSON Schema is the generated one and the document validates against it", async () => {
    const { entries } = await exportOf(ada);
    expect(Object.keys(entries)).toEqual(expect.arrayContaining(["fourpatch-export.json", "csv/vehicles.csv", "csv/tires.csv", "csv/tread-readings.csv", "csv/service-entries.csv", "csv/tire-sets.csv", "README.txt"]));
    expect(adaDoc.vehicles.length).toBe(2);
    expect(adaDoc.attachments.length).toBeGreaterThan(0);
    for (const a of adaDoc.attachments) expect(entries[a.path]?.byteLength).toBe(a.sizeBytes);
    const tiresCsv = new TextDecoder().decode(entries["csv/tires.csv"]).trim().split("\r\n");
    expect(tiresCsv.length).toBe(adaDoc.tires.length + 1);

    const committed = JSON.parse(fs.readFileSync(schemaFile, "utf8"));
    expect(committed, "run `npm run export:schema` after changing lib/export/document.ts").toEqual(JSON.parse(JSON.stringify(exportJsonSchema())));
    const ajv = new Ajv2020({ allErrors: true, strict: false });
    addFormats(ajv);
    const validate = ajv.compile(committed);
    expect(validate(adaDoc), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    // The validator is not a rubber stamp: a document with a wrong field fails it.
    expect(validate({ ...adaDoc, vehicles: [{ ...adaDoc.vehicles[0], odometerUnit: "furlong" }] })).toBe(false);
  });
});

describe("import", () => {
  it("export → import into a new account → export gives the same logbook", async () => {
    const fresh = await signUp({ name: "Ada Renwick again" });
    const res = await importAs(fresh, adaZip);
    expect(res.status, await res.clone().text()).toBe(200);
    const again = await exportOf(fresh);
    expect(canonical(again.doc)).toEqual(canonical(adaDoc));
    // The new copy is independent: new ids, the new owner's files.
    expect(again.doc.vehicles.map((v) => v.id)).not.toEqual(expect.arrayContaining(adaDoc.vehicles.map((v) => v.id)));
    for (const a of again.doc.attachments) expect(again.entries[a.path]?.byteLength).toBe(a.sizeBytes);
  });

  it("into an account that has vehicles: refused as 'empty', accepted as additional vehicles", async () => {
    const someone = await signUp();
    await db.insert(vehicle).values({ ownerId: someone.id, nickname: "Already here", make: "Pellan", model: "Skiff" });
    const before = await rowCounts();
    const res = await importAs(someone, adaZip, "empty");
    expect(res.status).toBe(409);
    expect(await rowCounts()).toEqual(before);
    const merged = await importAs(someone, adaZip, "merge");
    expect(merged.status).toBe(200);
    expect((await exportOf(someone)).doc.vehicles.map((v) => v.nickname).sort()).toEqual(["Already here", ...adaDoc.vehicles.map((v) => v.nickname)].sort());
  });

  const refusals: [string, () => Uint8Array | ReadableStream<Uint8Array>, number, RegExp][] = [
    ["a truncated zip", () => adaZip.slice(0, Math.floor(adaZip.length / 2)), 422, /damaged or cut short/],
    ["something that is not a zip", () => strToU8("just some text, not a zip at all"), 422, /not a zip/],
    ["a zip without the document", () => zipSync({ "notes.txt": strToU8("hello") }), 422, /no fourpatch-export.json/],
    ["a foreign format", () => rezip(unzipSync(adaZip), (d) => (d.format = "some-other-logbook")), 422, /another format/],
    ["a future version", () => rezip(unzipSync(adaZip), (d) => (d.version = 3)), 422, /newer Fourpatch \(format version 3\)/],
    [
      "an id edited to point at another driver's vehicle",
      () => rezip(unzipSync(adaZip), (d) => ((d.sets as { vehicleId: string }[])[0].vehicleId = otherVehicleId)),
      422,
      /points at something that is not in this export/,
    ],
    ["a damaged file inside", () => {
      const e = unzipSync(adaZip);
      const p = adaDoc.attachments[0].path;
      const b = e[p].slice();
      b[b.length - 5] ^= 0xff;
      return zipSync({ ...e, [p]: b });
    }, 422, /damaged \(its checksum/],
    ["a document field of the wrong kind", () => rezip(unzipSync(adaZip), (d) => ((d.tires as { dotWeek: unknown }[])[0].dotWeek = "thirty")), 422, /tires\.0\.dotWeek/],
    [
      "a file larger than allowed",
      () => {
        let sent = 0;
        const chunk = new Uint8Array(4 * 1024 * 1024);
        return new ReadableStream<Uint8Array>({
          pull(c) {
            if (sent > IMPORT_MAX_BYTES + chunk.length) return c.close();
            sent += chunk.length;
            c.enqueue(chunk);
          },
        });
      },
      413,
      /larger than 100 MB/,
    ],
  ];
  let otherVehicleId: string;
  beforeAll(async () => {
    const other = await signUp();
    [{ id: otherVehicleId }] = await db.insert(vehicle).values({ ownerId: other.id, nickname: "Not yours", make: "Pellan", model: "Skiff" }).returning({ id: vehicle.id });
  });

  it.each(refusals)("refuses %s with a clear reason and writes nothing", async (_name, body, status, message) => {
    const target = await signUp();
    const before = await rowCounts();
    const res = await importAs(target, body());
    expect(res.status).toBe(status);
    const err = (await res.json()).error;
    expect(err.message).toMatch(message);
    expect(await rowCounts()).toEqual(before);
    expect(fs.existsSync(uploadsDir()) ? fs.readdirSync(uploadsDir()).filter((n) => n.startsWith(".incoming")) : []).toEqual([]);
  });

  it("refuses a signed-out request and a missing mode", async () => {
    const res = await importRoute(new Request("http://fourpatch.test/api/account/import?mode=empty", { method: "POST", body: adaZip as BodyInit }), ctx({}));
    expect(res.status).toBe(401);
    const someone = await signUp();
    const noMode = await importAs(someone, adaZip, "sideways");
    expect(noMode.status).toBe(422);
  });
});
