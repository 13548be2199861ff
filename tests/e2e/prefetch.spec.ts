// Links fetch their page ahead only on intent (components/ui/intent-link.tsx):
// the overview sends no prefetch while it starts, however many vehicles and
// sets it lists; a pointer over a link or a finger on it fetches that page;
// the click then lands there. Prefetches are told apart by the header the
// Next.js router sends with them (`next-router-prefetch`).
import { expect, test, type Page } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { SessionPages } from "./pages/session";

function prefetches(page: Page) {
  const paths: string[] = [];
  page.on("request", (r) => {
    if (r.headers()["next-router-prefetch"]) paths.push(new URL(r.url()).pathname);
  });
  return paths;
}

test("the overview fetches no page ahead until a link is pointed at, then that one", async ({ page }) => {
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const sent = prefetches(page);
  await page.goto("/vehicles");
  await page.waitForLoadState("networkidle");
  const vehicleLinks = page.locator('main a[href^="/vehicles/"]');
  expect(await vehicleLinks.count()).toBeGreaterThan(0);
  expect(sent).toEqual([]);

  const link = vehicleLinks.first();
  const href = (await link.getAttribute("href"))!;
  await link.hover();
  await expect.poll(() => sent.filter((p) => p === href).length).toBeGreaterThan(0);
  expect(sent.every((p) => p === href)).toBe(true);

  await link.click();
  await expect(page).toHaveURL(new RegExp(`${href}$`));
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
});
