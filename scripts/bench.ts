// `npm run bench`: the computation core's figures, then the whole app under
// load. It builds into .next-bench, loads two data folders (the demo, and the
// large set: 2,000 drivers, 4,000 vehicles, ~50,000 tires, 300,000 checks
// with 1.2 M groove readings, 200 shops, 5,000 open passes, a ten-year
// weekly-check car, a shop with 500 open passes), starts `next start` on
// loopback, drives each endpoint with autocannon (10 connections) from this
// process, and prints req/s, p50, p99, errors, the ratio to GET /api/auth/ok
// of the same run, the server's peak RSS, the data folder's size and EXPLAIN
// verdicts, then the budgets as pass / fall short. Not part of `npm test`.
//
// BENCH_SECONDS (default 8) per endpoint, after BENCH_WARM_SECONDS (2) not counted; BENCH_SIZES=demo,large;
// BENCH_SKIP_BUILD=1 reuses .next-bench; BENCH_REUSE_DATA=1 keeps loaded folders;
// BENCH_SKIP_CORE=1 skips the computation core; BENCH_PORT (default 3390, and the next one);
// BENCH_EXPLAIN_ONLY=1 (with BENCH_DIR) prints the EXPLAIN verdicts of folders loaded before.
// BENCH_THREADS=worker,main serves each data set once per place PGlite runs
// (FOURPATCH_PGLITE_THREAD) and prints them side by side; default: worker.
// BENCH_QUICK=1: 3 s per endpoint, no computation core, no EXPLAIN, no
// first-load JS, no Lighthouse (a few minutes with BENCH_SKIP_BUILD=1 BENCH_REUSE_DATA=1).
// Lighthouse (scripts/bench/lighthouse.ts) runs on the demo after the first-load
// JS; BENCH_LIGHTHOUSE_ONLY=1 runs just that, on the demo folder loaded before
// (loading it if there is none) and the build there is (building if none).
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import zlib from "node:zlib";
import path from "node:path";
import autocannon from "autocannon";
import { PGlite } from "@electric-sql/pglite";
import { acquireDataDirLock } from "@/db/lock";
import { benchCore } from "./bench/core";
import { runLighthouse, type LighthouseResult } from "./bench/lighthouse";

const root = path.resolve(import.meta.dirname, "..");
const QUICK = process.env.BENCH_QUICK === "1";
const LIGHTHOUSE_ONLY = process.env.BENCH_LIGHTHOUSE_ONLY === "1";
const SECONDS = Number(process.env.BENCH_SECONDS ?? (QUICK ? 3 : 8));
/** Uncounted warm-up per endpoint (BENCH_WARM_SECONDS). */
const WARM_SECONDS = Number(process.env.BENCH_WARM_SECONDS ?? 2);
const THREADS = (process.env.BENCH_THREADS ?? "worker").split(",").filter((s) => s === "worker" || s === "main") as ("worker" | "main")[];
const SIZES = (process.env.BENCH_SIZES ?? "demo,large").split(",").filter((s) => s === "demo" || s === "large") as ("demo" | "large")[];
const DIST = ".next-bench";
const PASSWORD = "tread-carefully-26";
const started = Date.now();
const elapsed = () => `${((Date.now() - started) / 1000).toFixed(0)} s`;
const log = (s: string) => console.log(s);

type Fixture = {
  size: "demo" | "large";
  adaCarId: string;
  adaSetId: string;
  adaTireIds: string[];
  passId: string | null;
  passVehicleId: string | null;
  bigCarId: string | null;
  bigCarOwnerEmail: string;
  feedToken: string;
};

type Endpoint = {
  name: string;
  method?: "GET" | "POST";
  path: string;
  as?: "ada" | "jo" | "big";
  body?: () => string;
  headers?: Record<string, string>;
  /** Budgeted against the trivial route. */
  budget?: { demo?: number; large?: number; p99Demo?: number };
  okStatus?: number[];
};

type Result = { name: string; threadMsPerReq: number; cpuMsPerReq: number; reqs: number; p50: number; p99: number; errors: number; non2xx: number; bytes: number; status: number; ratio?: number; budget?: Endpoint["budget"] };

function du(dir: string): number {
  return Number(execFileSync("du", ["-sk", dir]).toString().split(/\s/)[0]) * 1024;
}

