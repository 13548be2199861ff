// The database's upkeep: an index behind every foreign key and the shop's
// "still visible" filter, statistics collected after migrations and by the
// daily job, and the stored end of a pass that the filter compares.
import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db, migrateDb } from "@/db";
import { dailyMaintenance } from "@/db/maintenance";
import { shopPass, treadCheck, treadReading } from "@/db/schema";
import { makeVehicle, insertPass } from "../passes/helpers";
import { makeShop, signUp } from "../../support/users";

type Row = Record<string, unknown>;
const rows = async <T = Row>(q: ReturnType<typeof sql>) => (await db.execute(q)).rows as T[];

describe("indexes", () => {
  it("every foreign key has an index that starts with its columns", async () => {
    await migrateDb();
    // Each foreign key's columns, in order, against each index's leading columns (pg_catalog, not the schema files).
    const fks = await rows<{ tbl: string; cols: string[]; name: string }>(sql`
      select c.conrelid::regclass::text as tbl, c.conname as name,
        array(select a.attname from unnest(c.conkey) with ordinality k(n, i) join pg_attribute a on a.attrelid = c.conrelid and a.attnum = k.n order by k.i)::text[] as cols
      from pg_constraint c join pg_namespace ns on ns.oid = c.connamespace
      where c.contype = 'f' and ns.nspname = 'public'`);
    const idx = await rows<{ tbl: string; cols: string[] }>(sql`
      select i.indrelid::regclass::text as tbl,
        array(select a.attname from unnest(i.indkey::int2[]) with ordinality k(n, p) join pg_attribute a on a.attrelid = i.indrelid and a.attnum = k.n order by k.p)::text[] as cols
      from pg_index i join pg_class t on t.oid = i.indrelid join pg_namespace ns on ns.oid = t.relnamespace where ns.nspname = 'public'`);
    expect(fks.length).toBeGreaterThan(20);
    const missing = fks.filter((fk) => !idx.some((i) => i.tbl === fk.tbl && fk.cols.every((c, n) => i.cols[n] === c))).map((fk) => `${fk.tbl}(${fk.cols.join(", ")})`);
    expect(missing).toEqual([]);
  });

  it("indexes the pass and service-entry columns the delete and notice paths filter by", async () => {
    const names = (await rows<{ indexname: string }>(sql`select indexname from pg_indexes where schemaname = 'public'`)).map((r) => r.indexname);
    for (const n of ["tread_check_pass_idx", "tread_check_service_entry_idx", "service_entry_pass_idx", "service_entry_set_idx", "shop_pass_shop_ended_idx", "shop_pass_notice_due_idx", "access_log_visit_uq"]) {
      expect(names).toContain(n);
    }
  });

  it("stores when a pass stopped: its end, or its revocation when earlier", async () => {
    const driver = await signUp();
    const shop = await makeShop({ owner: await signUp() });
    const { vehicle } = await makeVehicle(driver);
    const ends = new Date("2026-05-10T12:00:00Z");
    const p = await insertPass({ driver, shopId: shop.id, vehicleIds: [vehicle.id], startsAt: new Date("2026-05-01T00:00:00Z"), endsAt: ends });
    const read = async () => (await db.select({ endedAt: shopPass.endedAt }).from(shopPass).where(sql`${shopPass.id} = ${p.id}`))[0].endedAt;
    expect((await read()).toISOString()).toBe(ends.toISOString());
    const revoked = new Date("2026-05-03T08:00:00Z");
    await db.update(shopPass).set({ revokedAt: revoked }).where(sql`${shopPass.id} = ${p.id}`);
    expect((await read()).toISOString()).toBe(revoked.toISOString());
    // A revocation after the end does not move it.
    await db.update(shopPass).set({ revokedAt: new Date("2026-06-01T00:00:00Z") }).where(sql`${shopPass.id} = ${p.id}`);
    expect((await read()).toISOString()).toBe(ends.toISOString());
  });
});

describe("statistics", () => {
  // PostgreSQL keeps reltuples = -1 for a table that was never analysed or vacuumed (since 14).
  const reltuples = async (table: string) => Number((await rows<{ n: number }>(sql`select reltuples as n from pg_class where oid = ${table}::regclass`))[0].n);

  it("exist right after the migrations", async () => {
    await migrateDb();
    for (const t of ["tread_reading", "tread_check", "shop_pass", "access_log"]) expect(await reltuples(t)).toBeGreaterThanOrEqual(0);
  });

  it("the daily job refreshes them, so the planner knows how many readings there are", async () => {
    const driver = await signUp();
    const { vehicle, set, tires } = await makeVehicle(driver);
    const checks = await db
      .insert(treadCheck)
      .values(Array.from({ length: 30 }, (_, i) => ({ vehicleId: vehicle.id, setId: set.id, checkedOn: `2025-01-${String(i + 1).padStart(2, "0")}`, odometerKm: 1000 + i * 100 })))
      .returning({ id: treadCheck.id });
    await db.insert(treadReading).values(checks.flatMap((c) => tires.map((t) => ({ checkId: c.id, tireId: t.id, centreMm: 7 }))));
    const total = (await rows<{ n: number }>(sql`select count(*)::int as n from tread_reading`))[0].n;
    expect(total).toBeGreaterThanOrEqual(120);
    const res = await dailyMaintenance();
    expect(res.kind === "pglite" || res.kind === "pg").toBe(true);
    expect(await reltuples("tread_reading")).toBe(total);
  });
});
