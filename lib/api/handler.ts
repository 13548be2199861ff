import "server-only";
// One wrapper for every route handler. Before the route's own code runs it
//  - refuses cross-site requests on state-changing methods (Origin and
//    Sec-Fetch-Site against the app's own address) and any body that is not
//    the route's declared type (JSON, or multipart for uploads), so an HTML
//    form on another site or port cannot act with a driver's cookie;
//  - refuses control characters in path segments and query strings (422
//    naming the parameter);
//  - resolves the session and applies the route's rate limit.
// parseJson() then reads the body with a byte limit and a depth limit and
// refuses hostile text anywhere in it. Every error has the one JSON shape.
import { NextResponse } from "next/server";
import { jsonBody } from "@/lib/json-text";
import type { z } from "zod";
import { sessionFromRequest, type Session } from "@/lib/auth/session";
import { requireSession } from "@/lib/auth/roles";
import { appUrl } from "@/lib/env";
import { AppError, errorBody, toAppError } from "@/lib/errors";
import { clientAddress } from "@/lib/peer";
import { hitLimit, RateLimitedError, type Limit } from "@/lib/rate-limit";
import { fieldErrors } from "@/lib/validation/fields";
import { findHostileText, hasHostileText, HOSTILE_TEXT_MESSAGE, jsonDepth } from "@/lib/validation/text";

type Params = Record<string, string | string[]>;

export type RouteContext<P extends Params> = { params: Promise<P> };

type HandlerArgs<P extends Params> = { req: Request; params: P; session: Session | null };

export type RouteOptions = {
  auth?: "required" | "optional";
  /** What a state-changing request may carry: JSON (default), a multipart upload, or a zip file (the import). */
  body?: "json" | "multipart" | "zip";
  /**
   * Skips the same-origin and content-type checks. Only for routes that a
   * browser never calls and that authenticate each request by a signature or
   * a shared secret instead of a cookie; say which and why.
   */
  crossSite?: { allowedBecause: string };
  /** Counted per client address (or per account when signed in, `by: "user"`). */
  rateLimit?: Limit & { by?: "client" | "user" };
};

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
export const MAX_JSON_BYTES = 256 * 1024;
const MAX_JSON_DEPTH = 32;

/** Refuses a state-changing request that a browser sent from another origin. */
export function assertSameOrigin(req: Request): void {
  const site = req.headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") {
    throw new AppError("forbidden", "This request came from another site and was refused.");
  }
  const origin = req.headers.get("origin");
  // Browsers send Origin with every POST, PUT, PATCH and DELETE; a request
  // without one is not a browser acting on someone's cookie.
  if (origin !== null && origin !== new URL(appUrl()).origin) {
    throw new AppError("forbidden", "This request came from another site and was refused.");
  }
}

function mediaType(req: Request): string | null {
  const ct = req.headers.get("content-type");
  return ct ? ct.split(";")[0].trim().toLowerCase() : null;
}

const MEDIA_TYPE = { json: "application/json", multipart: "multipart/form-data", zip: "application/zip" } as const;

function assertBodyType(req: Request, kind: keyof typeof MEDIA_TYPE): void {
  const type = mediaType(req);
  // No content type at all is fine for a request without a body (revoke, join…);
  // parseJson() refuses it where a body is needed.
  if (type === null) return;
  const wanted = MEDIA_TYPE[kind];
  if (type !== wanted) {
    throw new AppError("unsupported_type", `Send this request as ${wanted}.`, { _form: [`Content-Type must be ${wanted}.`] });
  }
}

function assertCleanUrl(req: Request, params: Params): void {
  for (const [name, value] of Object.entries(params)) {
    for (const v of Array.isArray(value) ? value : [value]) {
      if (hasHostileText(v)) throw new AppError("invalid", "The address holds characters that are not allowed.", { [name]: [HOSTILE_TEXT_MESSAGE] });
    }
  }
  for (const [name, value] of new URL(req.url).searchParams) {
    if (hasHostileText(name) || hasHostileText(value)) {
      throw new AppError("invalid", "The address holds characters that are not allowed.", { [hasHostileText(name) ? "_query" : name]: [HOSTILE_TEXT_MESSAGE] });
    }
  }
}

