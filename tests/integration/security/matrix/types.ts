// The authorisation matrix, as data. Each area keeps its routes in a file of
// its own here (`<area>.matrix.ts`, exporting `entries`); matrix.test.ts
// loads every such file, runs every entry as every actor, and fails when a
// route handler or server action under app/ has no entry. See DEVELOPERS.md.
import type { World } from "./world";

export const ACTORS = [
  "signedOut",
  "owner",
  "otherDriver",
  "techActive",
  "techEnded",
  "techRevoked",
  "techView",
  "techOtherShop",
  "removedTech",
  "shopOwner",
  "operator",
  "disabled",
] as const;
export type Actor = (typeof ACTORS)[number];

/** What a call produced: an HTTP status (route handlers) or an action result mapped onto one. */
export type Outcome = { status: number };

export type MatrixEntry = {
  /** The file under app/, e.g. "app/api/vehicles/route.ts". */
  file: string;
  /** The exported name: an HTTP method for a route.ts, the function name for an actions.ts. */
  exportName: string;
  /** A few words on what is called and with what (shown in failures). */
  what: string;
  /** Runs once before the actors' calls (shared targets made here are not counted as writes of a refusal). */
  prepare?: (w: World) => Promise<void>;
  /** Calls the handler as the actor; may prepare a fresh target (for deletes) first. */
  call: (w: World, actor: Actor) => Promise<Outcome>;
  /** Expected status per actor; `others` covers the actors not named. */
  expect: Partial<Record<Actor | "others", number>>;
};

export const expected = (e: MatrixEntry, a: Actor): number => {
  const v = e.expect[a] ?? e.expect.others;
  if (v === undefined) throw new Error(`${e.file} ${e.exportName}: no expectation for ${a}`);
  return v;
};

// Presets for the common shapes of permission.
export const ownerOnly = (ok: number) => ({ owner: ok, signedOut: 401, disabled: 403, others: 404 });
export const anySignedIn = (ok: number) => ({ signedOut: 401, disabled: 403, others: ok });
export const everyone = (status: number) => ({ others: status });
/** Under a pass: the shop's members while it lasts; view-only passes cannot write. */
export const underPass = (ok: number, write: boolean) => ({
  techActive: ok,
  shopOwner: ok,
  techView: write ? 403 : ok,
  techEnded: 403,
  techRevoked: 403,
  signedOut: 401,
  disabled: 403,
  others: 404,
});
/** A shop's owner; its technicians are forbidden; everyone else finds no shop. */
export const shopOwnerOnly = (ok: number) => ({
  shopOwner: ok,
  techActive: 403,
  techEnded: 403,
  techRevoked: 403,
  techView: 403,
  signedOut: 401,
  disabled: 403,
  others: 404,
});
