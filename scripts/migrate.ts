// `npm run db:migrate`: applies pending migrations (takes the data-folder lock).
const { closeDb, migrateDb } = await import("@/db");
try {
  await migrateDb();
  console.log("Migrations applied.");
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exitCode = 1;
} finally {
  await closeDb();
}
export {};
