import { NextResponse } from "next/server";
import { exportAccount } from "@/db/queries/account";
import { route } from "@/lib/api/handler";

export const dynamic = "force-dynamic";

/** GET: the signed-in account's whole logbook as a JSON download. */
export const GET = route(async ({ session }) => {
  const data = await exportAccount({ userId: session!.user.id });
  const day = data.exportedAt.slice(0, 10);
  return new NextResponse(JSON.stringify(data, null, 2), {
    headers: {
      "content-type": "application/json; charset=utf-8",
      "content-disposition": `attachment; filename="fourpatch-logbook-${day}.json"`,
      "cache-control": "no-store",
    },
  });
});
