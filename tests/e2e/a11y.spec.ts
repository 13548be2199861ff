// Issue 10 item 14: an axe-core scan (WCAG 2.0/2.1/2.2 A and AA rules) of the
// main pages on a phone and a desktop. Serious and critical findings fail the
// run; every page also has one title ("… · Fourpatch") and no sideways scroll.
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { SessionPages } from "./pages/session";

const VIEWPORTS = { phone: { width: 390, height: 844 }, desktop: { width: 1366, height: 900 } } as const;

async function scan(page: Page, path: string) {
  await page.goto(path);
  await page.waitForLoadState("networkidle");
  const result = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa", "best-practice"]).analyze();
  const bad = result.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  const report = bad.map((v) => `${v.id} (${v.impact}): ${v.help}\n  ${v.nodes.slice(0, 3).map((n) => n.target.join(" ")).join("\n  ")}`).join("\n");
  expect(bad, `${path}\n${report}`).toEqual([]);
  const title = await page.title();
  expect(title, `${path} title`).toMatch(/^(?:[^·]+ · Fourpatch|Fourpatch — .+)$/);
  const [scroll, client] = await page.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
  expect(scroll, `${path} scrolls sideways`).toBeLessThanOrEqual(client);
}

for (const [name, viewport] of Object.entries(VIEWPORTS)) {
  test.describe(`${name}`, () => {
    test.use({ viewport });

    test(`public pages pass axe (${name})`, async ({ page }) => {
      for (const path of ["/", "/pricing", "/sign-in", "/sign-up", "/forgot-password", "/reset-password", "/no-such-page"]) await scan(page, path);
    });

    test(`the driver's pages pass axe (${name})`, async ({ page }) => {
      test.setTimeout(120_000);
      await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
      await scan(page, "/vehicles");
      await page.getByRole("link", { name: "The Velora" }).first().click();
      await expect(page.getByRole("heading", { name: "The Velora", level: 1 })).toBeVisible();
      const vehiclePath = new URL(page.url()).pathname;
      const setHref = await page.getByTestId("set-card").first().getByRole("link").first().getAttribute("href");
      for (const path of [vehiclePath, `${vehiclePath}/check`, `${vehiclePath}/edit`, setHref!, "/log-purchase", "/passes", "/reminders", "/account"]) await scan(page, path);
    });

    test(`the shop's pages pass axe (${name})`, async ({ page }) => {
      test.setTimeout(120_000);
      await new SessionPages(page).signInAndLand(demoAccounts.wren.email, "/shop");
      await scan(page, "/shop");
      await scan(page, "/shop/profile");
      const pass = page.getByTestId("shop-pass").first();
      await page.goto("/shop");
      if (await pass.count()) {
        await pass.click();
        await page.waitForLoadState("networkidle");
        await scan(page, new URL(page.url()).pathname);
      }
    });

    test(`the tab bar shows every destination in full (${name})`, async ({ page }) => {
      await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
      const nav = page.getByRole("navigation", { name: "Main" });
      for (const label of ["Vehicles", "Log a purchase", "Shop passes", "Reminders", "Account"]) {
        const link = nav.getByRole("link", { name: label });
        await expect(link).toBeInViewport({ ratio: 1 });
        // The label is not clipped: its text fits in the link's box.
        expect(await link.evaluate((el) => el.scrollWidth <= el.clientWidth + 1)).toBe(true);
      }
    });
  });
}
