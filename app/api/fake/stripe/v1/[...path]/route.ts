// The local fake of the Stripe API, for the stripe SDK when no real key is
// configured. The SDK always calls `<host>/v1/...`; next.config.mjs rewrites
// /v1/* here. Answers use Stripe's JSON and error shapes; a request without
// the app's own fake key is refused like Stripe refuses a bad key.
import { NextResponse } from "next/server";
import { reserveIdempotencyKey, settleIdempotencyKey } from "@/db/queries/fake-stripe";
import { fakeStripeKey } from "@/lib/billing/config";
import { usingFakeStripe } from "@/lib/env";
import {
  cancelSubscription,
  createCheckoutSession,
  createCustomer,
  FakeStripeError,
  getObject,
  listInvoices,
  listPrices,
  updateSubscription,
} from "@/lib/billing/fake/engine";
import { FormError, parseStripeForm } from "@/lib/billing/fake/form";

export const dynamic = "force-dynamic";

const MAX_BODY = 64 * 1024;

type Ctx = { params: Promise<{ path: string[] }> };

const err = (status: number, body: Record<string, unknown>) => NextResponse.json({ error: body }, { status });

async function dispatch(method: string, path: string[], params: Record<string, unknown>): Promise<unknown> {
  const p = path.join("/");
  let m: RegExpExecArray | null;
  if (method === "POST" && p === "customers") return createCustomer(params);
  if (method === "GET" && (m = /^customers\/([\w]+)$/.exec(p))) return getObject("customer", m[1]!);
  if (method === "GET" && p === "prices") return listPrices(params);
  if (method === "GET" && (m = /^prices\/([\w]+)$/.exec(p))) return getObject("price", m[1]!);
  if (method === "POST" && p === "checkout/sessions") return createCheckoutSession(params);
  if (method === "GET" && (m = /^checkout\/sessions\/([\w]+)$/.exec(p))) return getObject("checkout.session", m[1]!, "checkout session");
  if (method === "GET" && (m = /^subscriptions\/([\w]+)$/.exec(p))) return getObject("subscription", m[1]!);
  if (method === "POST" && (m = /^subscriptions\/([\w]+)$/.exec(p))) return updateSubscription(m[1]!, params);
  if (method === "DELETE" && (m = /^subscriptions\/([\w]+)$/.exec(p))) return cancelSubscription(m[1]!);
  if (method === "GET" && p === "invoices") return listInvoices(params);
  if (method === "GET" && (m = /^invoices\/([\w]+)$/.exec(p))) return getObject("invoice", m[1]!);
  throw new FakeStripeError(404, { type: "invalid_request_error", message: `Unrecognized request URL (${method}: /v1/${p}). This local fake implements only what Fourpatch calls.` });
}

async function handle(req: Request, ctx: Ctx): Promise<Response> {
  if (!usingFakeStripe()) return NextResponse.json({ message: "Not found" }, { status: 404 });
  const auth = req.headers.get("authorization") ?? "";
  const key = auth.startsWith("Bearer ") ? auth.slice(7).trim() : "";
  if (key !== fakeStripeKey()) {
    const shown = key ? `${key.slice(0, 8)}${"*".repeat(Math.max(0, key.length - 12))}${key.slice(-4)}` : "";
    return err(401, { type: "invalid_request_error", message: key ? `Invalid API Key provided: ${shown}` : "You did not provide an API key." });
  }
  const method = req.method.toUpperCase();
  const { path } = await ctx.params;
  let params: Record<string, unknown>;
  try {
    if (method === "GET" || method === "DELETE") {
      params = parseStripeForm(new URL(req.url).searchParams);
    } else {
      const type = (req.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
      if (type !== "application/x-www-form-urlencoded") return err(400, { type: "invalid_request_error", message: "Invalid request: the body must be application/x-www-form-urlencoded." });
      const declared = Number(req.headers.get("content-length") ?? 0);
      if (declared > MAX_BODY) return err(413, { type: "invalid_request_error", message: "Request body too large." });
      const text = await req.text();
      if (text.length > MAX_BODY) return err(413, { type: "invalid_request_error", message: "Request body too large." });
      params = parseStripeForm(text);
    }
  } catch (e) {
    if (e instanceof FormError) return err(400, { type: "invalid_request_error", code: "parameter_invalid", message: e.message, param: e.param });
    throw e;
  }

  const idemKey = method === "POST" ? req.headers.get("idempotency-key") : null;
  if (idemKey) {
    if (idemKey.length > 255) return err(400, { type: "invalid_request_error", message: "Idempotency-Key is too long (255 characters at most)." });
    const seen = await reserveIdempotencyKey({ apiKey: key, key: idemKey });
    if (seen) {
      if (seen.status === 0) return err(409, { type: "idempotency_error", message: "There is currently another in-progress request using this Idempotent Key (that probably means you submitted twice, and the other request is still going through): please try again later." });
      return NextResponse.json(seen.body, { status: seen.status, headers: { "idempotent-replayed": "true" } });
    }
  }
  let status = 200;
  let body: unknown;
  try {
    body = await dispatch(method, path, params);
  } catch (e) {
    if (!(e instanceof FakeStripeError)) {
      console.error(e);
      status = 500;
      body = { error: { type: "api_error", message: "The local Stripe fake failed; see the server log." } };
    } else {
      status = e.status;
      body = { error: e.body };
    }
  }
  if (idemKey) await settleIdempotencyKey({ apiKey: key, key: idemKey, status, body });
  return NextResponse.json(body, { status, headers: { "request-id": `req_fake_${Date.now().toString(36)}` } });
}

export const GET = handle;
export const POST = handle;
export const DELETE = handle;
