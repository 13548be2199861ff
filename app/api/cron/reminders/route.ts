// Runs the reminder e-mails on demand, for an external scheduler (when the
// app runs on PostgreSQL) and for `npm run reminders:run`. It runs inside
// this server process, so no second process opens the PGlite folder.
// Authorization: Bearer <CRON_SECRET>; without a configured secret the route stays shut.
import { createHash, timingSafeEqual } from "node:crypto";
import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { env } from "@/lib/env";
import { runReminderDeliveries } from "@/lib/reminders/run";

export const dynamic = "force-dynamic";

function authorised(req: Request): boolean {
  const secret = env().CRON_SECRET;
  const header = req.headers.get("authorization") ?? "";
  if (!secret || !header.startsWith("Bearer ")) return false;
  // Equal-length digests, so the comparison takes the same time whatever was sent.
  const a = createHash("sha256").update(header.slice(7)).digest();
  const b = createHash("sha256").update(secret).digest();
  return timingSafeEqual(a, b);
}

const run = route(async ({ req }) => {
  if (!authorised(req)) {
    return NextResponse.json({ error: { code: "unauthenticated", message: "A valid cron secret is required." } }, { status: 401, headers: { "www-authenticate": "Bearer" } });
  }
  const summary = await runReminderDeliveries({ now: new Date() });
  return NextResponse.json({ ok: true, summary });
}, {
  auth: "optional",
  // Called by schedulers, never by a browser: the CRON_SECRET bearer is the permission, not a cookie.
  crossSite: { allowedBecause: "authenticated by the CRON_SECRET bearer token" },
});

export const POST = run;
// Some hosted schedulers can only send GET.
export const GET = run;
