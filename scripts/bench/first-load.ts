// First-load JS of every page of a build, from its manifests (no server
// needed): the root scripts plus the chunks of the page and its layouts,
// gzip -9, against the 170 KiB budget for driver and shop pages. Scripts a
// page loads later (dynamic imports: the wear chart, the toasts) are not
// counted. Usage: tsx scripts/bench/first-load.ts [.next-bench]
import fs from "node:fs";
import path from "node:path";
import vm from "node:vm";
import zlib from "node:zlib";

const dist = path.resolve(process.argv[2] ?? ".next-bench");
const BUDGET_KIB = 170;
const manifest = JSON.parse(fs.readFileSync(path.join(dist, "build-manifest.json"), "utf8")) as { rootMainFiles: string[] };
const sizes = new Map<string, number>();
const gz = (f: string) => {
  if (!sizes.has(f)) sizes.set(f, zlib.gzipSync(fs.readFileSync(path.join(dist, f)), { level: 9 }).length);
  return sizes.get(f)!;
};

type Rsc = { entryJSFiles: Record<string, string[]> };
const rows: { page: string; kib: number; scripts: number }[] = [];
for (const file of fs.readdirSync(path.join(dist, "server/app"), { recursive: true }) as string[]) {
  if (!file.endsWith("page_client-reference-manifest.js")) continue;
  const sandbox = { globalThis: {} as { __RSC_MANIFEST?: Record<string, Rsc> } };
  vm.runInNewContext(fs.readFileSync(path.join(dist, "server/app", file), "utf8"), sandbox);
  const [key, m] = Object.entries(sandbox.globalThis.__RSC_MANIFEST ?? {})[0] ?? [];
  if (!key || !m) continue;
  const route = key.replace(/\/page$/, "");
  const files = new Set(manifest.rootMainFiles);
  for (const [entry, list] of Object.entries(m.entryJSFiles)) {
    const segment = entry.replace("[project]/app", "").replace(/\/(page|layout)$/, "");
    const isLayout = entry.endsWith("/layout") && (route === segment || route.startsWith(`${segment}/`) || segment === "");
    if (isLayout || entry === `[project]/app${key}`) list.forEach((f) => files.add(f));
  }
  const bytes = [...files].reduce((n, f) => n + gz(f), 0);
  rows.push({ page: route || "/", kib: bytes / 1024, scripts: files.size });
}
rows.sort((a, b) => b.kib - a.kib);
let over = 0;
for (const r of rows) {
  const budgeted = /^\/\((driver|shop)\)/.test(r.page);
  if (budgeted && r.kib > BUDGET_KIB) over += 1;
  console.log(`${r.kib.toFixed(1).padStart(7)} KiB  ${String(r.scripts).padStart(2)} scripts  ${r.page}${budgeted ? (r.kib > BUDGET_KIB ? "  FALLS SHORT of 170" : "  within 170") : ""}`);
}
console.log(`${over} driver/shop pages above ${BUDGET_KIB} KiB`);
