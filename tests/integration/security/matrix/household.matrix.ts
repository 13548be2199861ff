// Co-keepers, hand-ons, the printable history, tire corrections and the
// import. Vehicle routes act through the caller's own access (owner or
// co-keeper; the matrix's actors hold no co-keeper arrangement, which
// tests/integration/household covers), so everyone but the owner finds no
// vehicle; one-time links need their secret token, not a session.
import * as importRoute from "@/app/api/account/import/route";
import * as handOnRoute from "@/app/api/hand-ons/[handOnId]/route";
import * as handOnAcceptRoute from "@/app/api/hand-ons/accept/route";
import * as keeperRoute from "@/app/api/keepers/[keeperId]/route";
import * as keeperAcceptRoute from "@/app/api/keepers/accept/route";
import * as passPdfRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/history-pdf/route";
import * as tireRoute from "@/app/api/tires/[tireId]/route";
import * as vHandOnRoute from "@/app/api/vehicles/[vehicleId]/hand-on/route";
import * as vPdfRoute from "@/app/api/vehicles/[vehicleId]/history-pdf/route";
import * as vKeepersRoute from "@/app/api/vehicles/[vehicleId]/keepers/route";
import { ctx, request } from "../../../support/users";
import { makeVehicle } from "../../passes/helpers";
import { anySignedIn, ownerOnly, underPass, type Actor, type MatrixEntry } from "./types";
import type { World } from "./world";

type Handler = (req: Request, c: ReturnType<typeof ctx>) => Promise<Response>;
const status = async (p: Promise<Response>) => ({ status: (await p).status });
const h = (fn: unknown) => fn as Handler;

/** A well-formed secret that was never issued. */
const FORGED_TOKEN = "A".repeat(43);

let inviteCount = 0;
/** The owner invites someone to keep a vehicle; the arrangement's id. */
async function keeperOf(w: World, vehicleId: string): Promise<string> {
  const res = await h(vKeepersRoute.POST)(
    request(`/api/vehicles/${vehicleId}/keepers`, { as: w.u.owner, method: "POST", body: { email: `keeper-${++inviteCount}@example.test` }, headers: { origin: "http://fourpatch.test" } }),
    ctx({ vehicleId }),
  );
  return ((await res.json()) as { id: string }).id;
}

/** The owner makes a hand-on link for a throw-away vehicle; the hand-on's id. */
async function handOnOf(w: World): Promise<string> {
  const car = await makeVehicle(w.u.owner, "Throw-away for a hand-on");
  const res = await h(vHandOnRoute.POST)(
    request(`/api/vehicles/${car.vehicle.id}/hand-on`, { as: w.u.owner, method: "POST", body: { includeReceipts: false, keepSnapshot: false }, headers: { origin: "http://fourpatch.test" } }),
    ctx({ vehicleId: car.vehicle.id }),
  );
  const j = (await res.json()) as { id?: string; handOn?: { id: string } };
  return (j.id ?? j.handOn?.id)!;
}

const shared: { keeperId?: string; handOnId?: string } = {};

