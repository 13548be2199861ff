// Every integration test file gets its own fresh database with the real
// migrations applied: in-memory PGlite by default, or a new database on a
// real PostgreSQL server when FOURPATCH_TEST_PG_URL is set (see
// scripts/with-postgres.sh). The resend SDK's calls to the local fake are
// answered by the fake's real route handler (no server needed).
import pg from "pg";
import { afterAll, beforeAll } from "vitest";

process.env.FOURPATCH_DATA_DIR = "memory://";
process.env.BETTER_AUTH_URL = "http://fourpatch.test";
process.env.BETTER_AUTH_SECRET = "integration-tests-secret-0123456789abcdef";
process.env.FOURPATCH_AUTH_RATE_LIMIT = "off";
process.env.FOURPATCH_SCHEDULER = "off";
process.env.FOURPATCH_DEV_FAKES = "on";
// Every answer served from memory is computed again and compared (db/revision.ts): a write path that does not move a stamp fails its test.
process.env.FOURPATCH_CACHE_CHECK = "1";
delete process.env.DATABASE_URL;
// Process-wide singletons (db client, auth) must not leak from one test file into the next.
for (const key of ["__fourpatchDb", "__fourpatchMigrated", "__fourpatchAuth"]) delete (globalThis as Record<string, unknown>)[key];

const serverUrl = process.env.FOURPATCH_TEST_PG_URL;
let testDatabase: string | undefined;
if (serverUrl) {
  testDatabase = `fourpatch_test_${process.pid}_${Math.random().toString(36).slice(2, 10)}`;
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  await admin.query(`create database ${testDatabase}`);
  await admin.end();
  const url = new URL(serverUrl);
  url.pathname = `/${testDatabase}`;
  process.env.DATABASE_URL = url.href;
}
delete process.env.RESEND_API_KEY;
delete process.env.STRIPE_SECRET_KEY;

const realFetch = globalThis.fetch;
globalThis.fetch = (async (input: RequestInfo | URL, init?: RequestInit) => {
  const url = typeof input === "string" ? input : input instanceof URL ? input.href : input.url;
  if (url.startsWith("http://fourpatch.test/api/fake/resend/emails")) {
    const { POST } = await import("@/app/api/fake/resend/emails/route");
    return POST(new Request(url, init));
  }
  if (url.startsWith("http://fourpatch.test/")) throw new Error(`Integration tests do not serve ${url}`);
  return realFetch(input, init);
}) as typeof fetch;

beforeAll(async () => {
  const { migrateDb } = await import("@/db");
  await migrateDb();
});

afterAll(async () => {
  const { closeDb } = await import("@/db");
  await closeDb();
  if (serverUrl && testDatabase) {
    const admin = new pg.Client({ connectionString: serverUrl });
    await admin.connect();
    await admin.query(`drop database if exists ${testDatabase}`);
    await admin.end();
  }
});
