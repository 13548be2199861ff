// Pages in the authorisation matrix: each page under app/ rendered as each
// actor through the same stand-in for Next's request scope the actions use
// (act.ts). A page is its route group's layouts and the page itself, called
// as Next calls them (async server components, params as promises); what the
// visitor gets is the first of them that redirects, is not found, or shows
// "Not for this account", else the page (200). The root layout (fonts, the
// viewer's formats) checks nobody and is not called.
import fs from "node:fs";
import path from "node:path";
import { isValidElement, type ReactNode } from "react";
import { PassClosed } from "@/components/passes/pass-closed";
import { NotForThisAccount } from "@/components/shell/not-for-this-account";
import { AppError } from "@/lib/errors";
import { asActor } from "./act";
import type { Actor } from "./types";
import type { World } from "./world";

/**
 * "200"; "sign-in" (a redirect to the sign-in page); "not-for-this-account";
 * "pass-closed" (the page says the pass has ended, and shows nothing of the
 * logbook); "404"; "redirect <path>" (ids written as :id); "error <code>" (a
 * refusal thrown as the app's error, shown by the error page).
 */
export type PageOutcome = "200" | "sign-in" | "not-for-this-account" | "pass-closed" | "404" | `redirect ${string}` | `error ${string}`;

export type PageEntry = {
  /** The page file, e.g. "app/(driver)/vehicles/[vehicleId]/page.tsx". */
  page: string;
  what: string;
  params?: (w: World, a: Actor) => Record<string, string>;
  search?: (w: World, a: Actor) => Record<string, string>;
  expect: Partial<Record<Actor | "others", PageOutcome>>;
};

export const expectedPage = (e: PageEntry, a: Actor): PageOutcome => {
  const v = e.expect[a] ?? e.expect.others;
  if (v === undefined) throw new Error(`${e.page}: no expectation for ${a}`);
  return v;
};

const ROOT = path.resolve(import.meta.dirname, "../../../..");

/** Every page.tsx under app/, relative to the repository. */
export function pagesUnderApp(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
      const p = path.join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name === "page.tsx") found.push(path.relative(ROOT, p).split(path.sep).join("/"));
    }
  };
  walk(path.join(ROOT, "app"));
  return found.sort();
}

function layoutsOf(page: string): string[] {
  const parts = path.dirname(page).split("/");
  const out: string[] = [];
  // From the first folder below app/ down to the page's own folder.
  for (let i = 2; i <= parts.length; i++) {
    const f = `${parts.slice(0, i).join("/")}/layout.tsx`;
    if (fs.existsSync(path.join(ROOT, f))) out.push(f);
  }
  return out;
}

/** The refusal a rendered tree shows in place of the page, if any. */
function refusalIn(node: ReactNode, depth = 0): PageOutcome | null {
  if (depth > 12 || node === null || node === undefined || typeof node !== "object") return null;
  if (Array.isArray(node)) {
    for (const n of node) {
      const r = refusalIn(n as ReactNode, depth + 1);
      if (r) return r;
    }
    return null;
  }
  if (!isValidElement(node)) return null;
  if (node.type === NotForThisAccount) return "not-for-this-account";
  if (node.type === PassClosed) return "pass-closed";
  return refusalIn((node.props as { children?: ReactNode }).children, depth + 1);
}

type Component = (props: Record<string, unknown>) => Promise<ReactNode> | ReactNode;

async function outcomeOf(fn: () => Promise<ReactNode> | ReactNode): Promise<PageOutcome> {
  try {
    return refusalIn(await fn()) ?? "200";
  } catch (err) {
    const digest = (err as { digest?: unknown })?.digest;
    if (typeof digest === "string" && digest.startsWith("NEXT_REDIRECT")) {
      const to = digest.split(";")[2] ?? "";
      return to.startsWith("/sign-in") ? "sign-in" : `redirect ${to.split("?")[0].replace(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/g, ":id")}`;
    }
    if (typeof digest === "string" && digest === "NEXT_HTTP_ERROR_FALLBACK;404") return "404";
    // A refusal thrown as the app's error (the error page shows it): never data.
    if (err instanceof AppError && err.status < 500) return `error ${err.code}`;
    throw err;
  }
}

/** What the actor gets for the page, and what the page alone (without its layouts) gives. */
export async function renderPage(w: World, a: Actor, e: PageEntry): Promise<{ outcome: PageOutcome; pageAlone: PageOutcome }> {
  const params = Promise.resolve(e.params?.(w, a) ?? {});
  const searchParams = Promise.resolve(e.search?.(w, a) ?? {});
  return asActor(w, a, async () => {
    let outcome: PageOutcome | undefined;
    for (const file of layoutsOf(e.page)) {
      const Layout = ((await import(/* @vite-ignore */ path.join(ROOT, file))) as { default: Component }).default;
      const r = await outcomeOf(() => Layout({ children: null, params }));
      if (r !== "200") {
        outcome = r;
        break;
      }
    }
    const Page = ((await import(/* @vite-ignore */ path.join(ROOT, e.page))) as { default: Component }).default;
    // Next renders the page beside its layouts, so it runs even where a layout refuses.
    const pageAlone = await outcomeOf(() => Page({ params, searchParams }));
    return { outcome: outcome ?? pageAlone, pageAlone };
  });
}
