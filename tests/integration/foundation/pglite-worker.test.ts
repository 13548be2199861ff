// PGlite in a worker thread (db/pglite-worker.mjs through db/pglite-client.ts)
// must behave as PGlite in the main thread does, through drizzle-orm/pglite:
// the same values for the same queries, PGlite's serialised transactions,
// rollbacks, and errors that carry PostgreSQL's fields. Each check runs on
// both clients side by side. (The rest of the integration suite runs on the
// worker too: it is the default, FOURPATCH_PGLITE_THREAD=worker.)
import { PGlite } from "@electric-sql/pglite";
import { asc, eq, sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/pglite";
import { bigint, boolean, date, integer, interval, jsonb, numeric, pgTable, real, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PgliteWorkerClient } from "@/db/pglite-client";

const probe = pgTable("probe", {
  id: uuid().primaryKey().defaultRandom(),
  name: text().notNull().unique(),
  at: timestamp({ withTimezone: true, mode: "date" }),
  atText: timestamp({ withTimezone: true, mode: "string" }),
  day: date({ mode: "string" }),
  amount: numeric({ precision: 10, scale: 2 }),
  n: integer(),
  big: bigint({ mode: "number" }),
  ratio: real(),
  flag: boolean(),
  data: jsonb().$type<Record<string, unknown>>(),
  tags: text().array(),
  span: interval(),
});

const schema = { probe };
const CREATE = `create table probe (
  id uuid primary key default gen_random_uuid(),
  name text not null unique,
  at timestamptz, at_text timestamptz, day date, amount numeric(10,2), n integer, big bigint,
  ratio real, flag boolean, data jsonb, tags text[], span interval)`;

const inProcess = new PGlite();
const worker = new PgliteWorkerClient(null);
const clients = { main: inProcess, worker } as const;
const dbs = {
  main: drizzle({ client: inProcess, schema, casing: "snake_case" }),
  worker: drizzle({ client: worker as unknown as PGlite, schema, casing: "snake_case" }),
};
type Db = (typeof dbs)["main"];
const both = async <T>(fn: (db: Db, kind: "main" | "worker") => Promise<T>) => ({ main: await fn(dbs.main, "main"), worker: await fn(dbs.worker, "worker") });

beforeAll(async () => {
  for (const c of Object.values(clients)) await c.exec(CREATE);
});

afterAll(async () => {
  await inProcess.close();
  await worker.close();
});

const row = {
  name: "Rivet",
  at: new Date("2026-03-14T09:26:53.589Z"),
  atText: "2026-03-14 09:26:53.589+01",
  day: "2024-02-29",
  amount: "1234.50",
  n: -42,
  big: 9_007_199_254_740_991,
  ratio: 0.25,
  flag: true,
  data: { depthMm: 4.2, grooves: ["inner", "centre"], nested: { none: null } },
  tags: ["winter", "a,b", 'quote"d'],
  span: "1 year 2 mons 3 days 04:05:06",
};

describe("PGlite in a worker thread, compared with PGlite in the main thread", () => {
  it("returns the same values for every column type through the query builder, raw SQL and exec", async () => {
    const inserted = await both((db) => db.insert(probe).values(row).returning());
    expect(inserted.worker.map(({ id: _id, ...r }) => r)).toEqual(inserted.main.map(({ id: _id, ...r }) => r));
    const [w] = inserted.worker;
    expect(w.at).toBeInstanceOf(Date);
    expect(w.at!.toISOString()).toBe("2026-03-14T09:26:53.589Z");
    expect(w.day).toBe("2024-02-29");
    expect(w.amount).toBe("1234.50");
    expect(w.big).toBe(9_007_199_254_740_991);
    expect(w.data).toEqual(row.data);

    const selected = await both((db) => db.select().from(probe).where(eq(probe.name, "Rivet")));
    expect(selected.worker.map(({ id: _id, ...r }) => r)).toEqual(selected.main.map(({ id: _id, ...r }) => r));
    // Partial selects and relational queries run in array mode with drizzle's own mapping.
    const partial = await both((db) => db.select({ day: probe.day, sum: sql<string>`${probe.amount} * 2`, span: probe.span }).from(probe));
    expect(partial.worker).toEqual(partial.main);

    const raw = await both(async (db) => (await db.execute(sql`select at, at_text, day, amount, big, data, tags, span, now() - now() as zero, null::int as nothing from probe`)).rows);
    expect(raw.worker).toEqual(raw.main);
    // Raw SQL keeps drizzle's choice: timestamps and dates as PostgreSQL's text.
    expect(typeof (raw.worker[0] as { at: unknown }).at).toBe("string");

    // PGlite's own parsers when nothing is asked (maintenance, dumps): dates become Date objects on both sides.
    const direct = { main: (await inProcess.query(`select at, big, tags from probe`)).rows, worker: (await worker.query(`select at, big, tags from probe`)).rows };
    expect(direct.worker).toEqual(direct.main);
    const execs = { main: await inProcess.exec(`select 1 as one; select 'two' as two`), worker: await worker.exec(`select 1 as one; select 'two' as two`) };
    expect(execs.worker.map((r) => r.rows)).toEqual(execs.main.map((r) => r.rows));
  });

  it("errors carry PostgreSQL's code, constraint and detail (a repeated unique name is 23505 on both)", async () => {
    const errors = await both(async (db) => {
      const err = (await db.insert(probe).values({ name: "Rivet" }).catch((e: unknown) => e)) as { cause?: Record<string, unknown> };
      return err.cause ?? {};
    });
    for (const cause of [errors.main, errors.worker]) {
      expect(cause.code).toBe("23505");
      expect(cause.constraint).toBe("probe_name_key");
    }
    for (const key of ["code", "constraint", "detail", "table", "severity", "message"]) expect(errors.worker[key]).toBe(errors.main[key]);
    expect(errors.worker).toBeInstanceOf(Error);
  });

  it("a transaction that throws, or calls rollback(), leaves nothing; a failed savepoint keeps the outer work", async () => {
    const after = await both(async (db) => {
      await db
        .transaction(async (tx) => {
          await tx.insert(probe).values({ name: "thrown" });
          throw new Error("stop");
        })
        .catch(() => {});
      await db
        .transaction(async (tx) => {
          await tx.insert(probe).values({ name: "rolled back" });
          tx.rollback();
        })
        .catch(() => {});
      await db.transaction(async (tx) => {
        await tx.insert(probe).values({ name: "outer" });
        await tx
          .transaction(async (inner) => {
            await inner.insert(probe).values({ name: "inner" });
            await inner.insert(probe).values({ name: "inner" }); // 23505 inside the savepoint
          })
          .catch(() => {});
      });
      // A failed statement the callback swallows aborts the transaction: its COMMIT fails, nothing is kept.
      const commitError = await db
        .transaction(async (tx) => {
          await tx.insert(probe).values({ name: "doomed" });
          await tx.execute(sql`select 1 / 0`).catch(() => {});
        })
        .then(
          () => null,
          (e: Error) => e.message,
        );
      const names = (await db.select({ name: probe.name }).from(probe).orderBy(asc(probe.name))).map((r) => r.name);
      return { names, commitError };
    });
    expect(after.worker).toEqual(after.main);
    expect([...after.worker.names].sort()).toEqual(["Rivet", "outer"].sort());
    expect(after.worker.commitError).not.toBeNull();
  });

  it("serialises transactions as PGlite does: a second one, and plain queries, wait until the first ends and then see its rows", async () => {
    const db = dbs.worker;
    const events: string[] = [];
    let releaseFirst!: () => void;
    const firstMayEnd = new Promise<void>((r) => (releaseFirst = r));
    let firstStarted!: () => void;
    const started = new Promise<void>((r) => (firstStarted = r));
    const first = db.transaction(async (tx) => {
      events.push("A begins");
      await tx.insert(probe).values({ name: "from A" });
      firstStarted();
      await firstMayEnd;
      events.push("A ends");
    });
    await started;
    const second = db.transaction(async (tx) => {
      events.push("B begins");
      const seen = await tx.select({ name: probe.name }).from(probe).where(eq(probe.name, "from A"));
      events.push(`B sees ${seen.length}`);
      await tx.insert(probe).values({ name: "from B" });
    });
    const plain = db
      .select({ name: probe.name })
      .from(probe)
      .where(eq(probe.name, "from A"))
      .then((r) => events.push(`plain sees ${r.length}`));
    // Give B and the plain query every chance to run early (they must not).
    await new Promise((r) => setTimeout(r, 150));
    events.push("releasing A");
    releaseFirst();
    await Promise.all([first, second, plain]);
    expect(events.slice(0, 3)).toEqual(["A begins", "releasing A", "A ends"]);
    expect(events).toContain("B sees 1");
    expect(events).toContain("plain sees 1");
    const n = await db.$count(probe);
    expect(n).toBe((await dbs.worker.select().from(probe)).length);

    // Many at once, each a read-modify-write: serialised, none lost.
    await db.insert(probe).values({ name: "counter", n: 0 });
    await Promise.all(
      Array.from({ length: 20 }, () =>
        db.transaction(async (tx) => {
          const [c] = await tx.select({ n: probe.n }).from(probe).where(eq(probe.name, "counter"));
          await tx.update(probe).set({ n: c.n! + 1 }).where(eq(probe.name, "counter"));
        }),
      ),
    );
    const [counter] = await db.select({ n: probe.n }).from(probe).where(eq(probe.name, "counter"));
    expect(counter.n).toBe(20);
  });

  it("keeps the calling thread free while a heavy query runs (PGlite in the main thread blocks it)", async () => {
    const heavy = `select count(*)::int as n from generate_series(1, 1000000) g where g % 7 = 3`;
    const ticksDuring = async (run: () => Promise<unknown>) => {
      let ticks = 0;
      const timer = setInterval(() => (ticks += 1), 5);
      await new Promise((r) => setTimeout(r, 20));
      ticks = 0;
      await run();
      clearInterval(timer);
      return ticks;
    };
    const main = await ticksDuring(() => inProcess.query(heavy));
    const off = await ticksDuring(() => worker.query(heavy));
    // In the main thread the whole query runs between two timer ticks; in the worker the timer keeps ticking.
    expect(main).toBe(0);
    expect(off).toBeGreaterThan(2);
  });

  it("refuses a type parser that would change values, rather than ignore it", async () => {
    await expect(worker.query("select 1 as one", [], { parsers: { 23: (v: string) => Number(v) * 2 } })).rejects.toThrow(/cannot run in the database thread/);
    expect((await worker.query("select 1 as one", [], { parsers: { 23: (v: string) => v } })).rows).toEqual([{ one: "1" }]);
  });

  it("a thread that ends without close() fails the pending and every later call with the reason, and reports it once", async () => {
    const lost: Error[] = [];
    const c = new PgliteWorkerClient(null, {}, (e) => lost.push(e));
    const pending = c.query("select 1");
    await (c as unknown as { worker: { terminate(): Promise<number> } }).worker.terminate();
    await expect(pending).rejects.toThrow(/database thread stopped/);
    await expect(c.query("select 1")).rejects.toThrow(/database thread stopped/);
    expect(lost).toHaveLength(1);
  });

  it("dumps the database as PGlite does (the backup), and refuses calls once closed", async () => {
    const dump = await worker.dumpDataDir("gzip");
    const restored = new PGlite({ loadDataDir: dump });
    expect((await restored.query(`select name from probe where name = 'Rivet'`)).rows).toEqual([{ name: "Rivet" }]);
    await restored.close();
    await worker.close();
    await expect(worker.query("select 1")).rejects.toThrow(/closed/);
  });
});
