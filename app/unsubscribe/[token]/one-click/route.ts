// RFC 8058 one-click unsubscribe: mail programs POST
// "List-Unsubscribe=One-Click" here. A GET (a person following the header
// by hand) goes to the confirm page instead, which changes nothing by itself.
import { optOut } from "@/db/queries/reminders";
import { route } from "@/lib/api/handler";
import { verifyUnsubscribe } from "@/lib/email/unsubscribe";
import { appUrl } from "@/lib/env";

type P = { token: string };

const notFound = () => new Response("Not found\n", { status: 404, headers: { "content-type": "text/plain; charset=utf-8" } });

export const POST = route<P>(
  async ({ params }) => {
    // Next has already decoded the segment; a token is base64url and a dot, nothing else.
    const v = /^[A-Za-z0-9_.-]{1,512}$/.test(params.token) ? verifyUnsubscribe(params.token) : null;
    if (!v) return notFound();
    await optOut(v);
    return new Response("Unsubscribed.\n", { status: 200, headers: { "content-type": "text/plain; charset=utf-8" } });
  },
  {
    auth: "optional",
    // Mail programs post a form from outside the site; the signed token is the permission (RFC 8058), not a cookie.
    crossSite: { allowedBecause: "RFC 8058 one-click: authenticated by the HMAC-signed token in the path" },
  },
);

export const GET = route<P>(
  async ({ params }) => {
    if (!/^[A-Za-z0-9_.-]{1,512}$/.test(params.token)) return notFound();
    return Response.redirect(new URL(`/unsubscribe/${params.token}`, appUrl()), 303);
  },
  { auth: "optional" },
);
