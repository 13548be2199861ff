import "server-only";
// The better-auth endpoints reachable over HTTP. The library serves many
// more (organization create/update/delete, member and invitation
// management, admin impersonation, user updates…); the product uses only the
// ones below from the browser, and does everything else through its own
// validated routes calling `auth.api` on the server. Anything not listed is a
// 404. Operators may not impersonate anyone: the endpoint is not reachable
// and no code calls it (see README: Security).
import { AppError } from "@/lib/errors";
import { clientAddress } from "@/lib/peer";
import { accountLockedFor, hitLimit, recordAccountFailure, recordAccountSuccess } from "@/lib/rate-limit";
import { findHostileText, HOSTILE_TEXT_MESSAGE, isSingleLine } from "@/lib/validation/text";

/** The header better-auth's own rate limiter reads the client's address from (lib/auth/server.ts). */
export const CLIENT_ADDRESS_HEADER = "x-fourpatch-client";

const ALLOWED: Record<string, (path: string) => boolean> = {
  GET: (p) => p === "/get-session" || p === "/ok" || p === "/error" || p === "/verify-email" || /^\/reset-password\/[A-Za-z0-9_-]{1,200}$/.test(p),
  POST: (p) =>
    ["/sign-in/email", "/sign-up/email", "/sign-out", "/request-password-reset", "/reset-password", "/send-verification-email"].includes(p),
};

export function isAllowedAuthEndpoint(method: string, path: string): boolean {
  return ALLOWED[method]?.(path) ?? false;
}

const MAX_AUTH_BODY = 16 * 1024;
// Each reset and each accepted sign-up answer takes at least this long,
// whether or not the address has an account.
const floors = { resetMs: 400, signUpMs: 400 };

/** Only for the property tests, which send hundreds of sign-ups and would otherwise wait minutes. */
export function setAuthTimingFloorsForTests(next: Partial<typeof floors>) {
  Object.assign(floors, next);
}
const RESET_PER_ADDRESS = { name: "reset-address", max: 3, windowMs: 60 * 60_000 };
const VERIFY_PER_ADDRESS = { name: "verify-address", max: 3, windowMs: 60 * 60_000 };

async function atLeast(started: number, ms: number) {
  const left = ms - (Date.now() - started);
  if (left > 0) await new Promise((r) => setTimeout(r, left));
}

const json = (status: number, body: unknown, headers: Record<string, string> = {}) =>
  Response.json(body, { status, headers: { "cache-control": "no-store", ...headers } });

// The app's error shape, with the library's top-level code and message beside
// it so that the browser's auth client shows the message too.
const errorJson = (e: AppError, headers?: Record<string, string>) =>
  json(e.status, { code: e.code.toUpperCase(), message: e.safeMessage, error: { code: e.code, message: e.safeMessage, ...(e.fields ? { fields: e.fields } : {}) } }, headers);

/**
 * Wraps better-auth's Next.js handler: refuses endpoints the product does
 * not use, hostile text, and password guessing against one account (with a
 * growing wait), and hands better-auth the client's real address for its
 * per-address limits.
 */
export function guardAuthHandler(handler: (req: Request) => Promise<Response>) {
  return async (req: Request): Promise<Response> => {
    const url = new URL(req.url);
    const path = url.pathname.replace(/^\/api\/auth/, "") || "/";
    if (!isAllowedAuthEndpoint(req.method, path)) return json(404, { error: { code: "not_found", message: "Not found." } });
    for (const [k, v] of url.searchParams) {
      const hostile = findHostileText({ [k]: v });
      if (hostile !== null) return errorJson(new AppError("invalid", "The address holds characters that are not allowed.", { [hostile]: [HOSTILE_TEXT_MESSAGE] }));
    }
    const headers = new Headers(req.headers);
    headers.delete(CLIENT_ADDRESS_HEADER);
    const client = clientAddress(req.headers);
    if (client) headers.set(CLIENT_ADDRESS_HEADER, client);
    if (req.method !== "POST") return handler(new Request(req.url, { method: req.method, headers }));

    const declared = Number(req.headers.get("content-length") ?? "0");
    if (declared > MAX_AUTH_BODY) return errorJson(new AppError("too_large", "The request is too large."));
    const text = await req.text();
    if (text.length > MAX_AUTH_BODY) return errorJson(new AppError("too_large", "The request is too large."));
    let body: Record<string, unknown> = {};
    if (text) {
      try {
        const parsed = JSON.parse(text) as unknown;
        if (parsed && typeof parsed === "object" && !Array.isArray(parsed)) body = parsed as Record<string, unknown>;
      } catch {
        return errorJson(new AppError("invalid", "The request body is not valid JSON."));
      }
    }
    const hostile = findHostileText(body);
    if (hostile !== null) return errorJson(new AppError("invalid", "Some fields hold characters that are not allowed.", { [hostile]: [HOSTILE_TEXT_MESSAGE] }));
    if (path === "/sign-up/email" && typeof body.name === "string" && (!isSingleLine(body.name) || body.name.trim().length > 80)) {
      return errorJson(new AppError("invalid", "Use a name of at most 80 characters on one line.", { name: ["At most 80 characters, one line."] }));
    }
    const email = typeof body.email === "string" ? body.email.trim().toLowerCase() : "";
    const forward = () => handler(new Request(req.url, { method: "POST", headers, body: text }));

    if (path === "/sign-in/email" && email) {
      const wait = accountLockedFor(email);
      if (wait > 0) {
        const s = Math.ceil(wait / 1000);
        return errorJson(new AppError("rate_limited", `Too many wrong passwords for this account. Try again in ${s} seconds.`), { "retry-after": String(s) });
      }
      const res = await forward();
      if (res.status === 401) recordAccountFailure(email);
      else if (res.ok) recordAccountSuccess(email);
      return res;
    }

    if (path === "/request-password-reset") {
      // The same answer, after the same time, whether or not the address has
      // an account; at most three reset e-mails an hour to one address.
      const started = Date.now();
      let res: Response;
      try {
        if (email) hitLimit(RESET_PER_ADDRESS, email);
        res = await forward();
      } catch {
        res = json(200, { status: true, message: "If this email exists in our system, check your email for the reset link" });
      }
      await atLeast(started, floors.resetMs);
      return res;
    }

    if (path === "/sign-up/email") {
      // The library answers an existing address with a made-up user whose
      // fields differ in small ways (a plugin's defaults): the browser needs
      // none of it, so every accepted sign-up gets the same constant answer.
      const started = Date.now();
      const res = await forward();
      // A new address writes a few rows more than a known one; every mail is sent unawaited.
      await atLeast(started, floors.signUpMs);
      if (!res.ok) return res;
      return json(200, { token: null, user: null, status: "check-your-inbox" });
    }

    if (path === "/send-verification-email") {
      // "Send the link again": the library answers the same for any address
      // (with its own time floor); at most three links an hour to one address.
      try {
        if (email) hitLimit(VERIFY_PER_ADDRESS, email);
      } catch {
        await new Promise((r) => setTimeout(r, 500));
        return json(200, { status: true });
      }
      return forward();
    }
    return forward();
  };
}
