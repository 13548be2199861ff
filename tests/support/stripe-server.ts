// A tiny HTTP server on the loopback that serves the app's own route handlers
// for the stripe SDK: /v1/* (the local Stripe fake) and the webhook route.
// The SDK talks to it over real HTTP, exactly as it talks to Stripe; the fake
// sends its signed webhooks to it too. Webhooks can be held back to replay
// them later in another order.
import http from "node:http";
import type { AddressInfo } from "node:net";
import { resetStripeClientForTests } from "@/lib/billing/stripe";

export type HeldWebhook = { body: string; signature: string; type: string; id: string };

export type FakeStripeServer = {
  base: string;
  /** "forward" (default) passes webhooks to the route; "hold" keeps them in `held`. */
  mode: "forward" | "hold";
  held: HeldWebhook[];
  close: () => Promise<void>;
};

export async function startFakeStripeServer(): Promise<FakeStripeServer> {
  const fake = await import("@/app/api/fake/stripe/v1/[...path]/route");
  const webhook = await import("@/app/api/stripe/webhook/route");
  const state: FakeStripeServer = { base: "", mode: "forward", held: [], close: async () => {} };

  const server = http.createServer(async (req, res) => {
    try {
      const chunks: Buffer[] = [];
      for await (const c of req) chunks.push(c as Buffer);
      const body = Buffer.concat(chunks);
      const url = new URL(req.url ?? "/", state.base);
      const headers = new Headers();
      for (const [k, v] of Object.entries(req.headers)) if (typeof v === "string") headers.set(k, v);
      const request = new Request(url, { method: req.method, headers, body: ["GET", "HEAD", "DELETE"].includes(req.method ?? "") && body.length === 0 ? undefined : body });
      let response: Response;
      if (url.pathname.startsWith("/v1/")) {
        const handler = { GET: fake.GET, POST: fake.POST, DELETE: fake.DELETE }[req.method as "GET" | "POST" | "DELETE"];
        response = handler ? await handler(request, { params: Promise.resolve({ path: url.pathname.slice(4).split("/") }) }) : new Response(null, { status: 405 });
      } else if (url.pathname === "/api/stripe/webhook" && req.method === "POST") {
        if (state.mode === "hold") {
          const parsed = JSON.parse(body.toString("utf8")) as { id: string; type: string };
          state.held.push({ body: body.toString("utf8"), signature: headers.get("stripe-signature") ?? "", type: parsed.type, id: parsed.id });
          response = Response.json({ held: true });
        } else response = await webhook.POST(request);
      } else response = new Response("not served by the test server", { status: 404 });
      res.writeHead(response.status, Object.fromEntries(response.headers));
      res.end(Buffer.from(await response.arrayBuffer()));
    } catch (err) {
      res.writeHead(500, { "content-type": "text/plain" });
      res.end(String(err));
    }
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  state.base = `http://127.0.0.1:${port}`;
  process.env.STRIPE_API_BASE = state.base;
  process.env.STRIPE_FAKE_WEBHOOK_URL = `${state.base}/api/stripe/webhook`;
  resetStripeClientForTests();
  state.close = () =>
    new Promise<void>((resolve) => {
      delete process.env.STRIPE_API_BASE;
      delete process.env.STRIPE_FAKE_WEBHOOK_URL;
      resetStripeClientForTests();
      server.closeAllConnections();
      server.close(() => resolve());
    });
  return state;
}
