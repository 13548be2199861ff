// The demo household's logbook, dated relative to the day it is loaded:
// Ada's estate car with a summer set on it (its front-left tire wearing on
// the inner shoulder) and a winter set stored at the shop that is close to
// its age limit, Ada's van, and Tomas's small car. Makes and places are invented.
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { attachment, odometerReading, serviceEntry, tire, tireSet, treadCheck, treadReading, vehicle } from "@/db/schema";
import { addDays, addMonths, decodeDotCode, dotWeekOf, formatDotDateCode } from "@/lib/tires";
import { storeFile } from "@/lib/uploads";
import type { SeedContext } from "../seed";
import { DEMO_SHOP } from "./demo-accounts";

/** Nicknames of the demo vehicles, for other parts of the seed (shop passes). */
export const DEMO_VEHICLES = { adaCar: "The Velora", adaVan: "The van", tomasCar: "Tomas's runabout" } as const;

export async function demoVehicleId(ownerId: string, nickname: string): Promise<string | null> {
  const [v] = await db.select({ id: vehicle.id }).from(vehicle).where(and(eq(vehicle.ownerId, ownerId), eq(vehicle.nickname, nickname))).limit(1);
  return v?.id ?? null;
}

type Pos = "front_left" | "front_right" | "rear_left" | "rear_right";
const FOUR: Pos[] = ["front_left", "front_right", "rear_left", "rear_right"];

/** A full invented TIN whose date code is the week of `madeOn`. */
function tin(madeOn: string, plant: string): string {
  const w = dotWeekOf(madeOn)!;
  return `DOT ${plant} 7KPQ ${formatDotDateCode(w.week, w.year)}`;
}

async function addSet(
  today: string,
  v: { vehicleId: string },
  s: {
    label: string;
    kind: "summer" | "all_season" | "winter";
    size: string;
    loadIndex: number;
    speedSymbol: string;
    purchasedOn: string;
    priceCents: number;
    seller: string;
    state: "mounted" | "stored";
    storageLocation?: string;
    madeOn: string;
    plant: string;
    newDepthMm: number;
  },
) {
  const [set] = await db
    .insert(tireSet)
    .values({
      vehicleId: v.vehicleId,
      label: s.label,
      kind: s.kind,
      size: s.size,
      loadIndex: s.loadIndex,
      speedSymbol: s.speedSymbol,
      purchasedOn: s.purchasedOn,
      priceCents: s.priceCents,
      seller: s.seller,
      state: s.state,
      storageLocation: s.storageLocation ?? null,
    })
    .returning({ id: tireSet.id });
  const tires: Record<Pos, string> = {} as Record<Pos, string>;
  for (const position of FOUR) {
    // One tire of a set is often a week or two younger: a real set rarely shares one code.
    const madeOn = position === "rear_right" ? addDays(s.madeOn, 14) : s.madeOn;
    const code = tin(madeOn, s.plant);
    const d = decodeDotCode(code, { today });
    const [t] = await db
      .insert(tire)
      .values({
        setId: set.id,
        position,
        dotCode: code,
        dotWeek: d.ok ? d.week : null,
        dotYear: d.ok ? d.year : null,
        dotWeekStart: d.ok ? d.weekStart : null,
        dotPrecision: d.ok ? d.precision : null,
        newDepthMm: s.newDepthMm,
      })
      .returning({ id: tire.id });
    tires[position] = t.id;
  }
  return { setId: set.id, tires };
}

type Groove = [number, number, number];

async function addCheck(opts: {
  vehicleId: string;
  setId: string;
  tires: Record<Pos, string>;
  on: string;
  km: number;
  readings: Record<Pos, Groove>;
  pressureKpa?: number;
  shop?: { shopId: string; authorUserId: string; serviceEntryId?: string };
}) {
  const [c] = await db
    .insert(treadCheck)
    .values({
      vehicleId: opts.vehicleId,
      setId: opts.setId,
      checkedOn: opts.on,
      odometerKm: opts.km,
      measuredBy: opts.shop ? "shop" : "driver",
      method: "gauge",
      shopId: opts.shop?.shopId ?? null,
      authorUserId: opts.shop?.authorUserId ?? null,
      serviceEntryId: opts.shop?.serviceEntryId ?? null,
    })
    .returning({ id: treadCheck.id });
  await db.insert(treadReading).values(
    FOUR.map((p) => ({
      checkId: c.id,
      tireId: opts.tires[p],
      innerMm: opts.readings[p][0],
      centreMm: opts.readings[p][1],
      outerMm: opts.readings[p][2],
      pressureKpa: opts.pressureKpa ?? null,
    })),
  );
}

const round1 = (n: number) => Math.round(n * 10) / 10;

