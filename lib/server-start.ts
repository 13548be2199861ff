// Runs once when the Node.js server starts (instrumentation.ts): refuse an
// unsafe configuration, stamp requests with their peer address, apply
// migrations before any request, then start the daily jobs.
export async function startServer() {
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  const { installPeerStamp } = await import("./peer");
  installPeerStamp();
  try {
    const { assertFakesConfigured } = await import("./dev-fakes");
    assertFakesConfigured([
      { name: "e-mail", realKeyVar: "RESEND_API_KEY" },
      { name: "payments", realKeyVar: "STRIPE_SECRET_KEY" },
    ]);
    const { migrateDb } = await import("@/db");
    await migrateDb();
  } catch (err) {
    // A server that cannot serve safely (a fake left reachable, a data folder
    // held by another process) stops with the reason instead of answering 500s.
    console.error(`\n${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(1);
  }
  const { startScheduler } = await import("./scheduler");
  startScheduler();
}
