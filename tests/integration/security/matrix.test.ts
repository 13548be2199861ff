// The authorisation matrix (issue 9): every route handler and server action
// under app/, called as every actor, against the expected status; every
// refusal leaves every table's row count as it was. A route or action that
// no matrix file lists fails the first test. Matrix files: matrix/*.matrix.ts.
import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { ACTORS, expected, type MatrixEntry } from "./matrix/types";
import { expectedPage, pagesUnderApp, renderPage } from "./matrix/pages";
import { pages } from "./matrix/pages.matrix";
import { buildWorld, rowCounts, type World } from "./matrix/world";

vi.mock("next/headers", () => ({
  headers: async () => (globalThis as { __matrixHeaders?: Headers }).__matrixHeaders ?? new Headers(),
  cookies: async () => ({ get: () => undefined, getAll: () => [], has: () => false, set: () => {}, delete: () => {} }),
}));
vi.mock("next/cache", () => ({ revalidatePath: () => {}, revalidateTag: () => {} }));

const files = import.meta.glob<{ entries: MatrixEntry[] }>("./matrix/*.matrix.ts", { eager: true });
const entries = Object.values(files).flatMap((m) => m.entries ?? []);

const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"];

/** Every route.ts and actions.ts under app/, with its exported handlers. */
async function handlersUnderApp(): Promise<string[]> {
  const root = path.resolve(import.meta.dirname, "../../..");
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
      const p = path.join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name === "route.ts" || e.name === "actions.ts") found.push(path.relative(root, p).split(path.sep).join("/"));
    }
  };
  walk(path.join(root, "app"));
  const out: string[] = [];
  for (const file of found) {
    const mod = (await import(/* @vite-ignore */ path.join(root, file))) as Record<string, unknown>;
    for (const [name, value] of Object.entries(mod)) {
      if (typeof value !== "function") continue;
      if (file.endsWith("route.ts") && !HTTP_METHODS.includes(name)) continue;
      out.push(`${file} ${name}`);
    }
  }
  return out.sort();
}

let world: World;
beforeAll(async () => {
  world = await buildWorld();
}, 120_000);

describe("authorisation matrix", () => {
  it("lists every route handler and server action under app/", async () => {
    const listed = new Set(entries.map((e) => `${e.file} ${e.exportName}`));
    const missing = (await handlersUnderApp()).filter((h) => !listed.has(h));
    expect(missing, "add these to a tests/integration/security/matrix/*.matrix.ts file").toEqual([]);
  }, 120_000);

  it("lists every page under app/", () => {
    const listed = new Set(pages.map((p) => p.page));
    expect(pagesUnderApp().filter((p) => !listed.has(p)), "add these to matrix/pages.matrix.ts").toEqual([]);
  });

  // Pages first: the route entries change the world (they open shops, end passes…).
  for (const entry of pages) {
    it(`${entry.page}: ${entry.what}`, async () => {
      const wrong: string[] = [];
      for (const actor of ACTORS) {
        const want = expectedPage(entry, actor);
        // A page under a pass writes its visit to the driver's access log; a refusal writes nothing.
        const before = want !== "200" ? await rowCounts() : undefined;
        const { outcome, pageAlone } = await renderPage(world, actor, entry);
        if (outcome !== want) wrong.push(`${actor}: ${outcome}, expected ${want}`);
        // Next runs a page beside its layouts (it does not wait for the layout's check), so a page refuses by itself too.
        if (want !== "200" && !want.startsWith("redirect") && pageAlone === "200") wrong.push(`${actor}: the page alone renders (only its layout refuses)`);
        if (before) {
          const after = await rowCounts();
          const changed = Object.keys(before).filter((t) => before[t] !== after[t]);
          if (changed.length) wrong.push(`${actor}: refused but changed ${changed.map((t) => `${t} ${before[t]}→${after[t]}`).join(", ")}`);
        }
      }
      expect(wrong).toEqual([]);
    }, 60_000);
  }

  for (const entry of entries) {
    it(`${entry.file} ${entry.exportName}: ${entry.what}`, async () => {
      const wrong: string[] = [];
      await entry.prepare?.(world);
      for (const actor of ACTORS) {
        const want = expected(entry, actor);
        const before = want >= 400 ? await rowCounts() : undefined;
        const { status } = await entry.call(world, actor);
        if (status >= 500) wrong.push(`${actor}: 5xx (${status})`);
        else if (status !== want) wrong.push(`${actor}: ${status}, expected ${want}`);
        if (before) {
          const after = await rowCounts();
          const changed = Object.keys(before).filter((t) => before[t] !== after[t]);
          // A refused call may only have prepared its own target (fresh rows made before the call).
          if (changed.length && !entry.what.startsWith("withdraw an invitation") && !entry.what.startsWith("remove a technician") && !entry.what.startsWith("disable a throw-away"))
            wrong.push(`${actor}: refused but changed ${changed.map((t) => `${t} ${before[t]}→${after[t]}`).join(", ")}`);
        }
      }
      expect(wrong).toEqual([]);
    }, 120_000);
  }

  it("counts what was checked", () => {
    const cells = entries.length * ACTORS.length;
    console.log(`authorisation matrix: ${entries.length} route handlers and actions × ${ACTORS.length} actors = ${cells} cells; ${pages.length} pages × ${ACTORS.length} actors = ${pages.length * ACTORS.length} cells`);
    expect(cells).toBeGreaterThan(0);
  });
});
