import "server-only";
// Read answers kept in memory under the database's revision numbers
// (logbook_revision per vehicle, shared_revision for names and settings;
// migration 0012 keeps them with triggers, so no write path can forget
// them). A reader asks for the current stamp (one small query), and an
// answer computed under the same stamp is served again; any write to what
// the answer is made of changes the stamp first. With several servers on
// one PostgreSQL each keeps its own answers, and the stamp, read from the
// database, is the same for all of them.
//
// The stamp is read before the answer is computed: a write that lands in
// between makes the stored stamp older than the data, so the next reader
// recomputes; never the other way round.
//
// FOURPATCH_CACHE_CHECK=1 (the integration and browser tests) computes every
// answer again on a hit and fails loudly if the two differ: the whole test
// suite then checks that every write path moves a stamp.
import { LRUCache } from "lru-cache";
import { jsonBytes } from "@/lib/json-text";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { driverVehicles } from "@/db/queries/access";
import { logbookRevision, sharedRevision, vehicle } from "@/db/schema";
import { eq } from "drizzle-orm";

type Entry = { stamp: string; value: unknown; bytes: number };

/** The memory the answers may take, in bytes of their JSON (objects take about twice that). */
const MAX_BYTES = Number(process.env.FOURPATCH_CACHE_MB ?? 16) * 1024 * 1024;

const cache = new LRUCache<string, Entry>({
  maxSize: Math.max(1, MAX_BYTES),
  sizeCalculation: (e) => Math.max(1, e.bytes),
});

const shared = sql<number>`coalesce((select ${sharedRevision.revision} from ${sharedRevision} where ${sharedRevision.id} = 1), 0)`;

/** A vehicle's stamp as a column of a query over `vehicle`: its logbook's revision and the shared one. */
export const stampOfVehicle = sql<string>`(coalesce((select ${logbookRevision.revision} from ${logbookRevision} where ${logbookRevision.vehicleId} = ${vehicle.id}), 0) || '.' || ${shared})`;

/** One vehicle's stamp. */
export async function vehicleStamp(vehicleId: string): Promise<string> {
  const [row] = await db.select({ stamp: stampOfVehicle }).from(vehicle).where(eq(vehicle.id, vehicleId)).limit(1);
  return row?.stamp ?? "gone";
}

/** A driver's stamp: which vehicles they own or keep, each one's revision, and the shared one. */
export async function driverStamp(userId: string): Promise<string> {
  const rows = await db
    .select({ id: vehicle.id, revision: sql<number>`coalesce(${logbookRevision.revision}, 0)`, shared })
    .from(vehicle)
    .leftJoin(logbookRevision, eq(logbookRevision.vehicleId, vehicle.id))
    .where(driverVehicles(userId))
    .orderBy(vehicle.id);
  // No vehicles: nothing a logbook holds can change the answer until one is added (which changes this list).
  if (rows.length === 0) return "none";
  return `${rows.map((r) => `${r.id}:${r.revision}`).join(",")}.${rows[0].shared}`;
}

const stats = { hits: 0, misses: 0 };

const checking = () => process.env.FOURPATCH_CACHE_CHECK === "1";

/** A stale answer: thrown only when FOURPATCH_CACHE_CHECK=1 finds one. */
export class StaleAnswerError extends Error {}

/**
 * The answer kept under `key` if it was computed under `stamp`; otherwise
 * computes it and keeps it. Answers must be plain data (JSON) and are shared
 * between readers: callers must not change them.
 */
export async function underStamp<T>(key: string, stamp: string, compute: () => Promise<T>): Promise<T> {
  const kept = cache.get(key);
  if (kept && kept.stamp === stamp) {
    stats.hits += 1;
    if (checking()) {
      const fresh = JSON.stringify(await compute());
      const served = JSON.stringify(kept.value);
      if (fresh !== served) {
        throw new StaleAnswerError(`The answer kept for ${key} under stamp ${stamp} is stale: a write did not move the stamp.\nserved: ${served.slice(0, 2000)}\nfresh:  ${fresh.slice(0, 2000)}`);
      }
    }
    return kept.value as T;
  }
  stats.misses += 1;
  const value = await compute();
  const bytes = jsonBytes(value).byteLength;
  // An answer larger than a quarter of the room would push the rest out: not kept.
  if (bytes <= MAX_BYTES / 4) cache.set(key, { stamp, value, bytes });
  return value;
}

/** Forgets every kept answer (tests, and after a restore). */
export function clearKeptAnswers() {
  cache.clear();
}

/** How many answers were served from memory and how many computed, since the process started. */
export function keptAnswerStats() {
  return { ...stats, kept: cache.size };
}