function groupRssPeak(pgid: number): { peakMb: number; pids: number } {
  // VmHWM is each process's own peak; the server is the largest of them.
  let peak = 0;
  let pids = 0;
  for (const pid of fs.readdirSync("/proc").filter((p) => /^\d+$/.test(p))) {
    try {
      const stat = fs.readFileSync(`/proc/${pid}/stat`, "utf8");
      const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      if (Number(fields[2]) !== pgid) continue;
      const hwm = /VmHWM:\s+(\d+) kB/.exec(fs.readFileSync(`/proc/${pid}/status`, "utf8"));
      if (hwm) {
        pids += 1;
        peak = Math.max(peak, Number(hwm[1]) / 1024);
      }
    } catch {
      // The process ended meanwhile.
    }
  }
  return { peakMb: peak, pids };
}

/** Ticks of CPU time (utime + stime) in a /proc stat line. */
function ticks(statFile: string): number {
  const stat = fs.readFileSync(statFile, "utf8");
  const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
  return Number(f[11]) + Number(f[12]);
}

/**
 * CPU time of the server (the group's largest process): its request thread
 * (the main thread) and the whole process, in ms. CPU time, unlike latency,
 * hardly moves when other work shares the machine.
 */
function serverCpu(pgid: number): { threadMs: number; processMs: number } {
  let best = { rss: 0, pid: 0 };
  for (const pid of fs.readdirSync("/proc").filter((p) => /^\d+$/.test(p))) {
    try {
      const stat = fs.readFileSync(`/proc/${pid}/stat`, "utf8");
      if (Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[2]) !== pgid) continue;
      const rss = Number(/VmRSS:\s+(\d+) kB/.exec(fs.readFileSync(`/proc/${pid}/status`, "utf8"))?.[1] ?? 0);
      if (rss > best.rss) best = { rss, pid: Number(pid) };
    } catch {
      // Gone meanwhile.
    }
  }
  if (!best.pid) return { threadMs: 0, processMs: 0 };
  const TICK_MS = 10; // CLK_TCK is 100 on Linux
  return { threadMs: ticks(`/proc/${best.pid}/task/${best.pid}/stat`) * TICK_MS, processMs: ticks(`/proc/${best.pid}/stat`) * TICK_MS };
}

function run(cmd: string, args: string[], env: Record<string, string>) {
  execFileSync(cmd, args, { cwd: root, env: { ...process.env, ...env }, stdio: ["ignore", "ignore", "inherit"] });
}

async function waitFor(url: string, ms: number) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      const r = await fetch(url);
      if (r.ok) return;
    } catch {
      // Not up yet.
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`The server did not answer ${url} within ${ms / 1000} s`);
}

async function signIn(base: string, email: string): Promise<string> {
  const r = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  if (!r.ok) throw new Error(`sign-in of ${email} failed: ${r.status} ${await r.text()}`);
  return r.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

function cannon(opts: autocannon.Options): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => {
    autocannon(opts, (err, res) => (err ? reject(err) : resolve(res)));
  });
}

// ---------------------------------------------------------------- EXPLAIN

const LARGE_TABLES = new Set(["tread_reading", "tread_check", "tire", "tire_set", "vehicle", "service_entry", "shop_pass", "shop_pass_vehicle", "access_log", "user", "account", "odometer_reading", "reminder_feed", "driver_profile", "member"]);

type Plan = { "Node Type": string; "Relation Name"?: string; "Plan Rows"?: number; Plans?: Plan[] };

/** A table is large from this many rows: below it a sequential scan is what a good plan does. */
const LARGE_ROWS = 10_000;

function seqScans(plan: Plan, large: Set<string>, out: string[] = []): string[] {
  if (plan["Node Type"] === "Seq Scan" && plan["Relation Name"] && large.has(plan["Relation Name"])) out.push(plan["Relation Name"]);
  for (const p of plan.Plans ?? []) seqScans(p, large, out);
  return out;
}

