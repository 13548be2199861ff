// Changing and deleting history (issue 10): tread checks and service entries
// by the vehicle's drivers, by a shop under the pass that recorded them, and
// one tire deleted with its readings.
import * as checkRoute from "@/app/api/checks/[checkId]/route";
import * as passCheckRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/[checkId]/route";
import * as passChecksRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/route";
import * as passEntryRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/[entryId]/route";
import * as passServiceRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/route";
import * as serviceEntryRoute from "@/app/api/service-entries/[entryId]/route";
import * as tireRoute from "@/app/api/tires/[tireId]/route";
import { ctx, request } from "../../../support/users";
import { makeVehicle } from "../../passes/helpers";
import { ownerOnly, underPass, type Actor, type MatrixEntry } from "./types";
import type { World } from "./world";

type Handler = (req: Request, c: ReturnType<typeof ctx>) => Promise<Response>;
const status = async (p: Promise<Response>) => ({ status: (await p).status });
const h = (fn: unknown) => fn as Handler;
const ORIGIN = { origin: "http://fourpatch.test" };

const checkBody = (w: World) => ({ setId: w.car.set.id, readings: w.car.tires.map((t) => ({ tireId: t.id, centre: "5.4" })) });
const entryBody = { kind: "inspection", notes: "Looked over again." };

async function idOf(res: Response) {
  const j = (await res.json()) as { id?: string; check?: { id: string }; entry?: { id: string } };
  return (j.id ?? j.check?.id ?? j.entry?.id)!;
}
const passCheck = async (w: World) =>
  idOf(await h(passChecksRoute.POST)(request("/", { as: w.u.techActive, body: checkBody(w), headers: ORIGIN }), ctx({ passId: w.passes.active, vehicleId: w.car.vehicle.id })));
const passEntry = async (w: World) =>
  idOf(await h(passServiceRoute.POST)(request("/", { as: w.u.techActive, body: { ...entryBody, checks: [] }, headers: ORIGIN }), ctx({ passId: w.passes.active, vehicleId: w.car.vehicle.id })));

/** Those who may delete act on a fresh target; everyone else on the world's shared one. */
const passTarget = async (a: Actor, fresh: () => Promise<string>, shared: string) => (a === "techActive" || a === "shopOwner" ? fresh() : shared);
const ownerTarget = async (a: Actor, fresh: () => Promise<string>, shared: string) => (a === "owner" ? fresh() : shared);

export const entries: MatrixEntry[] = [
  { file: "app/api/checks/[checkId]/route.ts", exportName: "PATCH", what: "change the owner's tread check", expect: ownerOnly(200),
    call: (w, a) => status(h(checkRoute.PATCH)(w.req(`/api/checks/${w.history.ownerCheck}`, a, { method: "PATCH", body: checkBody(w) }), ctx({ checkId: w.history.ownerCheck }))) },
  { file: "app/api/service-entries/[entryId]/route.ts", exportName: "PATCH", what: "change the owner's service entry", expect: ownerOnly(200),
    call: (w, a) => status(h(serviceEntryRoute.PATCH)(w.req(`/api/service-entries/${w.history.ownerEntry}`, a, { method: "PATCH", body: entryBody }), ctx({ entryId: w.history.ownerEntry }))) },
  { file: "app/api/tires/[tireId]/route.ts", exportName: "DELETE", what: "delete one tire with its readings", expect: ownerOnly(200),
    call: async (w, a) => {
      const id = await ownerTarget(a, async () => (await makeVehicle(w.u.owner, "Throw-away car")).tires[0].id, w.car.tires[3].id);
      return status(h(tireRoute.DELETE)(w.req(`/api/tires/${id}`, a, { method: "DELETE" }), ctx({ tireId: id })));
    } },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/checks/[checkId]/route.ts", exportName: "PATCH", what: "change a check the active pass recorded", expect: underPass(200, true),
    call: (w, a) => status(h(passCheckRoute.PATCH)(w.req("/", a, { method: "PATCH", body: checkBody(w) }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id, checkId: w.history.passCheck }))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/checks/[checkId]/route.ts", exportName: "DELETE", what: "delete a check the active pass recorded", expect: underPass(200, true),
    call: async (w, a) => {
      const id = await passTarget(a, () => passCheck(w), w.history.passCheck);
      return status(h(passCheckRoute.DELETE)(w.req("/", a, { method: "DELETE" }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id, checkId: id })));
    } },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/service/[entryId]/route.ts", exportName: "PATCH", what: "change an entry the active pass recorded", expect: underPass(200, true),
    call: (w, a) => status(h(passEntryRoute.PATCH)(w.req("/", a, { method: "PATCH", body: entryBody }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id, entryId: w.history.passEntry }))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/service/[entryId]/route.ts", exportName: "DELETE", what: "delete an entry the active pass recorded", expect: underPass(200, true),
    call: async (w, a) => {
      const id = await passTarget(a, () => passEntry(w), w.history.passEntry);
      return status(h(passEntryRoute.DELETE)(w.req("/", a, { method: "DELETE" }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id, entryId: id })));
    } },
  // The owner's own history through the pass routes: a shop may not touch it, even under its live pass.
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/checks/[checkId]/route.ts", exportName: "DELETE", what: "delete the owner's own check through a pass", expect: { ...underPass(403, true), techActive: 403, shopOwner: 403 },
    call: (w, a) => status(h(passCheckRoute.DELETE)(w.req("/", a, { method: "DELETE" }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id, checkId: w.history.ownerCheck }))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/service/[entryId]/route.ts", exportName: "PATCH", what: "change the owner's own entry through a pass", expect: { ...underPass(403, true), techActive: 403, shopOwner: 403 },
    call: (w, a) => status(h(passEntryRoute.PATCH)(w.req("/", a, { method: "PATCH", body: entryBody }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id, entryId: w.history.ownerEntry }))) },
];
