// Child process for the data-folder lock test: opens a PGlite folder, writes
// a row, reports "ready", and holds the folder until told to stop.
process.env.FOURPATCH_DATA_DIR = process.argv[2];
const { db, migrateDb, closeDb } = await import("@/db");
const { sql } = await import("drizzle-orm");
await migrateDb();
await db.execute(sql`create table if not exists lock_probe (v text)`);
await db.execute(sql`insert into lock_probe values ('written by the first process')`);
process.stdout.write("ready\n");
process.stdin.on("data", async () => {
  await closeDb();
  process.exit(0);
});
export {};