async function explainAll(dataDir: string, fx: Fixture): Promise<{ name: string; verdict: string; ok: boolean }[]> {
  const release = acquireDataDirLock(dataDir);
  const pg = new PGlite(dataDir);
  try {
    const [{ id: adaId }] = (await pg.query<{ id: string }>(`select owner_id as id from vehicle where id = $1`, [fx.adaCarId])).rows;
    // Counted, not taken from the statistics: a folder that never ran ANALYZE has none.
    const large = new Set<string>();
    for (const t of LARGE_TABLES) {
      const n = (await pg.query<{ n: number }>(`select count(*)::int as n from "${t}"`)).rows[0].n;
      if (n >= LARGE_ROWS) large.add(t);
    }
    const car = fx.bigCarId ?? fx.adaCarId;
    const one = async (sql: string) => (await pg.query<{ id: string }>(sql)).rows[0]?.id ?? "00000000-0000-0000-0000-000000000000";
    const someCheck = await one(`select id from tread_check order by id limit 1`);
    const someService = await one(`select id from service_entry order by id limit 1`);
    const somePass = fx.passId ?? (await one(`select id::text from shop_pass limit 1`));
    const queries: [string, string, string?][] = [
      ["readings of a vehicle", `select r.* from tread_reading r join tread_check c on c.id = r.check_id where c.vehicle_id = '${car}'`],
      ["a page of a vehicle's checks", `select * from tread_check where vehicle_id = '${car}' order by checked_on desc, id desc limit 51`],
      ["tires of a vehicle", `select t.* from tire t join tire_set s on s.id = t.set_id where s.vehicle_id = '${car}'`],
      ["service entries of a vehicle", `select * from service_entry where vehicle_id = '${car}' order by performed_on desc limit 51`],
      ["odometer of a vehicle", `select * from odometer_reading where vehicle_id = '${car}'`],
      ["overview: a driver's vehicles and sets", `select s.* from tire_set s join vehicle v on v.id = s.vehicle_id where v.owner_id = '${adaId}' and s.state in ('mounted','stored')`],
      [
        "shop's pass list (still visible)",
        `select * from shop_pass where shop_id in ('shop_quillby_tread_works') and ended_at > now() order by ended_at, id limit 51`,
        `select * from shop_pass where shop_id in ('shop_quillby_tread_works') and least(ends_at, coalesce(revoked_at, ends_at)) > now() - interval '48 hours' order by ends_at`,
      ],
      ["vehicles of listed passes", `select * from shop_pass_vehicle where pass_id in ('${somePass}')`],
      ["access log of a vehicle", `select a.* from access_log a join vehicle v on v.id = a.vehicle_id where v.owner_id = '${adaId}' and a.vehicle_id = '${fx.adaCarId}' order by a.at desc, a.id desc limit 51`],
      ["access log of a driver", `select a.* from access_log a join vehicle v on v.id = a.vehicle_id where v.owner_id = '${adaId}' order by a.at desc, a.id desc limit 51`],
      ["checks under a pass", `select count(*) from tread_check where pass_id = '${somePass}'`],
      ["service entries under a pass", `select count(*) from service_entry where pass_id = '${somePass}'`],
      ["checks of a service entry (delete path)", `select id from tread_check where service_entry_id = '${someService}'`],
      ["service entries of a set (delete path)", `select id from service_entry where set_id = '${fx.adaSetId}'`],
      ["readings of a check (delete path)", `select id from tread_reading where check_id = '${someCheck}'`],
      ["passes of a driver", `select * from shop_pass where driver_id = '${adaId}' order by created_at desc limit 200`],
      [
        "due pass-ended notices",
        `select id from shop_pass where end_notice_sent_at is null and ended_at <= now() order by ended_at limit 500`,
        `select id from shop_pass where end_notice_sent_at is null and (ends_at <= now() or (revoked_at is not null and revoked_at <= now())) limit 500`,
      ],
      ["feed by its secret", `select * from reminder_feed where token_hash = 'x' and revoked_at is null`],
    ];
    const out: { name: string; verdict: string; ok: boolean }[] = [];
    for (const [name, sql, fallback] of queries) {
      let plan: Plan | null = null;
      for (const text of [sql, fallback].filter(Boolean) as string[]) {
        try {
          const res = await pg.query<{ "QUERY PLAN": { Plan: Plan }[] }>(`explain (format json) ${text}`);
          plan = res.rows[0]["QUERY PLAN"][0].Plan;
          break;
        } catch {
          // The older schema lacks the column: try the older form.
        }
      }
      if (!plan) {
        out.push({ name, verdict: "could not explain", ok: false });
        continue;
      }
      const scans = seqScans(plan, large);
      out.push({ name, verdict: scans.length ? `SEQ SCAN of ${[...new Set(scans)].join(", ")}` : "no sequential scan of a large table", ok: scans.length === 0 });
    }
    return out;
  } finally {
    await pg.close();
    release();
  }
}

