// `npm run db:seed`: applies migrations and loads the demo into the data
// folder. Takes the data-folder lock, so it refuses to run beside a server.
process.env.FOURPATCH_EMAIL_DELIVERY ??= "skip";
const { closeDb, migrateDb } = await import("@/db");
const { seedDemo } = await import("@/db/seed");
const { afterBulkChange } = await import("@/db/maintenance");
const { demoAccounts, DEMO_PASSWORD } = await import("@/db/seed/accounts");

try {
  await migrateDb();
  const today = process.env.FOURPATCH_TODAY ?? new Date().toISOString().slice(0, 10);
  await seedDemo({ today });
  await afterBulkChange();
  console.log(`Demo loaded (dates relative to ${today}). Accounts, all with the password "${DEMO_PASSWORD}":`);
  for (const a of Object.values(demoAccounts)) console.log(`  ${a.email.padEnd(28)} ${a.role}`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exitCode = 1;
} finally {
  await closeDb();
}
export {};
