// The invented people, shop and logbook every matrix entry is called against.
import { count, eq } from "drizzle-orm";
import { db } from "@/db";
import * as schema from "@/db/schema";
import { POST as upload } from "@/app/api/vehicles/[vehicleId]/attachments/route";
import { POST as ownerCheck } from "@/app/api/vehicles/[vehicleId]/checks/route";
import { POST as ownerService } from "@/app/api/vehicles/[vehicleId]/service-entries/route";
import { POST as passCheck } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/route";
import { POST as passService } from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/route";
import { ctx, makeShop, request, signUp, type TestUser } from "../../../support/users";
import { HOUR, insertPass, makeVehicle } from "../../passes/helpers";
import type { Actor } from "./types";

export const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==", "base64");

export function pngForm(extra: Record<string, string> = { kind: "receipt" }) {
  const f = new FormData();
  f.set("file", new File([new Uint8Array(PNG)], "receipt.png", { type: "image/png" }));
  for (const [k, v] of Object.entries(extra)) f.set(k, v);
  return f;
}

export type World = Awaited<ReturnType<typeof buildWorld>>;

// Every table a refusal could touch; each refusal leaves all of them as they were.
const COUNTED = {
  user: schema.user,
  session: schema.session,
  organization: schema.organization,
  member: schema.member,
  invitation: schema.invitation,
  vehicle: schema.vehicle,
  tireSet: schema.tireSet,
  tire: schema.tire,
  treadCheck: schema.treadCheck,
  treadReading: schema.treadReading,
  serviceEntry: schema.serviceEntry,
  attachment: schema.attachment,
  shopPass: schema.shopPass,
  shopPassVehicle: schema.shopPassVehicle,
  accessLog: schema.accessLog,
  reminderFeed: schema.reminderFeed,
  emailOptOut: schema.emailOptOut,
  driverProfile: schema.driverProfile,
} as const;

export async function rowCounts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const [name, table] of Object.entries(COUNTED)) out[name] = (await db.select({ n: count() }).from(table as typeof schema.user))[0].n;
  return out;
}

export async function buildWorld() {
  const u = {
    owner: await signUp({ name: "Odile Farrant" }),
    otherDriver: await signUp({ name: "Piet Varnsworth" }),
    techActive: await signUp({ name: "Tamsin Rook" }),
    techEnded: await signUp({ name: "Edda Lorne" }),
    techRevoked: await signUp({ name: "Rafe Colby" }),
    techView: await signUp({ name: "Vera Quill" }),
    techOtherShop: await signUp({ name: "Hollis Grebe" }),
    removedTech: await signUp({ name: "Remy Stroud" }),
    shopOwner: await signUp({ name: "Sella Brandt" }),
    operator: await signUp({ name: "Op Erator", admin: true }),
    disabled: await signUp({ name: "Dora Stillwell" }),
  } satisfies Record<Exclude<Actor, "signedOut">, TestUser>;
  const otherOwner = await signUp({ name: "Ned Thorpe" });
  const shopA = (await makeShop({ name: "Ferncastle Wheelhouse", owner: u.shopOwner, technicians: [u.techActive, u.techEnded, u.techRevoked, u.techView, u.removedTech] })).id;
  const shopB = (await makeShop({ name: "Duncombe Rubber Yard", owner: otherOwner, technicians: [u.techOtherShop] })).id;
  await db.delete(schema.member).where(eq(schema.member.userId, u.removedTech.id));
  await db.update(schema.user).set({ banned: true }).where(eq(schema.user.id, u.disabled.id));
  const car = await makeVehicle(u.owner, "Odile's grey Velora");
  const now = Date.now();
  const base = { driver: u.owner, shopId: shopA, vehicleIds: [car.vehicle.id] };
  const passes = {
    active: (await insertPass({ ...base, startsAt: new Date(now - HOUR), endsAt: new Date(now + 48 * HOUR) })).id,
    ended: (await insertPass({ ...base, startsAt: new Date(now - 10 * HOUR), endsAt: new Date(now - HOUR) })).id,
    revoked: (await insertPass({ ...base, startsAt: new Date(now - HOUR), endsAt: new Date(now + 48 * HOUR), revokedAt: new Date(now - 60_000) })).id,
    view: (await insertPass({ ...base, scope: "view", startsAt: new Date(now - HOUR), endsAt: new Date(now + 48 * HOUR) })).id,
  };
  const up = await upload(request(`/api/vehicles/${car.vehicle.id}/attachments`, { as: u.owner, body: pngForm() }), ctx({ vehicleId: car.vehicle.id }));
  if (up.status !== 201) throw new Error(`world: upload answered ${up.status}`);
  const attachmentId = ((await up.json()) as { attachment: { id: string } }).attachment.id;

  // History to change: the owner's own, and what the active pass recorded (the edit and delete routes).
  const made = async (res: Response) => {
    if (res.status !== 201) throw new Error(`world: history answered ${res.status}`);
    const j = (await res.json()) as { id?: string; check?: { id: string }; entry?: { id: string } };
    return (j.id ?? j.check?.id ?? j.entry?.id)!;
  };
  const origin = { origin: "http://fourpatch.test" };
  const vehicleId = car.vehicle.id;
  const checkOn = { setId: car.set.id, readings: car.tires.map((t) => ({ tireId: t.id, centre: "5.5" })) };
  const history = {
    ownerCheck: await made(await ownerCheck(request(`/api/vehicles/${vehicleId}/checks`, { as: u.owner, body: checkOn, headers: origin }), ctx({ vehicleId }))),
    ownerEntry: await made(await ownerService(request(`/api/vehicles/${vehicleId}/service-entries`, { as: u.owner, body: { kind: "inspection", checks: [] }, headers: origin }), ctx({ vehicleId }))),
    passCheck: await made(await passCheck(request(`/api/passes/${passes.active}/vehicles/${vehicleId}/checks`, { as: u.techActive, body: checkOn, headers: origin }), ctx({ passId: passes.active, vehicleId }))),
    passEntry: await made(await passService(request(`/api/passes/${passes.active}/vehicles/${vehicleId}/service`, { as: u.techActive, body: { kind: "balancing", checks: [] }, headers: origin }), ctx({ passId: passes.active, vehicleId }))),
  };

  const userOf = (a: Actor): TestUser | undefined => (a === "signedOut" ? undefined : u[a]);
  const passFor = (a: Actor): string =>
    a === "techEnded" ? passes.ended : a === "techRevoked" ? passes.revoked : a === "techView" ? passes.view : passes.active;
  /** A same-origin request as the actor (the browser's Origin header included). */
  const req = (url: string, a: Actor, opts: { method?: string; body?: unknown } = {}) =>
    request(url, { as: userOf(a), method: opts.method, body: opts.body, headers: opts.method && opts.method !== "GET" ? { origin: "http://fourpatch.test" } : {} });
  return { u, shopA, shopB, car, passes, attachmentId, history, userOf, passFor, req, otherOwner };
}
