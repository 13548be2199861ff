// The main thread's side of db/pglite-worker.mjs: the part of PGlite's
// interface that drizzle-orm/pglite's session, its migrator and db/index.ts
// call (query, exec, transaction, dumpDataDir, close), answered by the
// PGlite instance that lives in a worker thread. The request thread only
// sends and receives messages; the WebAssembly runs elsewhere.
//
// Semantics kept from PGlite: one statement at a time; a transaction holds
// the database until it ends, and other callers' queries wait for it; a
// callback that throws rolls back; errors carry PostgreSQL's fields (code,
// detail, constraint…). Type parsers are functions and cannot cross threads:
// drizzle only asks for some types' text as is (dates, timestamps,
// intervals), so those are named by type id and the worker does the same.
import path from "node:path";
import { Worker } from "node:worker_threads";
import type { PGliteOptions, QueryOptions, Results, Transaction } from "@electric-sql/pglite";

type Pending = { resolve: (value: unknown) => void; reject: (err: Error) => void; caller: Error };

type ErrorData = { name: string; message: string; stack?: string; fields: Record<string, string | number | boolean | null> };

/** An error raised inside the worker: same message, name and PostgreSQL fields as PGlite's DatabaseError. */
export class PgliteWorkerError extends Error {
  code?: string;
  detail?: string;
  constraint?: string;
  table?: string;
  column?: string;
  severity?: string;
  workerStack?: string;
  constructor(data: ErrorData, callerStack?: string) {
    super(data.message);
    Object.assign(this, data.fields);
    this.name = data.name;
    this.workerStack = data.stack;
    // The caller's stack says which query of the app failed; the worker's is kept beside it.
    if (callerStack) this.stack = `${data.name}: ${data.message}\n${callerStack.split("\n").slice(1).join("\n")}`;
  }
}

/** The worker script, resolved from the app folder (never bundled). */
export function pgliteWorkerPath() {
  return path.join(/*turbopackIgnore: true*/ process.cwd(), "db", "pglite-worker.mjs");
}

/** A probe that only a parser returning its input unchanged gives back. */
const PROBE = "\u0000fourpatch-raw-probe";

const rawTypesOf = new WeakMap<object, number[]>();

function rawTypes(parsers: QueryOptions["parsers"]): number[] | undefined {
  if (!parsers) return undefined;
  const known = rawTypesOf.get(parsers);
  if (known) return known;
  const ids: number[] = [];
  for (const [key, parse] of Object.entries(parsers)) {
    if (parse(PROBE, Number(key)) !== PROBE) {
      throw new Error(`A type parser for type ${key} cannot run in the database thread; only "as text" parsers are supported.`);
    }
    ids.push(Number(key));
  }
  // drizzle keeps one parsers object per prepared query: judged once.
  rawTypesOf.set(parsers, ids);
  return ids;
}

function checkOptions(options: QueryOptions | undefined) {
  if (!options) return;
  if (options.serializers || options.blob || options.onNotice) {
    throw new Error("serializers, blob and onNotice are not supported by the database thread.");
  }
}

export class PgliteWorkerClient {
  private readonly worker: Worker;
  private readonly pending = new Map<number, Pending>();
  private seq = 0;
  private dead: Error | null = null;
  private closing: Promise<void> | null = null;

  /**
   * dataDir null: an in-memory database. onLost: the thread ended without
   * close() (an uncaught error in it); every pending and later call fails.
   */
  constructor(
    dataDir: string | null,
    options: PGliteOptions = {},
    private readonly onLost?: (err: Error) => void,
  ) {
    this.worker = new Worker(pgliteWorkerPath(), { workerData: { dataDir, options } });
    // Idle, the thread does not keep the process alive (as an in-process PGlite would not).
    this.worker.unref();
    this.worker.on("message", (msg: { id: number; ok: boolean; value?: unknown; error?: ErrorData }) => {
      const p = this.pending.get(msg.id);
      if (!p) return;
      this.settle(msg.id);
      if (msg.ok) p.resolve(msg.value);
      // The caller's stack is formatted only now: formatting it for every call would cost more than the query.
      else p.reject(new PgliteWorkerError(msg.error!, p.caller.stack));
    });
    this.worker.on("error", (err) => this.stop(err));
    this.worker.on("exit", (code) => this.stop(new Error(`The database thread stopped (exit code ${code}).`)));
  }

