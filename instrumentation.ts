// Runs once when the server starts: apply migrations before any request.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  const { migrateDb } = await import("./db");
  await migrateDb();
  const { startScheduler } = await import("./lib/scheduler");
  startScheduler();
}
