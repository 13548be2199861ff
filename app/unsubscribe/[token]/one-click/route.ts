// RFC 8058 one-click unsubscribe: mail programs POST
// "List-Unsubscribe=One-Click" here. A GET (a person following the header
// by hand) goes to the confirm page instead, which changes nothing by itself.
import { optOut } from "@/db/queries/reminders";
import { verifyUnsubscribe } from "@/lib/email/unsubscribe";
import { appUrl } from "@/lib/env";

type Ctx = { params: Promise<{ token: string }> };

export async function POST(_req: Request, ctx: Ctx) {
  const v = verifyUnsubscribe(decodeURIComponent((await ctx.params).token));
  if (!v) return new Response("Not found\n", { status: 404, headers: { "content-type": "text/plain; charset=utf-8" } });
  await optOut(v);
  return new Response("Unsubscribed.\n", { status: 200, headers: { "content-type": "text/plain; charset=utf-8" } });
}

export async function GET(_req: Request, ctx: Ctx) {
  const { token } = await ctx.params;
  return Response.redirect(new URL(`/unsubscribe/${token}`, appUrl()), 303);
}
