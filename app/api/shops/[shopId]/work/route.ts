// The shop's own record of the work it did; no logbook, no pass needed.
import { listShopWork } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";

export const dynamic = "force-dynamic";

export const GET = route<{ shopId: string }>(async ({ session, params }) => ({
  work: await listShopWork({ session, shopId: params.shopId }),
}));
