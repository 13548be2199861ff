// `npm run reminders:run`: asks the running server to send due reminder
// e-mails now. It never opens the database itself (PGlite allows one
// process per data folder); the server does the work.
//   FOURPATCH_URL   the server (default: BETTER_AUTH_URL, else http://localhost:3000)
//   CRON_SECRET     the same secret the server was started with
const base = (process.env.FOURPATCH_URL || process.env.BETTER_AUTH_URL || "http://localhost:3000").replace(/\/$/, "");
const secret = process.env.CRON_SECRET;

if (!secret) {
  console.error("Set CRON_SECRET to the secret the server was started with (the route stays shut without one).");
  process.exit(1);
}

try {
  const res = await fetch(`${base}/api/cron/reminders`, { method: "POST", headers: { authorization: `Bearer ${secret}` } });
  const body = await res.text();
  if (!res.ok) {
    console.error(`The server answered ${res.status}: ${body}`);
    process.exitCode = 1;
  } else {
    const { summary } = JSON.parse(body) as { summary: { drivers: number; emails: number; items: number; failed: number } };
    console.log(`Reminder run: ${summary.drivers} driver(s) checked, ${summary.emails} e-mail(s) with ${summary.items} reminder(s) sent, ${summary.failed} failed.`);
  }
} catch (err) {
  console.error(`No server at ${base}: start it first (npm run dev or npm start). ${err instanceof Error ? err.message : ""}`);
  process.exitCode = 1;
}
export {};
