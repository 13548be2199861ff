// The logbook, passes, shops, reminders, account and public routes (issue 9).
import { db } from "@/db";
import { member } from "@/db/schema";
import * as accountRoute from "@/app/api/account/route";
import * as exportRoute from "@/app/api/account/export/route";
import * as attachmentRoute from "@/app/api/attachments/[attachmentId]/route";
import * as authRoute from "@/app/api/auth/[...all]/route";
import * as checkRoute from "@/app/api/checks/[checkId]/route";
import * as cronRoute from "@/app/api/cron/reminders/route";
import * as backupRoute from "@/app/api/ops/backup/route";
import * as fakeResendRoute from "@/app/api/fake/resend/emails/route";
import * as feedTokenRoute from "@/app/api/feed/[token]/route";
import * as passAttachmentRoute from "@/app/api/passes/[passId]/attachments/[attachmentId]/route";
import * as extendRoute from "@/app/api/passes/[passId]/extend/route";
import * as revokeRoute from "@/app/api/passes/[passId]/revoke/route";
import * as passChecksRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/checks/route";
import * as passVehicleRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/route";
import * as passServiceRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/service/route";
import * as passSetsRoute from "@/app/api/passes/[passId]/vehicles/[vehicleId]/sets/route";
import * as accessLogRoute from "@/app/api/passes/access-log/route";
import * as heldRoute from "@/app/api/passes/held/route";
import * as passesRoute from "@/app/api/passes/route";
import * as remFeedRoute from "@/app/api/reminders/feed/route";
import * as remSettingsRoute from "@/app/api/reminders/settings/route";
import * as serviceEntryRoute from "@/app/api/service-entries/[entryId]/route";
import * as setRoute from "@/app/api/sets/[setId]/route";
import * as invitationRoute from "@/app/api/shops/[shopId]/invitations/[invitationId]/route";
import * as invitationsRoute from "@/app/api/shops/[shopId]/invitations/route";
import * as shopRoute from "@/app/api/shops/[shopId]/route";
import * as staffRoute from "@/app/api/shops/[shopId]/staff/[memberId]/route";
import * as workRoute from "@/app/api/shops/[shopId]/work/route";
import * as joinRoute from "@/app/api/shops/join/[invitationId]/route";
import * as shopsRoute from "@/app/api/shops/route";
import * as vAttachRoute from "@/app/api/vehicles/[vehicleId]/attachments/route";
import * as vChecksRoute from "@/app/api/vehicles/[vehicleId]/checks/route";
import * as vehicleRoute from "@/app/api/vehicles/[vehicleId]/route";
import * as vServiceRoute from "@/app/api/vehicles/[vehicleId]/service-entries/route";
import * as vSetsRoute from "@/app/api/vehicles/[vehicleId]/sets/route";
import * as vSwapRoute from "@/app/api/vehicles/[vehicleId]/swap/route";
import * as vehiclesRoute from "@/app/api/vehicles/route";
import * as startRoute from "@/app/start/route";
import * as oneClickRoute from "@/app/unsubscribe/[token]/one-click/route";
import { ctx, request, signUp } from "../../../support/users";
import { HOUR, insertPass, makeVehicle } from "../../passes/helpers";
import { vehicleBody } from "../../logbook/fixtures";
import { anySignedIn, everyone, ownerOnly, shopOwnerOnly, underPass, type Actor, type MatrixEntry } from "./types";
import { pngForm, type World } from "./world";

type Handler = (req: Request, c: ReturnType<typeof ctx>) => Promise<Response>;
const status = async (p: Promise<Response>) => ({ status: (await p).status });
const h = (fn: unknown) => fn as Handler;

const readings = (w: World) => w.car.tires.map((t) => ({ tireId: t.id, centre: "5.5" }));
const checkBody = (w: World) => ({ setId: w.car.set.id, readings: readings(w) });
const serviceBody = (w: World) => ({ kind: "rotation", notes: "Rotated.", checks: [{ setId: w.car.set.id, method: "gauge", depthUnit: "mm", pressureUnit: "kpa", readings: [{ tireId: w.car.tires[0].id, inner: "6.0", centre: "6.2", outer: "6.1", pressure: "230" }] }] });
const setBody = () => ({
  kind: "winter",
  size: "205/55R16",
  mountNow: false,
  storageLocation: "Rack 2",
  tires: (["front_left", "front_right", "rear_left", "rear_right"] as const).map((position) => ({ position, dotCode: "DOT XJ7K ABCD 1224", newDepth: "9" })),
});

