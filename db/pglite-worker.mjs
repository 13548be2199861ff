// The embedded database in its own thread. PGlite is PostgreSQL compiled to
// WebAssembly: a query runs synchronously on the thread that calls it, so in
// the server's own thread one heavy query froze every other request (the
// trivial route's p50 went from 3 ms to ~650 ms beside one heavy logbook).
// Here it runs in a worker_threads Worker; db/pglite-client.ts in the main
// thread speaks to it by messages. The main process keeps the data-folder
// lock (db/lock.ts) and takes it before this thread starts.
//
// A plain .mjs file, loaded by path from the app folder, so that `next start`,
// `next dev`, tsx scripts and vitest all run it the same way, unbundled.
//
// Messages in: { id, op, ... } with op query | exec | begin | end | dump | close.
// Messages out: { id, ok: true, value } or { id, ok: false, error }.
import { parentPort, workerData } from "node:worker_threads";
import { PGlite } from "@electric-sql/pglite";

const { dataDir, options } = workerData;
const pg = dataDir ? new PGlite(dataDir, options ?? {}) : new PGlite(options ?? {});
const ready = pg.waitReady;
// A folder that cannot be opened fails every call with the reason (below), not the thread.
ready.catch(() => {});

/** Open transactions by id: PGlite's transaction object and the decision to end it. */
const open = new Map();
let txSeq = 0;

/** Parser sets by the type ids whose text is returned as is (what drizzle asks for). */
const rawParsers = new Map();
function parsersFor(rawTypes) {
  if (!rawTypes?.length) return undefined;
  const key = rawTypes.join(",");
  let parsers = rawParsers.get(key);
  if (!parsers) {
    parsers = Object.fromEntries(rawTypes.map((oid) => [oid, (value) => value]));
    rawParsers.set(key, parsers);
  }
  return parsers;
}

const PLAIN = new Set(["string", "number", "boolean"]);

/** An error as plain data: its message and every plain field (PostgreSQL's code, detail, constraint…). */
function errorData(err) {
  if (!(err instanceof Error)) return { name: "Error", message: String(err), fields: {} };
  const fields = {};
  for (const key of Object.keys(err)) {
    const value = err[key];
    if (value === null || PLAIN.has(typeof value)) fields[key] = value;
  }
  return { name: err.name, message: err.message, stack: err.stack, fields };
}

const reply = (id, value, transfer) => parentPort.postMessage({ id, ok: true, value }, transfer);
const fail = (id, err) => parentPort.postMessage({ id, ok: false, error: errorData(err) });

function target(txId) {
  if (txId === undefined || txId === null) return pg;
  const t = open.get(txId);
  if (!t) throw new Error("Transaction is closed");
  return t.tx;
}

function begin(id) {
  const txId = ++txSeq;
  let decide;
  const decision = new Promise((resolve) => (decide = resolve));
  let begun = false;
  // PGlite's own transaction: it waits for the one before to end, runs BEGIN,
  // and commits (or rolls back when the callback throws). Queries of other
  // callers wait meanwhile, exactly as in the main thread.
  const finished = pg.transaction(async (tx) => {
    begun = true;
    open.get(txId).tx = tx;
    reply(id, txId);
    const commit = await decision;
    if (!commit && !tx.closed) await tx.rollback();
  });
  open.set(txId, { tx: null, decide, finished });
  finished.catch((err) => {
    if (!begun) {
      open.delete(txId);
      fail(id, err);
    }
  });
}

function end(id, txId, commit) {
  const t = open.get(txId);
  if (!t || !t.tx) return fail(id, new Error("Transaction is closed"));
  open.delete(txId);
  t.decide(commit);
  t.finished.then(
    () => reply(id, null),
    (err) => fail(id, err),
  );
}

async function handle(msg) {
  const { id, op } = msg;
  try {
    await ready;
    switch (op) {
      case "query": {
        const result = await target(msg.txId).query(msg.text, msg.params, {
          rowMode: msg.rowMode,
          parsers: parsersFor(msg.rawTypes),
          paramTypes: msg.paramTypes,
        });
        return reply(id, { rows: result.rows, fields: result.fields, affectedRows: result.affectedRows });
      }
      case "exec": {
        const results = await target(msg.txId).exec(msg.text);
        return reply(
          id,
          results.map((r) => ({ rows: r.rows, fields: r.fields, affectedRows: r.affectedRows })),
        );
      }
      case "begin":
        return begin(id);
      case "end":
        return end(id, msg.txId, msg.commit);
      case "dump": {
        const blob = await pg.dumpDataDir(msg.compression ?? "gzip");
        const buffer = await blob.arrayBuffer();
        return reply(id, { buffer, type: blob.type }, [buffer]);
      }
      case "close":
        await pg.close();
        return reply(id, null);
      default:
        throw new Error(`Unknown operation ${op}`);
    }
  } catch (err) {
    fail(id, err);
  }
}

parentPort.on("message", (msg) => void handle(msg));