export const entries: MatrixEntry[] = [
  { file: "app/api/vehicles/[vehicleId]/keepers/route.ts", exportName: "GET", what: "list the vehicle's co-keepers", expect: ownerOnly(200),
    call: (w, a) => status(h(vKeepersRoute.GET)(w.req(`/api/vehicles/${w.car.vehicle.id}/keepers`, a), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/keepers/route.ts", exportName: "POST", what: "invite a co-keeper", expect: ownerOnly(201),
    call: (w, a) => status(h(vKeepersRoute.POST)(w.req(`/api/vehicles/${w.car.vehicle.id}/keepers`, a, { method: "POST", body: { email: `invited-by-${a}@example.test` } }), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/keepers/[keeperId]/route.ts", exportName: "DELETE", what: "end a co-keeper arrangement (the owner's own fresh one; others try the shared one)", expect: ownerOnly(200),
    prepare: async (w) => {
      shared.keeperId = await keeperOf(w, w.car.vehicle.id);
    },
    call: async (w, a: Actor) => {
      const id = a === "owner" ? await keeperOf(w, w.car.vehicle.id) : shared.keeperId!;
      return status(h(keeperRoute.DELETE)(w.req(`/api/keepers/${id}`, a, { method: "DELETE" }), ctx({ keeperId: id })));
    } },
  { file: "app/api/keepers/accept/route.ts", exportName: "POST", what: "accept a co-keeper invitation with a forged secret", expect: anySignedIn(404),
    call: (w, a) => status(h(keeperAcceptRoute.POST)(w.req("/api/keepers/accept", a, { method: "POST", body: { token: FORGED_TOKEN } }), ctx({}))) },

  { file: "app/api/vehicles/[vehicleId]/hand-on/route.ts", exportName: "GET", what: "the vehicle's open hand-on", expect: ownerOnly(200),
    call: (w, a) => status(h(vHandOnRoute.GET)(w.req(`/api/vehicles/${w.car.vehicle.id}/hand-on`, a), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/hand-on/route.ts", exportName: "POST", what: "make a hand-on link for the vehicle", expect: ownerOnly(201),
    call: async (w, a) => {
      // The owner hands on a throw-away vehicle; everyone else tries the world's car.
      const id = a === "owner" ? (await makeVehicle(w.u.owner, "Throw-away to hand on")).vehicle.id : w.car.vehicle.id;
      return status(h(vHandOnRoute.POST)(w.req(`/api/vehicles/${id}/hand-on`, a, { method: "POST", body: { includeReceipts: false, keepSnapshot: false } }), ctx({ vehicleId: id })));
    } },
  { file: "app/api/hand-ons/[handOnId]/route.ts", exportName: "DELETE", what: "withdraw a hand-on link (the seller's own fresh one; others try the shared one)", expect: ownerOnly(200),
    prepare: async (w) => {
      shared.handOnId = await handOnOf(w);
    },
    call: async (w, a) => {
      const id = a === "owner" ? await handOnOf(w) : shared.handOnId!;
      return status(h(handOnRoute.DELETE)(w.req(`/api/hand-ons/${id}`, a, { method: "DELETE" }), ctx({ handOnId: id })));
    } },
  { file: "app/api/hand-ons/accept/route.ts", exportName: "POST", what: "take on a vehicle with a forged secret", expect: anySignedIn(404),
    call: (w, a) => status(h(handOnAcceptRoute.POST)(w.req("/api/hand-ons/accept", a, { method: "POST", body: { token: FORGED_TOKEN } }), ctx({}))) },

  { file: "app/api/vehicles/[vehicleId]/history-pdf/route.ts", exportName: "GET", what: "the vehicle's history as a PDF", expect: ownerOnly(200),
    call: (w, a) => status(h(vPdfRoute.GET)(w.req(`/api/vehicles/${w.car.vehicle.id}/history-pdf`, a), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/history-pdf/route.ts", exportName: "GET", what: "the history PDF under the actor's pass", expect: underPass(200, false),
    call: (w, a) => status(h(passPdfRoute.GET)(w.req(`/api/passes/${w.passFor(a)}/vehicles/${w.car.vehicle.id}/history-pdf`, a), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/tires/[tireId]/route.ts", exportName: "PATCH", what: "correct a tire's DOT code (same position)", expect: ownerOnly(200),
    call: (w, a) => {
      const t = w.car.tires[0];
      return status(h(tireRoute.PATCH)(w.req(`/api/tires/${t.id}`, a, { method: "PATCH", body: { dotCode: "DOT XJ7K ABCD 3422", position: t.position } }), ctx({ tireId: t.id })));
    } },
  { file: "app/api/account/import/route.ts", exportName: "POST", what: "import with no file (into one's own account only)", expect: anySignedIn(422),
    call: (w, a) => status(h(importRoute.POST)(w.req("/api/account/import?mode=merge", a, { method: "POST" }), ctx({}))) },
];