/** A throw-away vehicle of the world's owner, for calls that would delete or change what others are tested on. */
async function freshCar(w: World) {
  return makeVehicle(w.u.owner, "Throw-away car");
}
/** The owner deletes a target of their own; everyone else tries the world's one. */
async function targetFor<T>(w: World, a: Actor, fresh: () => Promise<T>, shared: T): Promise<T> {
  return a === "owner" ? fresh() : shared;
}

let sharedCheck: string | undefined;
let sharedEntry: string | undefined;
async function checkOf(w: World, vehicleId: string, setId: string, tires: { id: string }[]) {
  const res = await h(vChecksRoute.POST)(request(`/api/vehicles/${vehicleId}/checks`, { as: w.u.owner, body: { setId, readings: tires.map((t) => ({ tireId: t.id, centre: "5.5" })) } }), ctx({ vehicleId }));
  const j = (await res.json()) as { id?: string; checkId?: string; check?: { id: string } };
  return (j.id ?? j.checkId ?? j.check?.id)!;
}
async function entryOf(w: World, vehicleId: string) {
  const res = await h(vServiceRoute.POST)(request(`/api/vehicles/${vehicleId}/service-entries`, { as: w.u.owner, body: { kind: "inspection", notes: "Looked over.", checks: [] } }), ctx({ vehicleId }));
  return ((await res.json()) as { id: string }).id;
}

