import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";

describe("the database under test", () => {
  it("is the server the run asked for: a fresh PostgreSQL database when FOURPATCH_TEST_PG_URL is set, PGlite otherwise", async () => {
    const [row] = (await db.execute<{ version: string; name: string }>(sql`select version() as version, current_database() as name`)).rows;
    expect(row.version).toMatch(/^PostgreSQL \d+/);
    if (process.env.FOURPATCH_TEST_PG_URL) expect(row.name).toMatch(/^fourpatch_test_/);
    else expect(row.name).toBe("postgres");
  });

  it("has every migration applied (the drizzle journal matches the tables)", async () => {
    const tables = (await db.execute<{ t: string }>(sql`select table_name as t from information_schema.tables where table_schema = 'public'`)).rows.map((r) => r.t);
    for (const t of ["user", "session", "organization", "member", "vehicle", "tire_set", "tire", "tread_check", "shop_pass", "access_log", "reminder_feed", "fake_outbox"]) {
      expect(tables).toContain(t);
    }
  });
});