// ---------------------------------------------------------------- the run

type Stall = { aloneP50: number; aloneP99: number; besideP50: number; besideP99: number; heavyReqs: number; heavyP50: number };

async function benchSize(size: "demo" | "large", port: number, thread: "worker" | "main", loadData: boolean) {
  const dataDir = path.join(root, ".bench", size);
  const fixtureFile = path.join(root, ".bench", `${size}.json`);
  if (loadData && ((process.env.BENCH_REUSE_DATA !== "1" && !LIGHTHOUSE_ONLY) || !fs.existsSync(fixtureFile))) {
    fs.rmSync(dataDir, { recursive: true, force: true });
    const t0 = Date.now();
    run("npx", ["tsx", "--tsconfig", "scripts/tsconfig.json", "scripts/bench/load.ts", size, fixtureFile], { FOURPATCH_DATA_DIR: dataDir, DATABASE_URL: "" });
    log(`[${elapsed()}] loaded ${size} in ${((Date.now() - t0) / 1000).toFixed(0)} s, data folder ${(du(dataDir) / 1e6).toFixed(0)} MB`);
  }
  const fx = JSON.parse(fs.readFileSync(fixtureFile, "utf8")) as Fixture;
  // Compared runs each start from the loaded data (the POST endpoint adds checks, so a later run would serve a longer logbook).
  const served = THREADS.length > 1 ? `${dataDir}-served` : dataDir;
  if (served !== dataDir) {
    fs.rmSync(served, { recursive: true, force: true });
    fs.cpSync(dataDir, served, { recursive: true });
  }
  const base = `http://127.0.0.1:${port}`;
  // The production start (scripts/start.sh: next start with its heap bound).
  const server: ChildProcess = spawn("bash", ["scripts/start.sh", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: root,
    detached: true,
    stdio: ["ignore", "ignore", "inherit"],
    env: {
      ...process.env,
      NODE_ENV: "production",
      NEXT_DIST_DIR: DIST,
      FOURPATCH_DATA_DIR: served,
      DATABASE_URL: "",
      FOURPATCH_PGLITE_THREAD: thread,
      BETTER_AUTH_URL: base,
      BETTER_AUTH_SECRET: "bench-only-secret-0c7d1e5f9a3b4c2d8e6f",
      FOURPATCH_SCHEDULER: "off",
      FOURPATCH_AUTH_RATE_LIMIT: "off",
      FOURPATCH_EMAIL_DELIVERY: "skip",
      // A production server without real e-mail and payment keys refuses to
      // start unless the local fakes are on (loopback only, as here).
      FOURPATCH_DEV_FAKES: "on",
    },
  });
  const pgid = server.pid!;
  let peak = 0;
  const sampler = setInterval(() => (peak = Math.max(peak, groupRssPeak(pgid).peakMb)), 500);
  const results: Result[] = [];
  let stall: Stall | null = null;
  const firstLoad: { name: string; kib: number; scripts: number; htmlKib: number }[] = [];
  let lighthouse: LighthouseResult[] = [];
  const lighthousePages = (cookies: { ada: string; jo: string }) => [
    { name: "landing /", path: "/" },
    { name: "overview /vehicles", path: "/vehicles", cookie: cookies.ada },
    { name: "set page", path: `/sets/${fx.adaSetId}`, cookie: cookies.ada },
    ...(fx.passId ? [{ name: "technician view", path: `/shop/passes/${fx.passId}/${fx.passVehicleId}`, cookie: cookies.jo }] : []),
  ];
  try {
    await waitFor(`${base}/api/auth/ok`, 120_000);
    const cookies = {
      ada: await signIn(base, "ada@renwick.test"),
      jo: await signIn(base, "jo@quillby-tread.test"),
      big: fx.bigCarId ? await signIn(base, fx.bigCarOwnerEmail) : "",
    };
    if (LIGHTHOUSE_ONLY) {
      lighthouse = await runLighthouse(base, lighthousePages(cookies));
      return { size, thread, results, peak, dataBytes: 0, walBytes: 0, explains: [], stall, firstLoad, lighthouse };
    }
    // First-load JS and Lighthouse before the endpoints run: "POST a tread
    // check" adds hundreds of checks to Ada's set, and the pages would be
    // measured on a logbook no household keeps. (The ten-year car of the large
    // set is the long-history case.)
    // First-load JS of each page: the scripts its HTML loads, gzipped (what a phone downloads before it can respond).
    const pages: [string, string, string][] = [
      ["landing /", "/", ""],
      ["overview /vehicles", "/vehicles", cookies.ada],
      ["vehicle page", `/vehicles/${fx.adaCarId}`, cookies.ada],
      ["set page", `/sets/${fx.adaSetId}`, cookies.ada],
      ["shop pass list /shop", "/shop", cookies.jo],
      ...(fx.passId ? [["technician view", `/shop/passes/${fx.passId}/${fx.passVehicleId}`, cookies.jo] as [string, string, string]] : []),
    ];
    for (const [name, p, cookie] of QUICK ? [] : pages) {
      const html = await (await fetch(`${base}${p}`, { headers: cookie ? { cookie } : {} })).text();
      // Not the noModule polyfills: a browser that runs modules (every one the app supports) never fetches them.
      const srcs = [...new Set([...html.matchAll(/<script([^>]*)\ssrc="([^"]+\.js)"([^>]*)>/g)].filter((m) => !/nomodule/i.test(m[1] + m[3])).map((m) => m[2]))];
      let gz = 0;
      for (const src of srcs) {
        const file = path.join(root, DIST, src.replace(/^\/_next\//, "").split("?")[0]);
        if (fs.existsSync(file)) gz += zlib.gzipSync(fs.readFileSync(file), { level: 9 }).length;
      }
      firstLoad.push({ name, kib: gz / 1024, scripts: srcs.length, htmlKib: Buffer.byteLength(html) / 1024 });
    }
    // A phone's view of four pages: once, on the demo.
    if (!QUICK && size === "demo" && thread === THREADS[0]) lighthouse = await runLighthouse(base, lighthousePages(cookies));
    const feedPath = `/api/feed/${fx.feedToken}.ics`;
    const feedTag = (await fetch(`${base}${feedPath}`)).headers.get("etag");
    // Each tire's latest depth again: tread does not grow back, and a deeper reading is refused (409) unless confirmed.
    const adaBook = (await (await fetch(`${base}/api/vehicles/${fx.adaCarId}`, { headers: { cookie: cookies.ada } })).json()) as {
      sets: { id: string; tires: { id: string; latest?: { innerMm?: number | null; centreMm?: number | null; outerMm?: number | null } | null }[] }[];
    };
    const latestMm = new Map(
      adaBook.sets.flatMap((s) => s.tires).map((t) => [t.id, Math.min(...[t.latest?.innerMm, t.latest?.centreMm, t.latest?.outerMm].filter((x): x is number => typeof x === "number"), 8)]),
    );
    const checkBody = () =>
      JSON.stringify({
        setId: fx.adaSetId,
        method: "gauge",
        depthUnit: "mm",
        pressureUnit: "kpa",
        odometerUnit: "km",
        readings: fx.adaTireIds.map((tireId) => ({ tireId, centre: latestMm.get(tireId) ?? 5.5 })),
      });
    const endpoints: Endpoint[] = [
      { name: "GET /api/auth/ok (trivial)", path: "/api/auth/ok" },
      { name: "vehicle logbook API", path: `/api/vehicles/${fx.adaCarId}`, as: "ada", budget: { demo: 0.5, large: 0.3, p99Demo: 50 } },
      { name: "overview page /vehicles", path: "/vehicles", as: "ada" },
      { name: "set page", path: `/sets/${fx.adaSetId}`, as: "ada" },
      { name: "calendar feed", path: feedPath, budget: { demo: 0.5, large: 0.3, p99Demo: 50 } },
      ...(feedTag ? [{ name: "calendar feed, unchanged (304)", path: feedPath, headers: { "if-none-match": feedTag }, okStatus: [304] } as Endpoint] : []),
      { name: "shop pass list /shop", path: "/shop", as: "jo" },
      ...(fx.passId ? [{ name: "technician view", path: `/shop/passes/${fx.passId}/${fx.passVehicleId}`, as: "jo" } as Endpoint] : []),
      ...(fx.bigCarId ? [{ name: "ten-year car logbook API", path: `/api/vehicles/${fx.bigCarId}`, as: "big" } as Endpoint] : []),
      { name: "POST a tread check", method: "POST", path: `/api/vehicles/${fx.adaCarId}/checks`, as: "ada", body: checkBody, okStatus: [201] },
    ];
    for (const e of endpoints) {
      const headers: Record<string, string> = { origin: base, ...(e.headers ?? {}) };
      if (e.as) headers.cookie = cookies[e.as];
      if (e.method === "POST") headers["content-type"] = "application/json";
      // One request first: its status and size, and a warm route.
      const first = await fetch(`${base}${e.path}`, { method: e.method ?? "GET", headers, body: e.body?.() });
      const bytes = (await first.arrayBuffer()).byteLength;
      // Then a short run that is not counted: V8 compiles the route's hot code
      // in the first thousand requests or so, and a cold start would measure the compiler.
      await cannon({ url: `${base}${e.path}`, method: e.method ?? "GET", headers, body: e.body?.(), connections: 10, duration: WARM_SECONDS });
      const cpu0 = serverCpu(pgid);
      const r = await cannon({
        url: `${base}${e.path}`,
        method: e.method ?? "GET",
        headers,
        body: e.body?.(),
        connections: 10,
        duration: SECONDS,
      });
      const cpu1 = serverCpu(pgid);
      const done = Math.max(1, r.requests.total);
      const ok = e.okStatus ?? [200];
      // No answer at all within the run is a failure too, not "no errors".
      if (r.requests.total === 0) r.errors += 1;
      const non2xx = ok.includes(304) ? r["3xx"] === 0 ? r.non2xx : r.non2xx - r["3xx"] : r.non2xx;
      results.push({ name: e.name, threadMsPerReq: (cpu1.threadMs - cpu0.threadMs) / done, cpuMsPerReq: (cpu1.processMs - cpu0.processMs) / done, reqs: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, errors: r.errors + r.timeouts, non2xx, bytes, status: first.status, budget: e.budget });
    }

    // One heavy request must not stall the rest: the trivial route alone, then beside the heaviest logbook.
    const heavy = fx.bigCarId ? { path: `/api/vehicles/${fx.bigCarId}`, cookie: cookies.big } : { path: `/api/vehicles/${fx.adaCarId}`, cookie: cookies.ada };
    const alone = await cannon({ url: `${base}/api/auth/ok`, connections: 5, duration: Math.max(3, SECONDS / 2) });
    const [beside, heavyRun] = await Promise.all([
      cannon({ url: `${base}/api/auth/ok`, connections: 5, duration: Math.max(3, SECONDS / 2) }),
      cannon({ url: `${base}${heavy.path}`, headers: { cookie: heavy.cookie }, connections: 5, duration: Math.max(3, SECONDS / 2) }),
    ]);
    stall = {
      aloneP50: alone.latency.p50,
      aloneP99: alone.latency.p99,
      besideP50: beside.latency.p50,
      besideP99: beside.latency.p99,
      heavyReqs: heavyRun.requests.average,
      heavyP50: heavyRun.latency.p50,
    };

  } finally {
    clearInterval(sampler);
    peak = Math.max(peak, groupRssPeak(pgid).peakMb);
    try {
      process.kill(-pgid, "SIGTERM");
    } catch {
      // Already gone.
    }
    await new Promise((r) => setTimeout(r, 1500));
    try {
      process.kill(-pgid, "SIGKILL");
    } catch {
      // Stopped.
    }
  }
  const trivial = results[0]?.reqs || 1;
  for (const r of results) r.ratio = r.reqs / trivial;
  const size_ = du(served);
  const walDir = path.join(served, "pg_wal");
  const wal = fs.existsSync(walDir) ? du(walDir) : 0;
  const explains = QUICK ? [] : await explainAll(served, fx);
  return { size, thread, results, peak, dataBytes: size_, walBytes: wal, explains, stall, firstLoad, lighthouse };
}

/** Lighthouse's scores and the audits that did not pass, against performance ≥ 95, accessibility 100, best practices ≥ 95. */
function reportLighthouse(results: LighthouseResult[], budgets: { what: string; ok: boolean }[]) {
  if (!results.length) return;
  log("Lighthouse (phone, simulated throttling; the median of the runs): performance / accessibility / best practices");
  for (const r of results) {
    log(`  ${pad(r.name, 24)} ${pad(r.scores.performance, 3, true)} / ${pad(r.scores.accessibility, 3, true)} / ${pad(r.scores["best-practices"], 3, true)}   ${Object.entries(r.metrics).map(([k, v]) => `${k.replace(/-/g, " ")} ${v}`).join(", ")}${r.performanceRuns && r.performanceRuns.length > 1 ? `; performance of each run ${r.performanceRuns.join(", ")}` : ""}`);
    for (const a of r.failing) log(`      ${a.category}: ${a.id} — ${a.title}${a.display ? ` (${a.display})` : ""}`);
    budgets.push({ what: `Lighthouse ${r.name}: performance ≥ 95 (is ${r.scores.performance})`, ok: r.scores.performance >= 95 });
    budgets.push({ what: `Lighthouse ${r.name}: accessibility = 100 (is ${r.scores.accessibility})`, ok: r.scores.accessibility === 100 });
    budgets.push({ what: `Lighthouse ${r.name}: best practices ≥ 95 (is ${r.scores["best-practices"]})`, ok: r.scores["best-practices"] >= 95 });
  }
}

function pad(s: string | number, n: number, left = false) {
  const t = String(s);
  return left ? t.padStart(n) : t.padEnd(n);
}

async function main() {
  if (process.env.BENCH_EXPLAIN_ONLY === "1") {
    // Verdicts for folders already loaded (for example a run of an older checkout).
    const dir = process.env.BENCH_DIR ?? path.join(root, ".bench");
    for (const size of SIZES) {
      const fx = JSON.parse(fs.readFileSync(path.join(dir, `${size}.json`), "utf8")) as Fixture;
      log(`EXPLAIN (${size}, ${dir}):`);
      for (const e of await explainAll(path.join(dir, size), fx)) log(`  ${pad(e.name, 44)} ${e.verdict}`);
    }
    return;
  }
  if (LIGHTHOUSE_ONLY) {
    if (!fs.existsSync(path.join(root, DIST, "BUILD_ID"))) run("npx", ["next", "build"], { NEXT_DIST_DIR: DIST, NEXT_TELEMETRY_DISABLED: "1" });
    const budgets: { what: string; ok: boolean }[] = [];
    const out = await benchSize("demo", Number(process.env.BENCH_PORT ?? 3390), THREADS[0] ?? "worker", true);
    reportLighthouse(out.lighthouse, budgets);
    for (const b of budgets) log(`${b.ok ? "pass       " : "FALL SHORT "} ${b.what}`);
    log(`\n${budgets.filter((b) => b.ok).length} of ${budgets.length} budgets pass; total ${elapsed()}`);
    return;
  }
  if (process.env.BENCH_SKIP_CORE !== "1" && !QUICK) {
    log("== computation core");
    benchCore();
  }
  if (process.env.BENCH_SKIP_BUILD !== "1" || !fs.existsSync(path.join(root, DIST, "BUILD_ID"))) {
    log(`[${elapsed()}] building into ${DIST} …`);
    run("npx", ["next", "build"], { NEXT_DIST_DIR: DIST, NEXT_TELEMETRY_DISABLED: "1" });
    log(`[${elapsed()}] built`);
  }
  const budgets: { what: string; ok: boolean }[] = [];
  const runs: Awaited<ReturnType<typeof benchSize>>[] = [];
  let port = Number(process.env.BENCH_PORT ?? 3390);
  for (const size of SIZES) {
    for (const [t, thread] of THREADS.entries()) {
      const out = await benchSize(size, port++, thread, t === 0);
      runs.push(out);
      const label = THREADS.length > 1 || thread !== "worker" ? `${size}, PGlite in the ${thread} thread` : size;
      log(`\n== ${label} data set (${SECONDS} s per endpoint, 10 connections, loopback; the machine may be shared: compare ratios)`);
      log(
        `${pad("endpoint", 34)} ${pad("status", 6, true)} ${pad("bytes", 9, true)} ${pad("req/s", 8, true)} ${pad("p50 ms", 7, true)} ${pad("p99 ms", 7, true)} ${pad("errors", 7, true)} ${pad("ratio", 7, true)} ${pad("CPU ms/req: request thread", 27, true)} ${pad("process", 8, true)}`,
      );
      for (const r of out.results) {
        log(
          `${pad(r.name, 34)} ${pad(r.status, 6, true)} ${pad(r.bytes, 9, true)} ${pad(r.reqs.toFixed(1), 8, true)} ${pad(r.p50, 7, true)} ${pad(r.p99, 7, true)} ${pad(r.errors + r.non2xx, 7, true)} ${pad(`${r.ratio!.toFixed(3)}×`, 7, true)} ${pad(r.threadMsPerReq.toFixed(1), 27, true)} ${pad(r.cpuMsPerReq.toFixed(1), 8, true)}`,
        );
        const b = r.budget;
        const want = b ? (size === "demo" ? b.demo : b.large) : undefined;
        if (want !== undefined) budgets.push({ what: `${label}: ${r.name} ≥ ${want}× trivial (is ${r.ratio!.toFixed(3)}×)`, ok: r.ratio! >= want });
        if (b?.p99Demo !== undefined && size === "demo") budgets.push({ what: `${label}: ${r.name} p99 ≤ ${b.p99Demo} ms (is ${r.p99} ms)`, ok: r.p99 <= b.p99Demo });
        budgets.push({ what: `${label}: ${r.name} without errors (${r.errors + r.non2xx})`, ok: r.errors + r.non2xx === 0 });
      }
      log(`server peak RSS ${out.peak.toFixed(0)} MB; data folder ${(out.dataBytes / 1e6).toFixed(0)} MB (of it write-ahead log ${(out.walBytes / 1e6).toFixed(0)} MB)`);
      budgets.push({ what: `${label}: server peak RSS ≤ 500 MB (is ${out.peak.toFixed(0)} MB)`, ok: out.peak <= 500 });
      if (out.stall) {
        const st = out.stall;
        log(
          `trivial route alone p50 ${st.aloneP50} ms, p99 ${st.aloneP99} ms; beside the heaviest logbook p50 ${st.besideP50} ms, p99 ${st.besideP99} ms ` +
            `(5 + 5 connections; the logbook meanwhile ${st.heavyReqs.toFixed(1)} req/s, p50 ${st.heavyP50} ms)`,
        );
        budgets.push({ what: `${label}: trivial route p99 beside the heaviest logbook ≤ 200 ms (is ${st.besideP99} ms)`, ok: st.besideP99 <= 200 });
      }
      if (out.firstLoad.length) {
        log("first-load JS (gzip -9 of the module scripts each page's HTML loads; noModule polyfills and later dynamic imports not counted):");
        for (const f of out.firstLoad) {
          log(`  ${pad(f.name, 24)} ${pad(f.kib.toFixed(1), 7, true)} KiB in ${f.scripts} scripts; HTML ${f.htmlKib.toFixed(0)} KiB`);
          if (size === "demo" && t === 0 && f.name !== "landing /") budgets.push({ what: `first-load JS of ${f.name} ≤ 170 KiB gzipped (is ${f.kib.toFixed(1)} KiB)`, ok: f.kib <= 170 });
        }
      }
      reportLighthouse(out.lighthouse, budgets);
      if (out.explains.length) log("EXPLAIN:");
      for (const e of out.explains) {
        log(`  ${pad(e.name, 44)} ${e.verdict}`);
        if (t === 0) budgets.push({ what: `${size}: no sequential scan of a large table: ${e.name}`, ok: e.ok });
      }
    }
  }
  if (THREADS.length > 1) {
    log(`\n== where PGlite runs (${THREADS.join(" vs ")}): req/s and p50 per endpoint, and the trivial route beside the heaviest logbook`);
    for (const size of SIZES) {
      const bySize = runs.filter((r) => r.size === size);
      log(`${size}:`);
      for (const [i, r0] of bySize[0].results.entries()) {
        log(
          `  ${pad(r0.name, 34)} ${bySize
            .map((r) => {
              const x = r.results[i];
              return `${r.thread}: ${pad(x?.reqs.toFixed(1) ?? "-", 6, true)} req/s ${pad(`${x?.ratio?.toFixed(3)}×`, 7, true)}, request thread ${pad(x?.threadMsPerReq.toFixed(1) ?? "-", 5, true)} ms CPU/req`;
            })
            .join("   ")}`,
        );
      }
      log(`  ${pad("trivial beside heaviest: p50/p99", 34)} ${bySize.map((r) => `${r.thread}: ${r.stall?.besideP50}/${r.stall?.besideP99} ms`).join("   ")}`);
      log(`  ${pad("peak RSS", 34)} ${bySize.map((r) => `${r.thread}: ${r.peak.toFixed(0)} MB`).join("   ")}`);
    }
  }
  log(`\n== budgets`);
  for (const b of budgets) log(`${b.ok ? "pass       " : "FALL SHORT "} ${b.what}`);
  log(`\n${budgets.filter((b) => b.ok).length} of ${budgets.length} budgets pass; total ${elapsed()}`);
}

await main();
