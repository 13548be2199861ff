// Lighthouse (12.2, the last line that runs on Node 20) on a few pages of a
// running server: the phone form factor with Lighthouse's own simulated
// throttling (its defaults), in Debian's Chromium (the one the browser tests
// use; nothing is downloaded). Signed-in pages get the session cookie through
// Lighthouse's extraHeaders. Used by scripts/bench.ts; budgets there.
//
// The simulation scales the main thread's observed work by four, so another
// process busy on the machine lowers the performance score: each page runs
// `runs` times (BENCH_LIGHTHOUSE_RUNS, default 3) and the run with the median
// performance score is the one reported, as Lighthouse's own docs advise.
import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";

export const LIGHTHOUSE_CATEGORIES = ["performance", "accessibility", "best-practices"] as const;
export type LighthouseCategory = (typeof LIGHTHOUSE_CATEGORIES)[number];

export type LighthousePage = { name: string; path: string; cookie?: string };
export type LighthouseResult = {
  name: string;
  path: string;
  /** 0–100 per category. */
  scores: Record<LighthouseCategory, number>;
  /** Audits of the three categories that did not pass (a numeric audit passes from 0.9, as in Lighthouse's report). */
  failing: { category: LighthouseCategory; id: string; title: string; score: number; display?: string }[];
  /** The performance metrics, for reading a score. */
  metrics: Record<string, string>;
  /** The performance score of every run, lowest first (the result is the median run's). */
  performanceRuns?: number[];
};

const METRICS = ["first-contentful-paint", "largest-contentful-paint", "total-blocking-time", "cumulative-layout-shift", "speed-index"];

export async function runLighthouse(base: string, pages: LighthousePage[], runs = Number(process.env.BENCH_LIGHTHOUSE_RUNS ?? 3)): Promise<LighthouseResult[]> {
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROMIUM_PATH ?? process.env.CHROME_PATH ?? "/usr/bin/chromium",
    // As the browser tests start it (playwright.config.ts): no sandbox as root, nothing reaching out.
    chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  try {
    const out: LighthouseResult[] = [];
    for (const page of pages) {
      const tries: LighthouseResult[] = [];
      for (let i = 0; i < Math.max(1, runs); i++) tries.push(await again(() => once(chrome.port, base, page)));
      tries.sort((a, b) => a.scores.performance - b.scores.performance);
      out.push({ ...tries[Math.floor((tries.length - 1) / 2)], performanceRuns: tries.map((t) => t.scores.performance) });
    }
    return out;
  } finally {
    await chrome.kill();
  }
}

/** Lighthouse now and then fails to record a trace (NO_NAVSTART, NO_FCP): such a run is made again, twice at most. */
async function again<T>(f: () => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await f();
    } catch (e) {
      if (attempt >= 3 || !(e instanceof Error && /NO_NAVSTART|NO_FCP|NO_TRACING_STARTED|NO_LCP/.test(e.message))) throw e;
    }
  }
}

async function once(port: number, base: string, page: LighthousePage): Promise<LighthouseResult> {
  const run = await lighthouse(`${base}${page.path}`, {
    port,
    output: "json",
    logLevel: "error",
    onlyCategories: [...LIGHTHOUSE_CATEGORIES],
    extraHeaders: page.cookie ? { Cookie: page.cookie } : undefined,
  });
  if (!run) throw new Error(`Lighthouse returned nothing for ${page.path}`);
  const lhr = run.lhr;
  if (lhr.runtimeError) throw new Error(`Lighthouse could not load ${page.path}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  const scores = Object.fromEntries(LIGHTHOUSE_CATEGORIES.map((c) => [c, Math.round((lhr.categories[c]?.score ?? 0) * 100)])) as Record<LighthouseCategory, number>;
  const failing: LighthouseResult["failing"] = [];
  for (const category of LIGHTHOUSE_CATEGORIES) {
    for (const ref of lhr.categories[category]?.auditRefs ?? []) {
      const a = lhr.audits[ref.id];
      if (!a || a.score === null || a.scoreDisplayMode === "informative" || a.scoreDisplayMode === "notApplicable" || a.scoreDisplayMode === "manual") continue;
      const passes = a.scoreDisplayMode === "binary" ? a.score === 1 : a.score >= 0.9;
      if (!passes) failing.push({ category, id: a.id, title: a.title, score: a.score, display: a.displayValue });
    }
  }
  const metrics = Object.fromEntries(METRICS.map((m) => [m, lhr.audits[m]?.displayValue ?? "—"]));
  return { name: page.name, path: page.path, scores, failing, metrics };
}
