// The look of the screens where the condition code, the tread-profile glyph
// and the wear chart show: screenshots of the technician's view at tablet
// (820 px) and phone (390 px) widths, the set page, the vehicles overview and
// the chart, saved under tests/e2e/artifacts/screens/look-<LOOK_TAG>-*.png so
// that a "before" and an "after" run can sit side by side.
import { mkdirSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { SessionPages } from "./pages/session";

const SCREENS = "tests/e2e/artifacts/screens";
const TAG = process.env.LOOK_TAG ?? "after";
const shot = (name: string) => `${SCREENS}/look-${TAG}-${name}.png`;

async function noSidewaysScroll(page: Page) {
  const [scroll, client] = await page.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
  expect(scroll, "no sideways scrolling").toBeLessThanOrEqual(client);
}

test.beforeAll(() => mkdirSync(SCREENS, { recursive: true }));

test("the driver's vehicles overview, set page and wear chart", async ({ browser }) => {
  const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await ctx.newPage();
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  await page.screenshot({ path: shot("overview-desktop"), fullPage: true });
  // The overview's small plan: four glyphs for the car on the road, front pair first.
  const glance = page.getByTestId("set-at-a-glance").first();
  await expect(glance.getByRole("img", { name: /^Tread profile/ })).toHaveCount(4);
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: shot("overview-phone"), fullPage: true });
  await noSidewaysScroll(page);
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.getByRole("link", { name: /summer/i }).first().click();
  await expect(page.getByTestId("wear-chart")).toBeVisible();
  await page.waitForTimeout(800);
  await page.screenshot({ path: shot("set-desktop"), fullPage: true });
  await page.getByTestId("wear-chart").screenshot({ path: shot("chart-desktop") });
  // The limit is a labelled zone with its source, not a red line.
  await expect(page.getByTestId("wear-chart")).toContainText(/Below the 1\.6 mm limit/);
  await expect(page.getByTestId("limit-key")).toContainText(/Below the limit: 1\.6 mm — .+/);
  await expect(page.locator('[data-testid=wear-chart] [stroke="#b3141b"]')).toHaveCount(0);
  // Each tire on the set page has its tread profile with the numbers in its text alternative.
  await expect(page.getByTestId("tire").first().getByRole("img", { name: /^Tread profile: inner .* limit 1\.6 mm/ })).toBeVisible();
  await page.getByRole("button", { name: "By odometer" }).click();
  await expect(page.getByTestId("limit-key")).toBeVisible();
  await page.getByRole("button", { name: "By date" }).click();
  await page.setViewportSize({ width: 390, height: 844 });
  await page.waitForTimeout(500);
  await page.screenshot({ path: shot("set-phone"), fullPage: true });
  await noSidewaysScroll(page);
  await ctx.close();
});

test("the technician's view of the demo pass at tablet and phone widths", async ({ browser }) => {
  const ctx = await browser.newContext({ viewport: { width: 820, height: 1180 } });
  const page = await ctx.newPage();
  await new SessionPages(page).signInAndLand(demoAccounts.jo.email, "/shop");
  await page.getByTestId("shop-pass").filter({ hasText: "The Velora" }).click();
  await expect(page.getByRole("heading", { name: "The Velora", level: 1 })).toBeVisible();
  await page.screenshot({ path: shot("technician-tablet") });
  await page.screenshot({ path: shot("technician-tablet-full"), fullPage: true });
  await noSidewaysScroll(page);
  if (TAG === "before") return void (await ctx.close());

  const strip = page.getByRole("region", { name: "Pass" });
  for (const width of [820, 390]) {
    await page.setViewportSize({ width, height: width === 820 ? 1180 : 844 });
    await page.evaluate(() => window.scrollTo(0, 0));
    // Each wheel carries its glyph (inner groove toward the centreline), its DOT week and age.
    for (const [position, inner] of [["front_left", "right"], ["front_right", "left"], ["rear_left", "right"], ["rear_right", "left"]] as const) {
      const wheel = page.getByTestId(`tire-${position}`);
      await expect(wheel.getByRole("img", { name: /^Tread profile: inner/ })).toHaveAttribute("data-inner-side", inner);
      // Ages in words ("3 years, 6 months old"), the check's date as the viewer writes dates, never ISO.
      await expect(wheel).toContainText(/Week \d+ of \d{4} · (\d+ years?, )?\d+ months? old|Week \d+ of \d{4} · \d+ years? old/);
      await expect(wheel).toContainText(/checked (\d{1,2} [A-Z][a-z]{2} \d{4}|[A-Z][a-z]{2} \d{1,2}, \d{4})/);
      await expect(wheel).not.toContainText(/\d{4}-\d\d-\d\d/);
      // Every line of text stays inside its wheel's card (a date once stuck out on a phone).
      const inside = await wheel.evaluate((el) => {
        const r = el.getBoundingClientRect();
        return [...el.querySelectorAll("p, span")].every((c) => {
          const b = c.getBoundingClientRect();
          return b.left >= r.left - 0.5 && b.right <= r.right + 0.5;
        });
      });
      expect(inside, `${position} at ${width} px`).toBe(true);
    }
    // The front-left wheel sits left of and above the rear-right one: a plan, not a list.
    const fl = (await page.getByTestId("tire-front_left").boundingBox())!;
    const rr = (await page.getByTestId("tire-rear_right").boundingBox())!;
    expect(fl.x).toBeLessThan(rr.x);
    expect(fl.y).toBeLessThan(rr.y);
    // The time left is in view wherever the page is scrolled, and Record work is one tap away.
    await expect(strip).toBeInViewport();
    await expect(strip).toContainText(/left/);
    await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
    await expect(strip).toBeInViewport();
    await strip.getByRole("link", { name: "Record work" }).click();
    await expect(page).toHaveURL(/#record-work$/);
    await expect(page.getByRole("heading", { name: "Record work" })).toBeInViewport();
    // "Measure" at a wheel jumps to that tire's boxes.
    await page.getByTestId("tire-rear_left").getByRole("link", { name: "Measure" }).click();
    await expect(page.getByLabel("Rear left inner depth in mm")).toBeInViewport();
    await noSidewaysScroll(page);
  }
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: shot("technician-phone") });
  await page.screenshot({ path: shot("technician-phone-full"), fullPage: true });
  await ctx.close();
});