  private settle(id: number) {
    this.pending.delete(id);
    if (this.pending.size === 0) this.worker.unref();
  }

  private stop(err: Error) {
    if (!this.dead) {
      this.dead = this.closing ? new Error("The database is closed.") : err;
      if (!this.closing) this.onLost?.(err);
    }
    for (const [id, p] of this.pending) {
      this.pending.delete(id);
      p.reject(err);
    }
  }

  private call<T>(msg: Record<string, unknown>): Promise<T> {
    if (this.dead) return Promise.reject(this.dead);
    const id = ++this.seq;
    return new Promise<T>((resolve, reject) => {
      if (this.pending.size === 0) this.worker.ref();
      this.pending.set(id, { resolve: resolve as (v: unknown) => void, reject, caller: new Error() });
      this.worker.postMessage({ ...msg, id });
    });
  }

  private async runQuery<T>(txId: number | undefined, text: string, params: unknown[] | undefined, options: QueryOptions | undefined): Promise<Results<T>> {
    checkOptions(options);
    return this.call<Results<T>>({
      op: "query",
      txId,
      text,
      params: params ?? [],
      rowMode: options?.rowMode,
      rawTypes: rawTypes(options?.parsers),
      paramTypes: options?.paramTypes,
    });
  }

  private async runExec(txId: number | undefined, text: string, options: QueryOptions | undefined): Promise<Results[]> {
    checkOptions(options);
    return this.call<Results[]>({ op: "exec", txId, text });
  }

  /** Resolves when the database is open (rejects with the reason it could not be). */
  async waitReady(): Promise<void> {
    await this.call({ op: "exec", text: "select 1" });
  }

  query<T = Record<string, unknown>>(text: string, params?: unknown[], options?: QueryOptions): Promise<Results<T>> {
    return this.runQuery<T>(undefined, text, params, options);
  }

  exec(text: string, options?: QueryOptions): Promise<Results[]> {
    return this.runExec(undefined, text, options);
  }

  /**
   * A transaction held open in the worker while the callback runs here; its
   * queries go to that transaction by id. Commits when the callback returns,
   * rolls back when it throws or calls rollback().
   */
  async transaction<T>(callback: (tx: Transaction) => Promise<T>): Promise<T> {
    const txId = await this.call<number>({ op: "begin" });
    let closed = false;
    const ensureOpen = () => {
      if (closed) throw new Error("Transaction is closed");
    };
    const end = (commit: boolean) => {
      closed = true;
      return this.call<void>({ op: "end", txId, commit });
    };
    const tx = {
      query: async <R>(text: string, params?: unknown[], options?: QueryOptions) => {
        ensureOpen();
        return this.runQuery<R>(txId, text, params, options);
      },
      exec: async (text: string, options?: QueryOptions) => {
        ensureOpen();
        return this.runExec(txId, text, options);
      },
      sql: async () => {
        throw new Error("tx.sql is not supported by the database thread; use tx.query.");
      },
      listen: async () => {
        throw new Error("LISTEN is not supported by the database thread.");
      },
      rollback: async () => {
        ensureOpen();
        await end(false);
      },
      get closed() {
        return closed;
      },
    } as unknown as Transaction;
    let result: T;
    try {
      result = await callback(tx);
    } catch (err) {
      if (!closed) await end(false);
      throw err;
    }
    if (!closed) await end(true);
    return result;
  }

  /** PGlite's own dump of the data folder (after a CHECKPOINT), as a gzipped tar. */
  async dumpDataDir(compression: "gzip" | "none" | "auto" = "gzip"): Promise<Blob> {
    const { buffer, type } = await this.call<{ buffer: ArrayBuffer; type: string }>({ op: "dump", compression });
    return new Blob([buffer], { type });
  }

  /** Closes the database, then ends the thread. */
  close(): Promise<void> {
    this.closing ??= (async () => {
      try {
        if (!this.dead) await this.call({ op: "close" });
      } finally {
        await this.worker.terminate();
      }
    })();
    return this.closing;
  }
}
