// The passes the signed-in member's shops hold (the shop's side).
import { listShopPasses } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";

export const dynamic = "force-dynamic";

export const GET = route(async ({ req, session }) => {
  const shopId = new URL(req.url).searchParams.get("shopId") ?? undefined;
  return { passes: await listShopPasses({ session, shopId, now: new Date() }) };
});
