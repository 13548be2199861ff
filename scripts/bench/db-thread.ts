// Where the time of one heavy logbook goes, with PGlite in the main thread
// or in its worker: wall time per call, and how long the main thread was
// blocked meanwhile (event-loop delay). Usage (server stopped):
// FOURPATCH_DATA_DIR=.bench/large FOURPATCH_PGLITE_THREAD=worker tsx scripts/bench/db-thread.ts <vehicleId> [n] [at once]
import { monitorEventLoopDelay, performance } from "node:perf_hooks";
const vehicleId = process.argv[2];
const n = Number(process.argv[3] ?? 10);
// Logbooks in flight at once (like concurrent requests).
const k = Number(process.argv[4] ?? 1);
const { closeDb, db, databaseThread } = await import("@/db");
const { getVehicleLogbook } = await import("@/db/queries/logbook");
const { vehicle } = await import("@/db/schema");
const { eq } = await import("drizzle-orm");
const [v] = await db.select({ ownerId: vehicle.ownerId }).from(vehicle).where(eq(vehicle.id, vehicleId));
const access = { kind: "owner", userId: v.ownerId, userName: "bench" } as never;
const today = new Date().toISOString().slice(0, 10);
const once = () => getVehicleLogbook({ access, vehicleId, today });
await once();
const h = monitorEventLoopDelay({ resolution: 1 });
h.enable();
const elu0 = performance.eventLoopUtilization();
const cpu0 = process.cpuUsage();
const t0 = performance.now();
let bytes = 0;
for (let i = 0; i < n; i += k) for (const b of await Promise.all(Array.from({ length: k }, once))) bytes = JSON.stringify(b).length;
const ms = (performance.now() - t0) / n;
const elu = performance.eventLoopUtilization(elu0);
const cpu = process.cpuUsage(cpu0);
h.disable();
console.log(
  `${databaseThread()}: ${ms.toFixed(0)} ms per logbook (${(bytes / 1024).toFixed(0)} KiB JSON); main thread busy ${(elu.utilization * ms).toFixed(0)} ms of it; process CPU ${((cpu.user + cpu.system) / 1000 / n).toFixed(0)} ms; event-loop delay max ${(h.max / 1e6).toFixed(0)} ms, p99 ${(h.percentile(99) / 1e6).toFixed(0)} ms, mean ${(h.mean / 1e6).toFixed(1)} ms`,
);
await closeDb();
