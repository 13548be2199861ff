// The operators' console on a phone: counts, search, a disable that asks
// first and ends the account's sign-in, the audit log that records both
// actions, the shops list; and no sideways scrolling anywhere.
import { expect, test, type Page } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { SessionPages } from "./pages/session";

async function noSidewaysScroll(page: Page) {
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
}

test("an operator searches, disables and re-enables an account with confirmation, and reads the audit log, on a phone", async ({ browser }) => {
  test.setTimeout(120_000);
  // Tokyo keeps no summer time: the audit log's times carry its fixed offset.
  const ctx = await browser.newContext({ viewport: { width: 390, height: 844 }, timezoneId: "Asia/Tokyo" });
  const page = await ctx.newPage();
  const session = new SessionPages(page);
  await session.signInAndLand(demoAccounts.ops.email, "/admin");
  await expect(page.getByTestId("operator-counts")).toContainText("Accounts");
  await noSidewaysScroll(page);

  await page.getByLabel("Search by name or e-mail").fill("tomas@renwick");
  await page.getByRole("button", { name: "Search" }).click();
  await expect(page).toHaveURL(/q=tomas/);
  const list = page.getByTestId("account-list");
  await expect(list.getByRole("listitem")).toHaveCount(1);
  await expect(list).toContainText("Tomas Renwick");
  // Metadata only: no logbook contents on the operators' pages.
  await expect(page.getByText(/DOT /)).toHaveCount(0);

  await page.getByRole("button", { name: "Disable Tomas Renwick" }).click();
  const dialog = page.getByRole("alertdialog");
  await expect(dialog).toContainText("signed out everywhere");
  await dialog.getByRole("button", { name: "Keep it" }).click();
  await expect(list).toContainText("active");
  await page.getByRole("button", { name: "Disable Tomas Renwick" }).click();
  await dialog.getByRole("button", { name: "Disable" }).click();
  await expect(page.getByRole("button", { name: "Enable Tomas Renwick" })).toBeVisible();
  await expect(list).toContainText("disabled");

  // Tomas cannot sign in while disabled.
  const other = await browser.newContext();
  const tomas = await other.newPage();
  await new SessionPages(tomas).signIn(demoAccounts.tomas.email);
  await expect(tomas).toHaveURL(/\/sign-in/);

  await page.getByRole("button", { name: "Enable Tomas Renwick" }).click();
  await page.getByRole("alertdialog").getByRole("button", { name: "Enable" }).click();
  await expect(page.getByRole("button", { name: "Disable Tomas Renwick" })).toBeVisible();

  await page.getByRole("link", { name: "Audit log" }).click();
  const audit = page.getByTestId("audit-list");
  await expect(audit.getByRole("listitem").nth(0)).toContainText("enabled the account again");
  await expect(audit.getByRole("listitem").nth(1)).toContainText("disabled the account");
  await expect(audit.getByRole("listitem").nth(0).locator("time")).toHaveText(/GMT\+9|JST/);
  await expect(audit).toContainText(demoAccounts.tomas.email);
  await noSidewaysScroll(page);

  // On a phone the "enabled" toast sits over the header's links; a pointer resting on it keeps it open
  // (the toast library pauses on hover), so wait until it has gone, as a person would, before using them.
  await page.mouse.move(5, 830);
  await expect(page.locator("[data-sonner-toast]")).toHaveCount(0, { timeout: 15_000 });
  await page.getByRole("link", { name: "Shops" }).click();
  await page.getByLabel("Search by shop name or town").fill("quillby");
  await page.getByRole("button", { name: "Search" }).click();
  await expect(page.getByTestId("shop-list")).toContainText("Quillby Tread Works");
  await noSidewaysScroll(page);

  await new SessionPages(tomas).signInAndLand(demoAccounts.tomas.email, "/vehicles");
  await other.close();
  await ctx.close();
});
