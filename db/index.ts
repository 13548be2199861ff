// The one database client of a process. PGlite in a data folder by default
// (guarded by an exclusive lock), in memory for tests and the build phase,
// and a real PostgreSQL server when DATABASE_URL is set. PGlite runs in a
// worker thread (db/pglite-worker.mjs, spoken to through
// db/pglite-client.ts) unless FOURPATCH_PGLITE_THREAD=main: its queries are
// WebAssembly that would otherwise run on the request thread and stall
// every other request while they run.
import fs from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { drizzle as drizzlePglite, type PgliteDatabase } from "drizzle-orm/pglite";
import { drizzle as drizzlePg } from "drizzle-orm/node-postgres";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import { migrate as migratePg } from "drizzle-orm/node-postgres/migrator";
import pg from "pg";
import { env } from "@/lib/env";
import { acquireDataDirLock } from "./lock";
import { PgliteWorkerClient } from "./pglite-client";
import * as schema from "./schema";

export type Database = PgliteDatabase<typeof schema>;
export type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];

/** What this module calls on PGlite; the worker client implements the same. */
type Embedded = Pick<PGlite, "exec" | "query" | "dumpDataDir" | "close">;

type Client =
  | { kind: "pglite"; db: Database; pglite: Embedded; thread: "worker" | "main"; release: () => void; dataDir: string }
  | { kind: "pg"; db: Database; pool: pg.Pool };

const globalForDb = globalThis as unknown as { __fourpatchDb?: Client; __fourpatchMigrated?: Promise<void> };

function dataDirFromEnv() {
  // `next build` imports server modules while collecting page data; it must
  // never open (or lock) the live data folder.
  if (process.env.NEXT_PHASE === "phase-production-build") return "memory://";
  return env().FOURPATCH_DATA_DIR;
}

function open(): Client {
  const url = env().DATABASE_URL;
  if (url && process.env.NEXT_PHASE !== "phase-production-build") {
    const pool = new pg.Pool({ connectionString: url, max: 10 });
    const db = drizzlePg({ client: pool, schema, casing: "snake_case" }) as unknown as Database;
    return { kind: "pg", db, pool };
  }
  const dataDir = dataDirFromEnv();
  // The build phase never queries: no thread for it.
  const thread = process.env.NEXT_PHASE === "phase-production-build" ? "main" : env().FOURPATCH_PGLITE_THREAD;
  let release = () => {};
  let folder: string | null = null;
  // PGlite runs PostgreSQL in single-user mode: no checkpointer, no
  // autovacuum. The write-ahead log only shrinks at a CHECKPOINT, which
  // db/maintenance.ts runs after bulk changes and on a timer; these bound
  // what a checkpoint keeps.
  // PostgreSQL's own default of 128 MB of shared buffers is touched at start
  // and stays resident; a household's logbooks fit in far less, and the
  // operating system caches the folder's files besides.
  const options = { postgresqlconf: ["max_wal_size = 64MB", "min_wal_size = 32MB", `shared_buffers = ${env().FOURPATCH_PGLITE_BUFFERS_MB}MB`] };
  if (!dataDir.startsWith("memory://")) {
    folder = path.resolve(/*turbopackIgnore: true*/ dataDir);
    // Created first, so that the lock is named after the folder's real path.
    fs.mkdirSync(folder, { recursive: true });
    // Taken by this process before the database opens, whichever thread opens it.
    release = acquireDataDirLock(folder);
  }
  let pglite: Embedded;
  if (thread === "worker") pglite = new PgliteWorkerClient(folder, folder ? options : {}, databaseLost);
  else pglite = folder ? new PGlite(folder, options) : new PGlite();
  const db = drizzlePglite({ client: pglite as PGlite, schema, casing: "snake_case" });
  return { kind: "pglite", db, pglite, thread, release, dataDir };
}

/**
 * The database thread died (an uncaught error inside it). A server stops
 * with the reason, so that its supervisor starts it again (PostgreSQL's
 * recovery replays the write-ahead log on the next open); elsewhere every
 * call fails with the reason.
 */
function databaseLost(err: Error) {
  console.error(`\nThe embedded database stopped: ${err.message}\n`);
  if (process.env.NEXT_RUNTIME === "nodejs") process.exit(1);
}

function client(): Client {
  globalForDb.__fourpatchDb ??= open();
  return globalForDb.__fourpatchDb;
}

/** The Drizzle database. Opens (and locks) the data folder on first use. */
export const db: Database = new Proxy({} as Database, {
  get(_target, prop, receiver) {
    const real = client().db as unknown as Record<string | symbol, unknown>;
    const value = Reflect.get(real, prop, receiver === db ? real : receiver);
    return typeof value === "function" ? (value as (...a: unknown[]) => unknown).bind(real) : value;
  },
  has(_target, prop) {
    return Reflect.has(client().db as object, prop);
  },
});

export const migrationsFolder = path.join(process.cwd(), "db/migrations");

/** Which engine the process uses: embedded PGlite or a PostgreSQL server. */
export function databaseKind(): "pglite" | "pg" {
  return client().kind;
}

/** Where the embedded database runs: its own worker thread, the main thread, or a PostgreSQL server. */
export function databaseThread(): "worker" | "main" | "server" {
  const c = client();
  return c.kind === "pg" ? "server" : c.thread;
}

/** Runs a statement outside the query builder (maintenance: ANALYZE, VACUUM, CHECKPOINT). */
export async function execMaintenance(statement: string): Promise<void> {
  const c = client();
  if (c.kind === "pg") await c.pool.query(statement);
  else await c.pglite.exec(statement);
}

/**
 * Applies pending migrations once per process, then refreshes the planner's
 * statistics: PGlite has no autovacuum, and without statistics every
 * logbook query reads whole tables.
 */
export function migrateDb(): Promise<void> {
  globalForDb.__fourpatchMigrated ??= (async () => {
    const c = client();
    if (c.kind === "pg") await migratePg(c.db as never, { migrationsFolder });
    else await migratePglite(c.db, { migrationsFolder });
    await execMaintenance("ANALYZE");
  })();
  return globalForDb.__fourpatchMigrated;
}

/**
 * A consistent copy of the embedded database's data folder, as a gzipped tar
 * (PGlite's own dump; `loadDataDir` reads it back). Null on PostgreSQL, where
 * pg_dump is the tool.
 */
export async function dumpEmbeddedDatabase(): Promise<Blob | null> {
  const c = client();
  if (c.kind !== "pglite") return null;
  await c.pglite.query("CHECKPOINT");
  return c.pglite.dumpDataDir("gzip");
}

/** Closes the client and releases the data-folder lock. */
export async function closeDb() {
  const c = globalForDb.__fourpatchDb;
  if (!c) return;
  globalForDb.__fourpatchDb = undefined;
  globalForDb.__fourpatchMigrated = undefined;
  if (c.kind === "pg") await c.pool.end();
  else {
    try {
      await c.pglite.close();
    } finally {
      c.release();
    }
  }
}

export { schema };
