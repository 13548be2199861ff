// The passes the signed-in member's shops hold (the shop's side), a page at
// a time: `?cursor=` from `nextCursor`.
import { pageShopPasses } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";
import { pageLimit } from "@/lib/api/cursor";

export const dynamic = "force-dynamic";

export const GET = route(async ({ req, session }) => {
  const q = new URL(req.url).searchParams;
  return pageShopPasses({ session, shopId: q.get("shopId") ?? undefined, now: new Date(), cursor: q.get("cursor"), limit: pageLimit(q.get("limit")) });
});