// Machado, Oliveira & Fernandes (2009) simulation matrices at full severity
// [memory], applied in linear RGB (feColorMatrix's default colour space).
const CVD = {
  protanopia: "0.152286 1.052583 -0.204868 0 0  0.114503 0.786281 0.099216 0 0  -0.003882 -0.048116 1.051998 0 0  0 0 0 1 0",
  deuteranopia: "0.367322 0.860646 -0.227968 0 0  0.280085 0.672501 0.047413 0 0  -0.011820 0.042940 0.968881 0 0  0 0 0 1 0",
} as const;

async function simulate(page: Page, mode: "none" | "greyscale" | keyof typeof CVD) {
  await page.evaluate(
    ({ mode, matrix }) => {
      document.getElementById("cvd-defs")?.remove();
      const html = document.documentElement;
      if (mode === "none") return void (html.style.filter = "");
      if (mode === "greyscale") return void (html.style.filter = "grayscale(1)");
      document.body.insertAdjacentHTML(
        "beforeend",
        `<svg id="cvd-defs" width="0" height="0" style="position:absolute"><filter id="cvd"><feColorMatrix type="matrix" values="${matrix}"/></filter></svg>`,
      );
      html.style.filter = "url(#cvd)";
    },
    { mode, matrix: mode in CVD ? CVD[mode as keyof typeof CVD] : "" },
  );
}

test("the condition code and the glyph read in greyscale and under simulated protanopia and deuteranopia", async ({ browser }) => {
  const { renderToStaticMarkup } = await import("react-dom/server");
  const { createElement, Fragment } = await import("react");
  const { ConditionBadge, CONDITION_LEVELS } = await import("../../components/ui/condition-badge");
  const { TreadProfile } = await import("../../components/visual/tread-profile");
  const specimen = renderToStaticMarkup(
    createElement(
      "div",
      { id: "specimen", style: { padding: 16, background: "#fff", display: "grid", gap: 12 } },
      createElement("div", { style: { display: "flex", flexWrap: "wrap", gap: 8 } }, ...CONDITION_LEVELS.map((l) => createElement(ConditionBadge, { key: l, condition: l }))),
      createElement(
        "div",
        { style: { display: "flex", gap: 16 } },
        ...[
          [7.6, 7.8, 7.7],
          [3.3, 6.4, 6.6],
          [2.4, 4.9, 2.5],
          [1.2, 1.9, 2.2],
        ].map(([i, c, o], k) => createElement(Fragment, { key: k }, createElement(TreadProfile, { innerMm: i, centreMm: c, outerMm: o, newMm: 8, limitMm: 1.6, depthUnit: "mm", className: "h-20 w-28" }))),
      ),
    ),
  );
  const ctx = await browser.newContext({ viewport: { width: 820, height: 1180 } });
  const page = await ctx.newPage();
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  await page.evaluate((html) => document.querySelector("main")!.insertAdjacentHTML("afterbegin", html), specimen);
  const sheet = page.locator("#specimen");
  await expect(sheet.locator("[data-condition]")).toHaveCount(5);
  for (const mode of ["none", "greyscale", "protanopia", "deuteranopia"] as const) {
    await simulate(page, mode);
    await sheet.screenshot({ path: shot(`code-${mode}`) });
  }
  await simulate(page, "none");
  await ctx.close();

  // The technician's plan under the same simulations.
  const techCtx = await browser.newContext({ viewport: { width: 820, height: 1180 } });
  const tech = await techCtx.newPage();
  await new SessionPages(tech).signInAndLand(demoAccounts.jo.email, "/shop");
  await tech.getByTestId("shop-pass").filter({ hasText: "The Velora" }).click();
  await expect(tech.getByTestId("tire-front_left")).toBeVisible();
  for (const mode of ["greyscale", "protanopia", "deuteranopia"] as const) {
    await simulate(tech, mode);
    await tech.screenshot({ path: shot(`technician-tablet-${mode}`) });
  }
  await techCtx.close();
});

test("the mark is in the header, and the favicon, app icons and manifest are served", async ({ page, request }) => {
  await page.goto("/sign-in");
  await expect(page.getByTestId("brand-mark").first()).toBeVisible();
  await expect(page.locator('link[rel="manifest"]')).toHaveAttribute("href", /manifest\.webmanifest/);
  await expect(page.locator('link[rel="icon"][type="image/svg+xml"]')).toHaveCount(1);
  await expect(page.locator('link[rel="apple-touch-icon"]')).toHaveCount(1);
  const manifest = await request.get("/manifest.webmanifest");
  expect(manifest.status()).toBe(200);
  const body = (await manifest.json()) as { icons: { src: string; type: string }[]; start_url: string };
  expect(body.start_url).toBe("/vehicles");
  for (const icon of body.icons) {
    const res = await request.get(icon.src);
    expect(res.status(), icon.src).toBe(200);
    expect(res.headers()["content-type"]).toBe("image/png");
  }
  for (const [path, type] of [["/favicon.ico", "image/x-icon"], ["/icon.svg", "image/svg+xml"]]) {
    const res = await request.get(path);
    expect(res.status(), path).toBe(200);
    expect(res.headers()["content-type"]).toContain(type);
  }
});
