// Plus billing and the local Stripe fake, plus the paged logbook reads.
// The fake's API answers only this process's own key; its pages and their
// actions only loopback clients or an operator (the matrix's requests carry
// no loopback stamp, so only the operator gets through); the webhook only a
// valid signature. Billing actions act on the caller's own subscription.
import { advanceAction, failNextAction, payCheckoutAction, payInvoiceAction, redeliverAction } from "@/app/dev/stripe/actions";
import { buyPlusAction, cancelPlusAction, resumePlusAction, switchIntervalAction } from "@/app/(driver)/account/billing/actions";
import * as fakeStripeRoute from "@/app/api/fake/stripe/v1/[...path]/route";
import * as webhookRoute from "@/app/api/stripe/webhook/route";
import * as vChecksRoute from "@/app/api/vehicles/[vehicleId]/checks/route";
import * as vServiceRoute from "@/app/api/vehicles/[vehicleId]/service-entries/route";
import { toAppError } from "@/lib/errors";
import { ctx } from "../../../support/users";
import { startFakeStripeServer, type FakeStripeServer } from "../../../support/stripe-server";
import { anySignedIn, everyone, ownerOnly, type Actor, type MatrixEntry, type Outcome } from "./types";
import { asActor, outcome } from "./act";
import type { World } from "./world";

type Handler = (req: Request, c: ReturnType<typeof ctx>) => Promise<Response>;
const status = async (p: Promise<Response>) => ({ status: (await p).status });
const h = (fn: unknown) => fn as Handler;

/** The fake's actions throw a not-found error past their gate; anything else that returns passed it. */
async function gated(fn: () => Promise<unknown>): Promise<Outcome> {
  try {
    await fn();
    return { status: 200 };
  } catch (err) {
    return { status: toAppError(err).status };
  }
}

const g = globalThis as unknown as { __matrixStripe?: FakeStripeServer };

/** The SDK reaches the fake over real HTTP: a loopback server serving its route handlers. */
async function stripeServer() {
  g.__matrixStripe ??= await startFakeStripeServer();
}

const fakeStripe = (method: "GET" | "POST" | "DELETE") => (w: World, a: Actor) =>
  status(h(fakeStripeRoute[method])(w.req(`/v1/customers${method === "POST" ? "" : "/cus_nobody"}`, a, { method, body: method === "POST" ? { email: "x@y.test" } : undefined }), ctx({ path: method === "POST" ? ["customers"] : ["customers", "cus_nobody"] } as never)));

const form = (id: string) => {
  const f = new FormData();
  f.set("id", id);
  return f;
};
const card = { id: "cs_nobody", number: "4242 4242 4242 4242", expiry: "12/40", cvc: "123" };
const operatorOnly = { operator: 200, others: 404 };

export const entries: MatrixEntry[] = [
  { file: "app/(driver)/account/billing/actions.ts", exportName: "buyPlusAction", what: "start a checkout for oneself", expect: anySignedIn(200), prepare: stripeServer,
    call: (w, a) => asActor(w, a, async () => outcome(await buyPlusAction({ interval: "month" }))) },
  { file: "app/(driver)/account/billing/actions.ts", exportName: "cancelPlusAction", what: "cancel one's own subscription (none exists: nobody reaches another's)", expect: anySignedIn(404), prepare: stripeServer,
    call: (w, a) => asActor(w, a, async () => outcome(await cancelPlusAction({}))) },
  { file: "app/(driver)/account/billing/actions.ts", exportName: "resumePlusAction", what: "resume one's own subscription (none exists)", expect: anySignedIn(404), prepare: stripeServer,
    call: (w, a) => asActor(w, a, async () => outcome(await resumePlusAction({}))) },
  { file: "app/(driver)/account/billing/actions.ts", exportName: "switchIntervalAction", what: "switch one's own subscription (none exists)", expect: anySignedIn(404), prepare: stripeServer,
    call: (w, a) => asActor(w, a, async () => outcome(await switchIntervalAction({ interval: "year" }))) },

  { file: "app/api/fake/stripe/v1/[...path]/route.ts", exportName: "GET", what: "the fake Stripe API without the server's key (a session is not a key)", expect: everyone(401), call: fakeStripe("GET") },
  { file: "app/api/fake/stripe/v1/[...path]/route.ts", exportName: "POST", what: "create a customer in the fake without the server's key", expect: everyone(401), call: fakeStripe("POST") },
  { file: "app/api/fake/stripe/v1/[...path]/route.ts", exportName: "DELETE", what: "delete in the fake without the server's key", expect: everyone(401), call: fakeStripe("DELETE") },
  { file: "app/api/stripe/webhook/route.ts", exportName: "POST", what: "a webhook without a signature (authenticated by signature only)", expect: everyone(400),
    call: (w, a) => status(h(webhookRoute.POST)(w.req("/api/stripe/webhook", a, { method: "POST", body: { id: "evt_forged", type: "customer.subscription.updated", data: { object: {} } } }), ctx({}))) },

  { file: "app/dev/stripe/actions.ts", exportName: "payCheckoutAction", what: "pay on the fake's hosted checkout", expect: operatorOnly, call: (w, a) => asActor(w, a, () => gated(() => payCheckoutAction(card))) },
  { file: "app/dev/stripe/actions.ts", exportName: "payInvoiceAction", what: "pay on the fake's hosted invoice", expect: operatorOnly, call: (w, a) => asActor(w, a, () => gated(() => payInvoiceAction({ ...card, id: "in_nobody" }))) },
  { file: "app/dev/stripe/actions.ts", exportName: "advanceAction", what: "advance a fake subscription", expect: operatorOnly, call: (w, a) => asActor(w, a, () => gated(() => advanceAction(form("sub_nobody")))) },
  { file: "app/dev/stripe/actions.ts", exportName: "failNextAction", what: "make a fake renewal fail", expect: operatorOnly, call: (w, a) => asActor(w, a, () => gated(() => failNextAction(form("sub_nobody")))) },
  { file: "app/dev/stripe/actions.ts", exportName: "redeliverAction", what: "send a fake event again", expect: operatorOnly, call: (w, a) => asActor(w, a, () => gated(() => redeliverAction(form("evt_nobody")))) },

  { file: "app/api/vehicles/[vehicleId]/checks/route.ts", exportName: "GET", what: "a page of the vehicle's checks", expect: ownerOnly(200),
    call: (w, a) => status(h(vChecksRoute.GET)(w.req(`/api/vehicles/${w.car.vehicle.id}/checks`, a), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/service-entries/route.ts", exportName: "GET", what: "a page of the vehicle's service entries", expect: ownerOnly(200),
    call: (w, a) => status(h(vServiceRoute.GET)(w.req(`/api/vehicles/${w.car.vehicle.id}/service-entries`, a), ctx({ vehicleId: w.car.vehicle.id }))) },
];
