// The driver's reminder feed, for calendar apps: GET /api/feed/<secret>(.ics).
// No session: the secret is the key. Unknown, malformed and revoked secrets
// get the same bare 404, so the answer tells a guesser nothing.
// Calendar apps poll: the answer carries an ETag (a hash of what the feed
// says) and Last-Modified (when that content first appeared), and a poll
// whose validators still match gets 304 without a body. Nothing is written
// per poll: the content's tag only when it changes, the fetch time hourly.
import { createHash } from "node:crypto";
import { computeFor, feedForToken, noteFeedContent, reminderProfile } from "@/db/queries/reminders";
import { driverStamp, underStamp } from "@/db/revision";
import { todayIn } from "@/lib/reminders/describe";
import { buildFeed } from "@/lib/reminders/feed";
import { tokenFromPath } from "@/lib/reminders/token";
import { planAllows } from "@/lib/plan";
import { appUrl } from "@/lib/env";
import { clientAddress } from "@/lib/peer";
import { hitLimit, LIMITS, RateLimitedError } from "@/lib/rate-limit";

export const dynamic = "force-dynamic";

const notFound = () =>
  new Response("Not found\n", { status: 404, headers: { "content-type": "text/plain; charset=utf-8", "cache-control": "no-store" } });

/** RFC 9110 §13.1.2: If-None-Match is a list of entity tags (or *); weak comparison. */
function matchesAny(header: string | null, etag: string): boolean {
  if (!header) return false;
  if (header.trim() === "*") return true;
  const bare = etag.replace(/^W\//, "");
  return header.split(",").some((t) => t.trim().replace(/^W\//, "") === bare);
}

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
  const now = new Date();
  const feed = await feedForToken({ token, now });
  if (!feed) return notFound();
  // The stamp is read before anything is computed, beside the profile (which is part of the key).
  const [profile, stamp] = await Promise.all([reminderProfile({ userId: feed.userId }), driverStamp(feed.userId)]);
  if (!profile) return notFound();
  // "Today" is the driver's own date: it decides what is overdue.
  const today = todayIn(profile.timezone, now);
  const baseUrl = appUrl();
  const alarms = planAllows({ plan: profile.plan, feature: "alarms" }) ? profile.settings.alarmLeadDays : [];
  // The reminders are computed again only when the driver's logbooks, names or settings changed (db/revision.ts).
  const inputs = JSON.stringify({ today, plan: profile.plan, timezone: profile.timezone, jurisdiction: profile.jurisdiction, settings: profile.settings, baseUrl });
  const { items, tag } = await underStamp(`feed|${profile.userId}|${inputs}`, stamp, async () => {
    const { items } = await computeFor({ profile, today });
    // Everything the body is made of, except the stamp (which follows the content's time).
    const tag = createHash("sha256")
      .update(JSON.stringify({ v: 1, items, plan: profile.plan, timezone: profile.timezone, alarms, baseUrl }))
      .digest("base64url")
      .slice(0, 32);
    return { items, tag };
  });
  const changedAt = await noteFeedContent({ feed, tag, now });
  const etag = `"${tag}"`;
  const validators = {
    etag,
    "last-modified": changedAt.toUTCString(),
    "cache-control": "private, max-age=0, must-revalidate",
    "referrer-policy": "no-referrer",
    "x-robots-tag": "noindex",
  };
  const ifNoneMatch = req.headers.get("if-none-match");
  const ifModifiedSince = req.headers.get("if-modified-since");
  // RFC 9110 §13.2.2: If-None-Match decides when present; If-Modified-Since only without it.
  const notModified = ifNoneMatch
    ? matchesAny(ifNoneMatch, etag)
    : ifModifiedSince != null && !Number.isNaN(Date.parse(ifModifiedSince)) && changedAt.getTime() <= Date.parse(ifModifiedSince);
  if (notModified) return new Response(null, { status: 304, headers: validators });

  // The same content at the same time is the same bytes: kept beside the items.
  const body = await underStamp(`feed-body|${tag}|${changedAt.getTime()}|${JSON.stringify(profile.settings.alarmLeadDays)}`, "fixed", async () =>
    buildFeed({
      items,
      plan: profile.plan,
      timezone: profile.timezone,
      alarmLeadDays: profile.settings.alarmLeadDays,
      baseUrl,
      // DTSTAMP follows the content, so the same content is the same bytes.
      now: changedAt,
    }),
  );
  return new Response(body, {
    status: 200,
    headers: {
      ...validators,
      "content-type": "text/calendar; charset=utf-8",
      "content-disposition": 'inline; filename="fourpatch-reminders.ics"',
    },
  });
}
