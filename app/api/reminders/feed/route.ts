// The signed-in driver's feed secret: POST makes a new one (the old URL
// dies), DELETE revokes it, GET says whether one is live. The secret is
// returned once, at creation; only its hash is kept.
import { activeFeedOf, regenerateFeed, revokeFeed } from "@/db/queries/reminders";
import { created, route } from "@/lib/api/handler";
import { requireSession } from "@/lib/auth/roles";
import { appUrl } from "@/lib/env";
import { feedUrls } from "@/lib/reminders/token";

export const GET = route(async ({ session }) => {
  const s = requireSession(session);
  return { feed: await activeFeedOf({ userId: s.user.id }) };
});

export const POST = route(async ({ session }) => {
  const s = requireSession(session);
  const token = await regenerateFeed({ userId: s.user.id });
  return created({ token, urls: feedUrls(token, appUrl()) });
});

export const DELETE = route(async ({ session }) => {
  const s = requireSession(session);
  await revokeFeed({ userId: s.user.id });
  return { ok: true };
});
