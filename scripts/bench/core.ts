// The computation core's figures for `npm run bench`: how fast lib/tires is
// on this machine. Prints figures; asserts nothing.
import { performance } from "node:perf_hooks";
import { computeReminders, decodeDotCode, parseTireSize, projectWear, validateVin, type LogbookInput } from "@/lib/tires";

const today = "2026-12-01";

function bench(name: string, runs: number, fn: (i: number) => unknown) {
  for (let i = 0; i < Math.min(1000, runs); i++) fn(i); // warm-up
  const heapBefore = process.memoryUsage().heapUsed;
  const t0 = performance.now();
  for (let i = 0; i < runs; i++) fn(i);
  const ms = performance.now() - t0;
  const heapMb = (process.memoryUsage().heapUsed - heapBefore) / 1e6;
  console.log(
    `${name.padEnd(44)} ${String(runs).padStart(7)} runs  ${(ms / runs * 1000).toFixed(2).padStart(9)} µs/run  ${(runs / (ms / 1000)).toFixed(0).padStart(9)} /s  heap Δ ${heapMb.toFixed(1)} MB`,
  );
}

export function benchCore() {
const codes = Array.from({ length: 2000 }, (_, i) => `DOT U2LL LMLR ${String((i % 52) + 1).padStart(2, "0")}${String(10 + (i % 16)).padStart(2, "0")}`);
bench("decodeDotCode (full TIN)", 200_000, (i) => decodeDotCode(codes[i % codes.length], { today }));
bench("parseTireSize", 200_000, (i) => parseTireSize(i % 2 ? "225/45R17 94V XL" : "LT235/85R16 120/116Q"));
bench("validateVin", 200_000, () => validateVin("1J9RP1A36A1644345"));

const readings = Array.from({ length: 40 }, (_, i) => ({
  date: `20${String(20 + Math.floor(i / 12)).padStart(2, "0")}-${String((i % 12) + 1).padStart(2, "0")}-10`,
  odometerKm: 20_000 + i * 1_200,
  depthMm: 8 - i * 0.11,
}));
bench("projectWear (40 readings)", 50_000, () => projectWear(readings, { limitMm: 1.6, today }));

function household(vehicles: number): LogbookInput {
  return {
    vehicles: Array.from({ length: vehicles }, (_, v) => ({
      id: `veh-${v}`,
      nickname: `Vehicle ${v}`,
      odometerHistory: readings.map((r) => ({ date: r.date, odometerKm: r.odometerKm })),
      sets: (["summer", "winter"] as const).map((kind, s) => ({
        id: `veh-${v}-set-${s}`,
        kind,
        state: s === 0 ? ("mounted" as const) : ("stored" as const),
        tires: (["front-left", "front-right", "rear-left", "rear-right"] as const).map((position, t) => ({
          id: `veh-${v}-set-${s}-tire-${t}`,
          position,
          dotCode: `${String(10 + t).padStart(2, "0")}2${s + 1}`,
          readings: readings.map((r) => ({ date: r.date, odometerKm: r.odometerKm, innerMm: r.depthMm - 0.2, centreMm: r.depthMm, outerMm: r.depthMm - 0.1 })),
        })),
      })),
    })),
  };
}
const small = household(2);
const fleet = household(50);
bench("computeReminders (2 vehicles, 16 tires)", 5_000, () => computeReminders(small, {}, { today }));
bench("computeReminders (50 vehicles, 400 tires)", 200, () => computeReminders(fleet, {}, { today }));
console.log(`rss ${(process.memoryUsage().rss / 1e6).toFixed(0)} MB`);
}