// A tiny but valid PDF, so the demo receipt opens in a browser.
function receiptPdf(lines: string[]): Uint8Array {
  const text = lines.map((l, i) => `BT /F1 12 Tf 50 ${760 - i * 18} Td (${l.replace(/[()\\]/g, "")}) Tj ET`).join("\n");
  const objs = [
    "<< /Type /Catalog /Pages 2 0 R >>",
    "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
    "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] /Contents 4 0 R /Resources << /Font << /F1 5 0 R >> >> >>",
    `<< /Length ${text.length} >>\nstream\n${text}\nendstream`,
    "<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>",
  ];
  let out = "%PDF-1.4\n";
  const offsets: number[] = [];
  objs.forEach((o, i) => {
    offsets.push(out.length);
    out += `${i + 1} 0 obj\n${o}\nendobj\n`;
  });
  const xref = out.length;
  out += `xref\n0 ${objs.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, "0")} 00000 n \n`).join("")}`;
  out += `trailer\n<< /Size ${objs.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return new TextEncoder().encode(out);
}

export async function seedLogbook(ctx: SeedContext) {
  const { today, ids } = ctx;
  // Loading the demo twice keeps one copy.
  if (await demoVehicleId(ids.ada, DEMO_VEHICLES.adaCar)) return;
  const month = (m: number) => addMonths(today, m);

  // ---- Ada's estate car: summer set on it, winter set stored at the shop.
  const [car] = await db
    .insert(vehicle)
    .values({
      ownerId: ids.ada,
      nickname: DEMO_VEHICLES.adaCar,
      make: "Velora",
      model: "Tessel Estate",
      year: 2019,
      plate: "QF 19 ARW",
      placardFrontSize: "205/55 R16 91V",
      placardFrontKpa: 240,
      placardRearKpa: 230,
      odometerUnit: "km",
    })
    .returning({ id: vehicle.id });
  const carId = car.id;

  // The winter set was made 5 years 8 months ago: winter tires are watched from 4 years and replaced
  // at 6 (trade-facts §3 [practice]), so with a 6-month lead it is in "plan".
  const winter = await addSet(today, { vehicleId: carId }, {
    label: "Winter tires",
    kind: "winter",
    size: "205/55 R16 91H",
    loadIndex: 91,
    speedSymbol: "H",
    purchasedOn: month(-62),
    priceCents: 52800,
    seller: DEMO_SHOP.name,
    state: "stored",
    storageLocation: DEMO_SHOP.name,
    madeOn: month(-68),
    plant: "8RK",
    newDepthMm: 9,
  });
  // The summer set went on eleven months ago, made about 20 months ago.
  const summer = await addSet(today, { vehicleId: carId }, {
    label: "Summer tires",
    kind: "summer",
    size: "205/55 R16 91V",
    loadIndex: 91,
    speedSymbol: "V",
    purchasedOn: month(-11),
    priceCents: 46400,
    seller: DEMO_SHOP.name,
    state: "mounted",
    madeOn: month(-20),
    plant: "4HJ",
    newDepthMm: 8,
  });

  const startKm = 61_200;
  const kmPerMonth = 1_150;
  const kmAt = (m: number) => Math.round(startKm + kmPerMonth * (11 + m));
  for (let m = -11; m <= 0; m++) {
    await db.insert(odometerReading).values({ vehicleId: carId, readOn: addDays(month(m), m === 0 ? -3 : 0), odometerKm: kmAt(m) - (m === 0 ? 110 : 0) });
  }
  await db.insert(serviceEntry).values([
    {
      vehicleId: carId,
      setId: winter.setId,
      kind: "fitting",
      performedOn: month(-62),
      odometerKm: 12_400,
      costCents: 52800,
      notes: "New winter set fitted.",
      shopId: DEMO_SHOP.id,
      authorUserId: ids.wren,
    },
    {
      vehicleId: carId,
      setId: summer.setId,
      kind: "fitting",
      performedOn: month(-11),
      odometerKm: kmAt(-11),
      costCents: 46400,
      notes: "New summer set fitted; the winter set is stored at the shop.",
      shopId: DEMO_SHOP.id,
      authorUserId: ids.jo,
    },
  ]);
  const [rotation] = await db
    .insert(serviceEntry)
    .values({
      vehicleId: carId,
      setId: summer.setId,
      kind: "inspection",
      performedOn: month(-5),
      odometerKm: kmAt(-5),
      notes: "Front-left worn on the inner edge: alignment advised.",
      shopId: DEMO_SHOP.id,
      authorUserId: ids.jo,
    })
    .returning({ id: serviceEntry.id });

  // Ten months of checks. The front-left inner groove wears about three times as fast as the others:
  // an inner-shoulder pattern (toe or camber), per the pattern rules of lib/tires.
  const checkMonths = [-10, -8, -6, -5, -3, -1, 0];
  for (const m of checkMonths) {
    const t = 10 + m; // months since the first check
    const even = (base: number, rate: number) => round1(base - rate * t);
    const readings: Record<Pos, Groove> = {
      front_left: [round1(7.2 - 0.39 * t), even(7.7, 0.13), even(7.8, 0.12)],
      front_right: [even(7.7, 0.13), even(7.7, 0.12), even(7.8, 0.12)],
      rear_left: [even(7.8, 0.09), even(7.9, 0.09), even(7.8, 0.09)],
      rear_right: [even(7.8, 0.1), even(7.9, 0.09), even(7.9, 0.09)],
    };
    await addCheck({
      vehicleId: carId,
      setId: summer.setId,
      tires: summer.tires,
      on: m === 0 ? addDays(today, -3) : month(m),
      km: m === 0 ? kmAt(0) - 110 : kmAt(m),
      readings,
      pressureKpa: m === -5 ? 240 : 235,
      shop: m === -5 ? { shopId: DEMO_SHOP.id, authorUserId: ids.jo, serviceEntryId: rotation.id } : undefined,
    });
  }
  // The winter set's last check, at the shop before it went into storage.
  await addCheck({
    vehicleId: carId,
    setId: winter.setId,
    tires: winter.tires,
    on: month(-11),
    km: kmAt(-11),
    readings: { front_left: [5.1, 5.3, 5.2], front_right: [5.2, 5.3, 5.3], rear_left: [5.6, 5.7, 5.6], rear_right: [5.5, 5.7, 5.6] },
    shop: { shopId: DEMO_SHOP.id, authorUserId: ids.jo },
  });

  const pdf = receiptPdf([
    DEMO_SHOP.name,
    DEMO_SHOP.address,
    `Invoice for Ada Renwick, ${month(-11)}`,
    "4 x summer tires 205/55 R16 91V, fitted and balanced",
    "Total 464.00 EUR",
  ]);
  const storedName = await storeFile(pdf, "pdf");
  await db.insert(attachment).values({
    ownerId: ids.ada,
    vehicleId: carId,
    setId: summer.setId,
    kind: "receipt",
    fileName: "summer-tires-receipt.pdf",
    storedName,
    mimeType: "application/pdf",
    sizeBytes: pdf.byteLength,
    uploadedByUserId: ids.ada,
  });

  // ---- Ada's van: an all-season set past its 5-year inspection age.
  const [van] = await db
    .insert(vehicle)
    .values({
      ownerId: ids.ada,
      nickname: DEMO_VEHICLES.adaVan,
      make: "Korvan",
      model: "Lumo 7",
      year: 2016,
      placardFrontSize: "215/65 R16 102H",
      placardFrontKpa: 260,
      placardRearKpa: 280,
      odometerUnit: "km",
    })
    .returning({ id: vehicle.id });
  const vanSet = await addSet(today, { vehicleId: van.id }, {
    label: "All-season tires",
    kind: "all_season",
    size: "215/65 R16 102H",
    loadIndex: 102,
    speedSymbol: "H",
    purchasedOn: month(-58),
    priceCents: 49900,
    seller: "Fenmarket Tyre Depot",
    state: "mounted",
    madeOn: month(-64),
    plant: "2WB",
    newDepthMm: 8.5,
  });
  const vanKm = (m: number) => Math.round(88_000 + 900 * (10 + m));
  await db.insert(serviceEntry).values({ vehicleId: van.id, setId: vanSet.setId, kind: "rotation", performedOn: month(-7), odometerKm: vanKm(-7), costCents: 3000, notes: "Front to back." });
  for (const m of [-9, -4, -1]) {
    const t = 10 + m;
    const d = (b: number) => round1(b - 0.08 * t);
    await addCheck({
      vehicleId: van.id,
      setId: vanSet.setId,
      tires: vanSet.tires,
      on: month(m),
      km: vanKm(m),
      readings: { front_left: [d(4.9), d(5.0), d(4.9)], front_right: [d(4.8), d(5.0), d(5.0)], rear_left: [d(5.3), d(5.4), d(5.3)], rear_right: [d(5.3), d(5.3), d(5.4)] },
    });
  }

  // ---- Tomas's small car, logged once.
  const [runabout] = await db
    .insert(vehicle)
    .values({ ownerId: ids.tomas, nickname: DEMO_VEHICLES.tomasCar, make: "Pellan", model: "Skiff", year: 2021, placardFrontSize: "195/65 R15 91H", odometerUnit: "km" })
    .returning({ id: vehicle.id });
  const tomasSet = await addSet(today, { vehicleId: runabout.id }, {
    label: "All-season tires",
    kind: "all_season",
    size: "195/65 R15 91H",
    loadIndex: 91,
    speedSymbol: "H",
    purchasedOn: month(-14),
    priceCents: 33600,
    seller: DEMO_SHOP.name,
    state: "mounted",
    madeOn: month(-19),
    plant: "6NT",
    newDepthMm: 8,
  });
  await db.insert(serviceEntry).values({ vehicleId: runabout.id, setId: tomasSet.setId, kind: "fitting", performedOn: month(-14), odometerKm: 21_300, costCents: 33600, notes: "New all-season set fitted." });
  await addCheck({
    vehicleId: runabout.id,
    setId: tomasSet.setId,
    tires: tomasSet.tires,
    on: month(-2),
    km: 30_900,
    readings: { front_left: [6.9, 7.0, 7.0], front_right: [7.0, 7.0, 6.9], rear_left: [7.3, 7.4, 7.3], rear_right: [7.3, 7.3, 7.4] },
  });
}