export const entries: MatrixEntry[] = [
  // ---------------------------------------------------------------- account
  { file: "app/api/account/route.ts", exportName: "DELETE", what: "delete the account with a wrong password", expect: { ...anySignedIn(422) },
    call: (w, a) => status(h(accountRoute.DELETE)(w.req("/api/account", a, { method: "DELETE", body: { password: "not-the-password", confirm: "DELETE" } }), ctx({}))) },
  { file: "app/api/account/export/route.ts", exportName: "GET", what: "export one's own logbook", expect: anySignedIn(200),
    call: (w, a) => status(h(exportRoute.GET)(w.req("/api/account/export", a), ctx({}))) },

  // ---------------------------------------------------------------- logbook (owner only)
  { file: "app/api/vehicles/route.ts", exportName: "GET", what: "list one's own vehicles", expect: anySignedIn(200),
    call: (w, a) => status(h(vehiclesRoute.GET)(w.req("/api/vehicles", a), ctx({}))) },
  { file: "app/api/vehicles/route.ts", exportName: "POST", what: "add a vehicle to one's own logbook", expect: anySignedIn(201),
    call: (w, a) => status(h(vehiclesRoute.POST)(w.req("/api/vehicles", a, { method: "POST", body: vehicleBody }), ctx({}))) },
  { file: "app/api/vehicles/[vehicleId]/route.ts", exportName: "GET", what: "read the owner's vehicle", expect: ownerOnly(200),
    call: (w, a) => status(h(vehicleRoute.GET)(w.req(`/api/vehicles/${w.car.vehicle.id}`, a), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/route.ts", exportName: "PATCH", what: "change the owner's vehicle", expect: ownerOnly(200),
    call: (w, a) => status(h(vehicleRoute.PATCH)(w.req(`/api/vehicles/${w.car.vehicle.id}`, a, { method: "PATCH", body: vehicleBody }), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/route.ts", exportName: "DELETE", what: "delete a vehicle of the owner", expect: ownerOnly(200),
    call: async (w, a) => {
      const id = await targetFor(w, a, async () => (await freshCar(w)).vehicle.id, w.car.vehicle.id);
      return status(h(vehicleRoute.DELETE)(w.req(`/api/vehicles/${id}`, a, { method: "DELETE" }), ctx({ vehicleId: id })));
    } },
  { file: "app/api/vehicles/[vehicleId]/checks/route.ts", exportName: "POST", what: "record a tread check", expect: ownerOnly(201),
    call: (w, a) => status(h(vChecksRoute.POST)(w.req(`/api/vehicles/${w.car.vehicle.id}/checks`, a, { method: "POST", body: checkBody(w) }), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/service-entries/route.ts", exportName: "POST", what: "record a service entry", expect: ownerOnly(201),
    call: (w, a) => status(h(vServiceRoute.POST)(w.req(`/api/vehicles/${w.car.vehicle.id}/service-entries`, a, { method: "POST", body: { kind: "inspection", checks: [] } }), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/sets/route.ts", exportName: "POST", what: "log a set purchase (stored, not mounted)", expect: ownerOnly(201),
    call: (w, a) => status(h(vSetsRoute.POST)(w.req(`/api/vehicles/${w.car.vehicle.id}/sets`, a, { method: "POST", body: setBody() }), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/swap/route.ts", exportName: "POST", what: "swap to a set that does not exist (the owner reaches validation)", expect: { ...ownerOnly(422) },
    call: (w, a) => status(h(vSwapRoute.POST)(w.req(`/api/vehicles/${w.car.vehicle.id}/swap`, a, { method: "POST", body: { setId: "not-a-set" } }), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/vehicles/[vehicleId]/attachments/route.ts", exportName: "POST", what: "upload a PNG receipt", expect: ownerOnly(201),
    call: (w, a) => status(h(vAttachRoute.POST)(request(`/api/vehicles/${w.car.vehicle.id}/attachments`, { as: w.userOf(a), body: pngForm() }), ctx({ vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/attachments/[attachmentId]/route.ts", exportName: "GET", what: "download the owner's receipt", expect: ownerOnly(200),
    call: (w, a) => status(h(attachmentRoute.GET)(w.req(`/api/attachments/${w.attachmentId}`, a), ctx({ attachmentId: w.attachmentId }))) },
  { file: "app/api/attachments/[attachmentId]/route.ts", exportName: "DELETE", what: "delete a receipt", expect: ownerOnly(200),
    call: async (w, a) => {
      const id = await targetFor(w, a, async () => {
        const r = await h(vAttachRoute.POST)(request(`/api/vehicles/${w.car.vehicle.id}/attachments`, { as: w.u.owner, body: pngForm() }), ctx({ vehicleId: w.car.vehicle.id }));
        return ((await r.json()) as { attachment: { id: string } }).attachment.id;
      }, w.attachmentId);
      return status(h(attachmentRoute.DELETE)(w.req(`/api/attachments/${id}`, a, { method: "DELETE" }), ctx({ attachmentId: id })));
    } },
  { file: "app/api/checks/[checkId]/route.ts", exportName: "DELETE", what: "delete a tread check", expect: ownerOnly(200),
    prepare: async (w) => {
      sharedCheck ??= await checkOf(w, w.car.vehicle.id, w.car.set.id, w.car.tires);
    },
    call: async (w, a) => {
      const id = await targetFor(w, a, () => checkOf(w, w.car.vehicle.id, w.car.set.id, w.car.tires), sharedCheck!);
      return status(h(checkRoute.DELETE)(w.req(`/api/checks/${id}`, a, { method: "DELETE" }), ctx({ checkId: id })));
    } },
  { file: "app/api/service-entries/[entryId]/route.ts", exportName: "DELETE", what: "delete a service entry", expect: ownerOnly(200),
    prepare: async (w) => {
      sharedEntry ??= await entryOf(w, w.car.vehicle.id);
    },
    call: async (w, a) => {
      const id = await targetFor(w, a, () => entryOf(w, w.car.vehicle.id), sharedEntry!);
      return status(h(serviceEntryRoute.DELETE)(w.req(`/api/service-entries/${id}`, a, { method: "DELETE" }), ctx({ entryId: id })));
    } },
  { file: "app/api/sets/[setId]/route.ts", exportName: "GET", what: "read a set", expect: ownerOnly(200),
    call: (w, a) => status(h(setRoute.GET)(w.req(`/api/sets/${w.car.set.id}`, a), ctx({ setId: w.car.set.id }))) },
  { file: "app/api/sets/[setId]/route.ts", exportName: "PATCH", what: "label a set", expect: ownerOnly(200),
    call: (w, a) => status(h(setRoute.PATCH)(w.req(`/api/sets/${w.car.set.id}`, a, { method: "PATCH", body: { label: "Summer set" } }), ctx({ setId: w.car.set.id }))) },
  { file: "app/api/sets/[setId]/route.ts", exportName: "DELETE", what: "delete a set", expect: ownerOnly(200),
    call: async (w, a) => {
      const id = await targetFor(w, a, async () => (await freshCar(w)).set.id, w.car.set.id);
      return status(h(setRoute.DELETE)(w.req(`/api/sets/${id}`, a, { method: "DELETE" }), ctx({ setId: id })));
    } },

  // ---------------------------------------------------------------- passes, driver's side
  { file: "app/api/passes/route.ts", exportName: "GET", what: "list one's own passes", expect: anySignedIn(200),
    call: (w, a) => status(h(passesRoute.GET)(w.req("/api/passes", a), ctx({}))) },
  { file: "app/api/passes/route.ts", exportName: "POST", what: "give shop A a pass to the owner's car", expect: ownerOnly(201),
    call: (w, a) => status(h(passesRoute.POST)(w.req("/api/passes", a, { method: "POST", body: { shopId: w.shopA, vehicleIds: [w.car.vehicle.id], scope: "view", duration: "4h" } }), ctx({}))) },
  { file: "app/api/passes/[passId]/extend/route.ts", exportName: "POST", what: "extend the active pass", expect: ownerOnly(200),
    call: (w, a) => status(h(extendRoute.POST)(w.req(`/api/passes/${w.passes.active}/extend`, a, { method: "POST", body: { duration: "4h" } }), ctx({ passId: w.passes.active }))) },
  { file: "app/api/passes/[passId]/revoke/route.ts", exportName: "POST", what: "withdraw a pass", expect: ownerOnly(200),
    call: async (w, a) => {
      const id = await targetFor(w, a, async () => (await insertPass({ driver: w.u.owner, shopId: w.shopA, vehicleIds: [w.car.vehicle.id], startsAt: new Date(Date.now() - HOUR), endsAt: new Date(Date.now() + HOUR) })).id, w.passes.active);
      return status(h(revokeRoute.POST)(w.req(`/api/passes/${id}/revoke`, a, { method: "POST" }), ctx({ passId: id })));
    } },
  { file: "app/api/passes/access-log/route.ts", exportName: "GET", what: "read the owner's access log of the car", expect: ownerOnly(200),
    call: (w, a) => status(h(accessLogRoute.GET)(w.req(`/api/passes/access-log?vehicleId=${w.car.vehicle.id}`, a), ctx({}))) },

  // ---------------------------------------------------------------- passes, shop's side
  { file: "app/api/passes/held/route.ts", exportName: "GET", what: "list the passes of one's shops", expect: anySignedIn(200),
    call: (w, a) => status(h(heldRoute.GET)(w.req("/api/passes/held", a), ctx({}))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/route.ts", exportName: "GET", what: "read the logbook under the actor's pass", expect: underPass(200, false),
    call: (w, a) => status(h(passVehicleRoute.GET)(w.req(`/api/passes/${w.passFor(a)}/vehicles/${w.car.vehicle.id}`, a), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/checks/route.ts", exportName: "POST", what: "add a tread check under the pass", expect: underPass(201, true),
    call: (w, a) => status(h(passChecksRoute.POST)(w.req(`/api/passes/${w.passFor(a)}/vehicles/${w.car.vehicle.id}/checks`, a, { method: "POST", body: checkBody(w) }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/service/route.ts", exportName: "POST", what: "add a service entry under the pass", expect: underPass(201, true),
    call: (w, a) => status(h(passServiceRoute.POST)(w.req(`/api/passes/${w.passFor(a)}/vehicles/${w.car.vehicle.id}/service`, a, { method: "POST", body: serviceBody(w) }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/passes/[passId]/vehicles/[vehicleId]/sets/route.ts", exportName: "POST", what: "fit a set under the pass (stored)", expect: underPass(201, true),
    call: (w, a) => status(h(passSetsRoute.POST)(w.req(`/api/passes/${w.passFor(a)}/vehicles/${w.car.vehicle.id}/sets`, a, { method: "POST", body: setBody() }), ctx({ passId: w.passFor(a), vehicleId: w.car.vehicle.id }))) },
  { file: "app/api/passes/[passId]/attachments/[attachmentId]/route.ts", exportName: "GET", what: "open the car's receipt under the pass", expect: underPass(200, false),
    call: (w, a) => status(h(passAttachmentRoute.GET)(w.req(`/api/passes/${w.passFor(a)}/attachments/${w.attachmentId}`, a), ctx({ passId: w.passFor(a), attachmentId: w.attachmentId }))) },

  // ---------------------------------------------------------------- shops
  { file: "app/api/shops/route.ts", exportName: "GET", what: "search the directory", expect: anySignedIn(200),
    call: (w, a) => status(h(shopsRoute.GET)(w.req("/api/shops?q=wheel", a), ctx({}))) },
  { file: "app/api/shops/route.ts", exportName: "POST", what: "open a shop", expect: anySignedIn(201),
    call: (w, a) => status(h(shopsRoute.POST)(w.req("/api/shops", a, { method: "POST", body: { name: `Matrix Tread Stop ${a}`, town: "Testford" } }), ctx({}))) },
  { file: "app/api/shops/[shopId]/route.ts", exportName: "GET", what: "read shop A's profile and staff", expect: shopOwnerOnly(200),
    call: (w, a) => status(h(shopRoute.GET)(w.req(`/api/shops/${w.shopA}`, a), ctx({ shopId: w.shopA }))) },
  { file: "app/api/shops/[shopId]/route.ts", exportName: "PATCH", what: "change shop A's profile", expect: shopOwnerOnly(200),
    call: (w, a) => status(h(shopRoute.PATCH)(w.req(`/api/shops/${w.shopA}`, a, { method: "PATCH", body: { name: "Ferncastle Wheelhouse", town: "Testford" } }), ctx({ shopId: w.shopA }))) },
  { file: "app/api/shops/[shopId]/work/route.ts", exportName: "GET", what: "read shop A's own work record", expect: { shopOwner: 200, techActive: 200, techEnded: 200, techRevoked: 200, techView: 200, signedOut: 401, disabled: 403, others: 404 },
    call: (w, a) => status(h(workRoute.GET)(w.req(`/api/shops/${w.shopA}/work`, a), ctx({ shopId: w.shopA }))) },
  { file: "app/api/shops/[shopId]/invitations/route.ts", exportName: "POST", what: "invite a technician to shop A", expect: shopOwnerOnly(201),
    call: (w, a) => status(h(invitationsRoute.POST)(w.req(`/api/shops/${w.shopA}/invitations`, a, { method: "POST", body: { email: `new-${a}-${Date.now()}@example.test` } }), ctx({ shopId: w.shopA }))) },
  { file: "app/api/shops/[shopId]/invitations/[invitationId]/route.ts", exportName: "DELETE", what: "withdraw an invitation of shop A", expect: shopOwnerOnly(200),
    call: async (w, a) => {
      const r = await h(invitationsRoute.POST)(w.req(`/api/shops/${w.shopA}/invitations`, "shopOwner", { method: "POST", body: { email: `cancel-${a}-${Date.now()}@example.test` } }), ctx({ shopId: w.shopA }));
      const id = ((await r.json()) as { invitation: { id: string } }).invitation.id;
      return status(h(invitationRoute.DELETE)(w.req(`/api/shops/${w.shopA}/invitations/${id}`, a, { method: "DELETE" }), ctx({ shopId: w.shopA, invitationId: id })));
    } },
  { file: "app/api/shops/[shopId]/staff/[memberId]/route.ts", exportName: "DELETE", what: "remove a technician of shop A", expect: shopOwnerOnly(200),
    call: async (w, a) => {
      const t = await signUp({ name: `Staff for ${a}` });
      const id = `m_matrix_${t.id}`;
      await db.insert(member).values({ id, organizationId: w.shopA, userId: t.id, role: "technician" });
      return status(h(staffRoute.DELETE)(w.req(`/api/shops/${w.shopA}/staff/${id}`, a, { method: "DELETE" }), ctx({ shopId: w.shopA, memberId: id })));
    } },
  { file: "app/api/shops/join/[invitationId]/route.ts", exportName: "POST", what: "accept an invitation that does not exist", expect: anySignedIn(404),
    call: (w, a) => status(h(joinRoute.POST)(w.req("/api/shops/join/nosuchinvitation", a, { method: "POST" }), ctx({ invitationId: "nosuchinvitation" }))) },

  // ---------------------------------------------------------------- reminders
  { file: "app/api/reminders/feed/route.ts", exportName: "GET", what: "whether one's feed is live", expect: anySignedIn(200),
    call: (w, a) => status(h(remFeedRoute.GET)(w.req("/api/reminders/feed", a), ctx({}))) },
  { file: "app/api/reminders/feed/route.ts", exportName: "POST", what: "make one's own feed link", expect: anySignedIn(201),
    call: (w, a) => status(h(remFeedRoute.POST)(w.req("/api/reminders/feed", a, { method: "POST" }), ctx({}))) },
  { file: "app/api/reminders/feed/route.ts", exportName: "DELETE", what: "turn one's own feed off", expect: anySignedIn(200),
    call: (w, a) => status(h(remFeedRoute.DELETE)(w.req("/api/reminders/feed", a, { method: "DELETE" }), ctx({}))) },
  { file: "app/api/reminders/settings/route.ts", exportName: "GET", what: "read one's own settings", expect: anySignedIn(200),
    call: (w, a) => status(h(remSettingsRoute.GET)(w.req("/api/reminders/settings", a), ctx({}))) },
  { file: "app/api/reminders/settings/route.ts", exportName: "PUT", what: "save one's own settings", expect: anySignedIn(200),
    call: (w, a) => status(h(remSettingsRoute.PUT)(w.req("/api/reminders/settings", a, { method: "PUT", body: { jurisdiction: "EU", kinds: ["age-replace"], alarmLeadDays: [], emailLeadDays: "14", autumnSwap: "10-15", springSwap: "04-15", rotationIntervalKm: "10000", emailReminders: false, timezone: "Europe/Oslo" } }), ctx({}))) },
  { file: "app/api/feed/[token]/route.ts", exportName: "GET", what: "a feed secret that does not exist (the secret is the key, not the session)", expect: everyone(404),
    call: (w, a) => status(h(feedTokenRoute.GET)(w.req("/api/feed/not-a-real-secret", a), ctx({ token: "not-a-real-secret" }))) },
  { file: "app/api/cron/reminders/route.ts", exportName: "GET", what: "run the jobs without the cron secret (a session is not enough)", expect: everyone(401),
    call: (w, a) => status(h(cronRoute.GET)(w.req("/api/cron/reminders", a), ctx({}))) },
  { file: "app/api/cron/reminders/route.ts", exportName: "POST", what: "run the jobs without the cron secret", expect: everyone(401),
    call: (w, a) => status(h(cronRoute.POST)(w.req("/api/cron/reminders", a, { method: "POST" }), ctx({}))) },
  { file: "app/api/ops/backup/route.ts", exportName: "POST", what: "ask for a backup without the operations secret (an operator's session is not enough)", expect: everyone(401),
    call: (w, a) => status(h(backupRoute.POST)(w.req("/api/ops/backup", a, { method: "POST" }), ctx({}))) },
  { file: "app/unsubscribe/[token]/one-click/route.ts", exportName: "POST", what: "one-click unsubscribe with a forged token", expect: everyone(404),
    call: (w, a) => status(h(oneClickRoute.POST)(w.req("/unsubscribe/e30.forged/one-click", a, { method: "POST" }), ctx({ token: "e30.forged" }))) },
  { file: "app/unsubscribe/[token]/one-click/route.ts", exportName: "GET", what: "the one-click address opened by hand", expect: everyone(303),
    call: (w, a) => status(h(oneClickRoute.GET)(w.req("/unsubscribe/e30.forged/one-click", a), ctx({ token: "e30.forged" }))) },

  // ---------------------------------------------------------------- auth library, fakes, start
  { file: "app/api/auth/[...all]/route.ts", exportName: "GET", what: "the session (allowed endpoint)", expect: everyone(200),
    call: (w, a) => status(h(authRoute.GET)(w.req("http://fourpatch.test/api/auth/get-session", a), ctx({}))) },
  { file: "app/api/auth/[...all]/route.ts", exportName: "POST", what: "delete shop A through the library (not an allowed endpoint)", expect: everyone(404),
    call: (w, a) => status(h(authRoute.POST)(w.req("http://fourpatch.test/api/auth/organization/delete", a, { method: "POST", body: { organizationId: w.shopA } }), ctx({}))) },
  { file: "app/api/fake/resend/emails/route.ts", exportName: "POST", what: "send through the fake without the server's key", expect: everyone(401),
    call: (w, a) => status(h(fakeResendRoute.POST)(w.req("/api/fake/resend/emails", a, { method: "POST", body: { from: "a@b.test", to: "c@d.test", subject: "x" } }), ctx({}))) },
  { file: "app/start/route.ts", exportName: "GET", what: "the landing redirect after sign-in", expect: everyone(307),
    call: (w, a) => status(h(startRoute.GET)(w.req("/start", a), ctx({}))) },
];
