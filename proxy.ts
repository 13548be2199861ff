// Runs before every page (not the API: see the matcher): security headers
// with a fresh CSP nonce (Next reads the nonce from the request's CSP header
// and puts it on its own scripts), and a clean 403 for a server action posted
// from another origin.
import { NextResponse, type NextRequest } from "next/server";
import { isForeignServerAction, newNonce, securityHeaders } from "@/lib/security-headers";

export function proxy(req: NextRequest) {
  if (isForeignServerAction(req)) {
    return NextResponse.json(
      { error: { code: "forbidden", message: "This request came from another site and was refused." } },
      { status: 403, headers: { "cache-control": "no-store" } },
    );
  }
  const nonce = newNonce();
  const https = (process.env.BETTER_AUTH_URL ?? "").startsWith("https:") || req.nextUrl.protocol === "https:";
  const headers = securityHeaders({ nonce, https, dev: process.env.NODE_ENV !== "production" });
  const requestHeaders = new Headers(req.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", headers["content-security-policy"]);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  for (const [k, v] of Object.entries(headers)) res.headers.set(k, v);
  return res;
}

export const config = {
  // Static build files and API answers (JSON, files and feeds: no page, no
  // script) carry fixed headers from next.config.mjs instead.
  matcher: ["/((?!_next/static|_next/image|api/).*)"],
};
