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
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: shot("overview-phone"), fullPage: true });
  await noSidewaysScroll(page);
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.getByRole("link", { name: /summer/i }).first().click();
  await expect(page.getByTestId("wear-chart")).toBeVisible();
  await page.waitForTimeout(800);
  await page.screenshot({ path: shot("set-desktop"), fullPage: true });
  await page.getByTestId("wear-chart").screenshot({ path: shot("chart-desktop") });
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
  await page.setViewportSize({ width: 390, height: 844 });
  await page.waitForTimeout(300);
  await page.screenshot({ path: shot("technician-phone") });
  await page.screenshot({ path: shot("technician-phone-full"), fullPage: true });
  await noSidewaysScroll(page);
  await ctx.close();
});
