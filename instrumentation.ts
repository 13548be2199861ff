// Runs once when the server starts. The work is Node.js-only and lives in
// lib/server-start.ts, imported under the NEXT_RUNTIME test Next.js replaces
// at build time, so the Edge build of this file never sees it.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { startServer } = await import("./lib/server-start");
    await startServer();
  }
}
