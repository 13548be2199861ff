// The driver's reminder feed, for calendar apps: GET /api/feed/<secret>(.ics).
// No session: the secret is the key. Unknown, malformed and revoked secrets
// get the same bare 404, so the answer tells a guesser nothing.
import { computeFor, reminderProfile, userForFeedToken } from "@/db/queries/reminders";
import { todayIn } from "@/lib/reminders/describe";
import { buildFeed } from "@/lib/reminders/feed";
import { tokenFromPath } from "@/lib/reminders/token";
import { appUrl } from "@/lib/env";
import { clientAddress } from "@/lib/peer";
import { hitLimit, LIMITS, RateLimitedError } from "@/lib/rate-limit";

export const dynamic = "force-dynamic";

const notFound = () =>
  new Response("Not found\n", { status: 404, headers: { "content-type": "text/plain; charset=utf-8", "cache-control": "no-store" } });

export async function GET(req: Request, ctx: { params: Promise<{ token: string }> }) {
  // Calendar apps poll a few times an hour; a guesser trying secrets is held back by its real address.
  try {
    hitLimit(LIMITS.feed, `ip:${clientAddress(req.headers) ?? "unknown"}`);
  } catch (err) {
    if (!(err instanceof RateLimitedError)) throw err;
    return new Response("Too many requests\n", { status: 429, headers: { "content-type": "text/plain; charset=utf-8", "retry-after": String(err.retryAfterSeconds) } });
  }
  let segment: string;
  try {
    segment = (await ctx.params).token;
  } catch {
    return notFound();
  }
  const token = tokenFromPath(segment);
  if (!token) return notFound();
  const userId = await userForFeedToken({ token });
  if (!userId) return notFound();
  const now = new Date();
  const profile = await reminderProfile({ userId });
  if (!profile) return notFound();
  // "Today" is the driver's own date: it decides what is overdue.
  const { items } = await computeFor({ profile, today: todayIn(profile.timezone, now) });
  const body = buildFeed({
    items,
    plan: profile.plan,
    timezone: profile.timezone,
    alarmLeadDays: profile.settings.alarmLeadDays,
    baseUrl: appUrl(),
    now,
  });
  return new Response(body, {
    status: 200,
    headers: {
      "content-type": "text/calendar; charset=utf-8",
      "content-disposition": 'inline; filename="fourpatch-reminders.ics"',
      "cache-control": "private, max-age=0, must-revalidate",
      "referrer-policy": "no-referrer",
      "x-robots-tag": "noindex",
    },
  });
}
