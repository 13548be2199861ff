// Every page under app/ × every actor → what the visitor gets (see pages.ts).
import type { PageEntry } from "./pages";

const NONE = "00000000-0000-4000-8000-000000000000";
const v = (w: Parameters<NonNullable<PageEntry["params"]>>[0]) => ({ vehicleId: w.car.vehicle.id });

// Signed out, or disabled (a disabled account has no page session): the sign-in page.
const out = { signedOut: "sign-in", disabled: "sign-in" } as const;
/** Any account's own area (every account keeps its own vehicles). */
const anyAccount = { ...out, others: "200" } as const;
/** The owner's vehicle: another account finds nothing. */
const ownersOnly = { ...out, owner: "200", others: "404" } as const;
/** The shop workspace: its staff; any other account is told it is not for them. */
const staff = { ...out, techActive: "200", techEnded: "200", techRevoked: "200", techView: "200", techOtherShop: "200", shopOwner: "200", others: "not-for-this-account" } as const;
/** One vehicle under the actor's own pass: closed once ended or withdrawn, absent for another shop. */
const underOwnPass = { ...staff, techEnded: "pass-closed", techRevoked: "pass-closed", techOtherShop: "404" } as const;
/** The operators' console. */
const operators = { ...out, operator: "200", others: "not-for-this-account" } as const;
/** A development fake: no page without loopback (these requests carry no peer address), except for an operator. */
const fake = { operator: "200", others: "404" } as const;

export const pages: PageEntry[] = [
  { page: "app/(marketing)/page.tsx", what: "landing", expect: { others: "200" } },
  { page: "app/(marketing)/pricing/page.tsx", what: "pricing", expect: { others: "200" } },
  { page: "app/(auth)/sign-in/page.tsx", what: "sign-in", expect: { others: "200" } },
  { page: "app/(auth)/sign-up/page.tsx", what: "sign-up", expect: { others: "200" } },
  { page: "app/(auth)/forgot-password/page.tsx", what: "forgot password", expect: { others: "200" } },
  { page: "app/(auth)/reset-password/page.tsx", what: "reset password", expect: { others: "200" } },
  { page: "app/(driver)/vehicles/page.tsx", what: "my vehicles", expect: anyAccount },
  { page: "app/(driver)/vehicles/new/page.tsx", what: "add a vehicle", expect: anyAccount },
  { page: "app/(driver)/vehicles/[vehicleId]/page.tsx", what: "the owner's vehicle", params: v, expect: ownersOnly },
  { page: "app/(driver)/vehicles/[vehicleId]/check/page.tsx", what: "record a check", params: v, expect: ownersOnly },
  { page: "app/(driver)/vehicles/[vehicleId]/edit/page.tsx", what: "change or delete the vehicle", params: v, expect: ownersOnly },
  { page: "app/(driver)/vehicles/[vehicleId]/hand-on/page.tsx", what: "hand the vehicle on", params: v, expect: ownersOnly },
  { page: "app/(driver)/vehicles/[vehicleId]/print/page.tsx", what: "printable history", params: v, expect: ownersOnly },
  { page: "app/(driver)/vehicles/handed-on/[snapshotId]/page.tsx", what: "a handed-on copy that does not exist", params: () => ({ snapshotId: NONE }), expect: { ...out, others: "404" } },
  { page: "app/(driver)/sets/[setId]/page.tsx", what: "the owner's set", params: (w) => ({ setId: w.car.set.id }), expect: ownersOnly },
  { page: "app/(driver)/log-purchase/page.tsx", what: "log a purchase", expect: anyAccount },
  { page: "app/(driver)/passes/page.tsx", what: "my shop passes", expect: anyAccount },
  { page: "app/(driver)/reminders/page.tsx", what: "reminders", expect: anyAccount },
  { page: "app/(driver)/account/page.tsx", what: "account", expect: anyAccount },
  { page: "app/(driver)/account/billing/page.tsx", what: "billing", expect: anyAccount },
  { page: "app/(shop)/open-a-shop/page.tsx", what: "open a shop", expect: anyAccount },
  { page: "app/(shop)/shop/page.tsx", what: "the shop's passes", expect: staff },
  { page: "app/(shop)/shop/profile/page.tsx", what: "the shop's profile (owners edit, staff read a note)", expect: staff },
  { page: "app/(shop)/shop/passes/[passId]/page.tsx", what: "the actor's pass", params: (w, a) => ({ passId: w.passFor(a) }), expect: { ...underOwnPass, techActive: "redirect /shop/passes/:id/:id", techView: "redirect /shop/passes/:id/:id", shopOwner: "redirect /shop/passes/:id/:id" } },
  { page: "app/(shop)/shop/passes/[passId]/[vehicleId]/page.tsx", what: "a vehicle under the actor's pass", params: (w, a) => ({ passId: w.passFor(a), ...v(w) }), expect: underOwnPass },
  { page: "app/(shop)/shop/passes/[passId]/[vehicleId]/print/page.tsx", what: "printable history under the actor's pass", params: (w, a) => ({ passId: w.passFor(a), ...v(w) }), expect: underOwnPass },
  { page: "app/(admin)/admin/page.tsx", what: "accounts", expect: operators },
  { page: "app/(admin)/admin/shops/page.tsx", what: "shops", expect: operators },
  { page: "app/(admin)/admin/audit/page.tsx", what: "audit log", expect: operators },
  { page: "app/dev/outbox/page.tsx", what: "the outbox fake (not from loopback)", expect: fake },
  { page: "app/dev/outbox/[id]/page.tsx", what: "a message that does not exist", params: () => ({ id: NONE }), expect: { others: "404" } },
  { page: "app/dev/stripe/page.tsx", what: "the payments fake", expect: fake },
  { page: "app/dev/stripe/checkout/[sessionId]/page.tsx", what: "a checkout", params: () => ({ sessionId: "cs_test_none" }), expect: { others: "404" } },
  { page: "app/dev/stripe/invoice/[invoiceId]/page.tsx", what: "an invoice", params: () => ({ invoiceId: "in_test_none" }), expect: { others: "404" } },
  { page: "app/join/[invitationId]/page.tsx", what: "a shop invitation that does not exist", params: () => ({ invitationId: "no-such-invitation" }), expect: { others: "200" } },
  { page: "app/keep/[token]/page.tsx", what: "a co-keeper link that does not exist", params: () => ({ token: "no-such-token" }), expect: { others: "200" } },
  { page: "app/take-on/[token]/page.tsx", what: "a hand-on link that does not exist", params: () => ({ token: "no-such-token" }), expect: { others: "200" } },
  { page: "app/unsubscribe/[token]/page.tsx", what: "an unsubscribe link that does not verify", params: () => ({ token: "not-a-token" }), expect: { others: "200" } },
];