function errorResponse(err: unknown): Response {
  const e = toAppError(err);
  const headers: Record<string, string> = { "cache-control": "no-store" };
  if (e instanceof RateLimitedError) headers["retry-after"] = String(e.retryAfterSeconds);
  return NextResponse.json(errorBody(e, appUrl()), { status: e.status, headers });
}

export function route<P extends Params = Params>(fn: (args: HandlerArgs<P>) => Promise<Response | unknown>, options: RouteOptions = {}) {
  return async (req: Request, ctx?: RouteContext<P>): Promise<Response> => {
    try {
      if (!SAFE_METHODS.has(req.method) && !options.crossSite) {
        assertSameOrigin(req);
        assertBodyType(req, options.body ?? "json");
      }
      let params: P;
      try {
        params = (await ctx?.params) ?? ({} as P);
      } catch {
        // A malformed percent-encoding in the path.
        throw new AppError("invalid", "The address is not valid.", { _path: ["Malformed percent-encoding."] });
      }
      assertCleanUrl(req, params);
      const session = await sessionFromRequest(req);
      if ((options.auth ?? "required") === "required") requireSession(session);
      if (options.rateLimit) {
        const key = options.rateLimit.by === "user" && session ? `u:${session.user.id}` : `ip:${clientAddress(req.headers) ?? "unknown"}`;
        hitLimit(options.rateLimit, key);
      }
      const result = await fn({ req, params, session });
      if (result instanceof Response) return result;
      // Logbook JSON is private to its reader: never kept by a browser or proxy cache.
      return NextResponse.json(result ?? { ok: true }, { headers: { "cache-control": "private, no-store" } });
    } catch (err) {
      return errorResponse(err);
    }
  };
}

/** Reads a request body as bytes, refusing more than `maxBytes` without buffering the rest. */
export async function readBodyLimited(req: Request, maxBytes: number, tooLarge: () => AppError, field = "_form"): Promise<Uint8Array> {
  const declared = Number(req.headers.get("content-length") ?? "NaN");
  if (Number.isFinite(declared) && declared > maxBytes) throw tooLarge();
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    let next: ReadableStreamReadResult<Uint8Array>;
    try {
      next = await reader.read();
    } catch {
      // The client went away (or its connection broke) mid-body: a 4xx, not a
      // logged 500, and nothing was written since nothing had been read whole.
      throw new AppError("invalid", "The request ended before its body arrived whole. Nothing was saved; send it again.", { [field]: ["The body was cut off."] });
    }
    const { done, value } = next;
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => {});
      throw tooLarge();
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** Parses a JSON body with a zod schema, or throws a 4xx naming each field. */
export async function parseJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.output<S>> {
  if (mediaType(req) !== "application/json") {
    throw new AppError("unsupported_type", "Send this request as application/json.", { _form: ["Content-Type must be application/json."] });
  }
  const bytes = await readBodyLimited(req, MAX_JSON_BYTES, () => new AppError("too_large", "The request is too large.", { _form: ["At most 256 KB."] }));
  let body: unknown;
  try {
    body = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    throw new AppError("invalid", "The request body is not valid JSON.", { _form: ["Not valid JSON."] });
  }
  if (jsonDepth(body, MAX_JSON_DEPTH) > MAX_JSON_DEPTH) throw new AppError("invalid", "The request body is nested too deeply.", { _form: ["Nested too deeply."] });
  const hostile = findHostileText(body);
  if (hostile !== null) throw new AppError("invalid", "Some fields hold characters that are not allowed.", { [hostile]: [HOSTILE_TEXT_MESSAGE] });
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw new AppError("invalid", "Some fields need attention.", fieldErrors(parsed.error));
  return parsed.data;
}

/**
 * A JSON answer for an object that may be served many times (the answers
 * db/revision.ts keeps): its text is made once per object (lib/json-text.ts),
 * not per request. Same headers as route()'s own JSON answers.
 */
export function keptJsonResponse(value: object): Response {
  return new Response(jsonBody(value), { headers: { "content-type": "application/json", "cache-control": "private, no-store" } });
}

export const created = (body: unknown) => NextResponse.json(body, { status: 201, headers: { "cache-control": "private, no-store" } });
