// Forms whose code loads when they are opened or first checked (issue 14,
// item 6: components/logbook/lazy-forms.tsx, lib/forms/lazy-zod-resolver.ts):
// each is opened, refused by its own rules in the browser (no request sent,
// so the lazily loaded zod schema ran), then submitted and saved. The edit
// forms of a check are covered by edit-history.spec.ts, the purchase form by
// log-purchase.spec.ts, the reminder settings by calendar-feed.spec.ts.
import { expect, test, type Page } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { SessionPages } from "./pages/session";
import { DriverPassesPage } from "./pages/shop-pass";

/** Counts the requests matching `method` and `path` from now on. */
function countRequests(page: Page, method: string, path: RegExp) {
  let n = 0;
  page.on("request", (r) => {
    if (r.method() === method && path.test(new URL(r.url()).pathname)) n += 1;
  });
  return () => n;
}

test("the driver adds and changes a service entry, changes a set's limits and saves the units, each form loaded on opening", async ({ page }) => {
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const vehicleId = await DriverPassesPage.makeVehicle(page.request, `Lazy forms ${Date.now().toString(36)}`);
  await page.goto(`/vehicles/${vehicleId}`);
  const history = page.getByTestId("history");
  await expect(history.getByTestId("history-row")).toHaveCount(1);

  // A new service entry: refused in the browser first, then saved.
  const posts = countRequests(page, "POST", /\/service-entries$/);
  await page.getByRole("button", { name: "Add a service entry" }).click();
  await page.getByLabel("Work done").selectOption("rotation");
  await page.getByLabel("Cost (optional)").fill("forty");
  await page.getByRole("button", { name: "Save the entry" }).click();
  await expect(page.getByText("The cost must be a number.")).toBeVisible();
  expect(posts()).toBe(0);
  await page.getByLabel("Cost (optional)").fill("40");
  await page.getByLabel("Notes (optional)").fill("Front to back.");
  await page.getByRole("button", { name: "Save the entry" }).click();
  await expect(history.getByTestId("history-row").filter({ hasText: "Rotation" })).toHaveCount(1);
  expect(posts()).toBe(1);
  await expect(page.getByRole("button", { name: "Add a service entry" })).toBeVisible();

  // Changing it: the edit form loads when "Change" is pressed.
  await history.getByRole("button", { name: /^Change: Rotation/ }).click();
  const edit = page.getByTestId("edit-entry");
  await expect(edit.getByLabel("Notes (optional)")).toHaveValue("Front to back.");
  await edit.getByLabel("Notes (optional)").fill("Front to back, crossed.");
  await edit.getByRole("button", { name: "Save the changes" }).click();
  await expect(page.locator("[data-sonner-toast]").filter({ hasText: /Rotation of .* is changed\./ })).toBeVisible();
  await expect(history.getByTestId("history-row").filter({ hasText: "Rotation" })).toContainText("Front to back, crossed.");

  // The set's name and limits, on the set page.
  await page.getByRole("link", { name: "Wear chart and details" }).first().click();
  await expect(page).toHaveURL(/\/sets\//);
  const patches = countRequests(page, "PATCH", /^\/api\/sets\//);
  await page.getByRole("button", { name: "Change the set's name or limits" }).click();
  await page.getByLabel("Name of the set").fill("Lazy summers");
  await page.getByLabel("Inspect yearly from (years)").fill("8");
  await page.getByLabel("Replace at (years)").fill("6");
  await page.getByRole("button", { name: "Save", exact: true }).click();
  await expect(page.getByText("The inspection age must come before the replacement age.")).toBeVisible();
  expect(patches()).toBe(0);
  await page.getByLabel("Replace at (years)").fill("10");
  await page.getByRole("button", { name: "Save", exact: true }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Lazy summers" })).toBeVisible();
  expect(patches()).toBe(1);

  // The units form checks with its schema loaded on first submit (same units: nothing changes).
  await page.goto("/account");
  await page.getByRole("button", { name: "Save the units" }).click();
  await expect(page.getByText("Saved. Depths, distances and pressures now show in these units.")).toBeVisible();
});

test("the shop owner's profile form refuses a bad phone number in the browser, then saves", async ({ page }) => {
  await new SessionPages(page).signInAndLand(demoAccounts.wren.email, "/shop");
  await page.goto("/shop/profile");
  const phone = page.getByLabel("Phone (optional)");
  const before = await phone.inputValue();
  const patches = countRequests(page, "PATCH", /^\/api\/shops\//);
  await phone.fill("call the front desk");
  await page.getByRole("button", { name: "Save the profile" }).click();
  await expect(page.getByText("Use digits, spaces and + ( ) - only.")).toBeVisible();
  expect(patches()).toBe(0);
  await phone.fill(before);
  await page.getByRole("button", { name: "Save the profile" }).click();
  await expect(page.getByText("The profile is saved.")).toBeVisible();
  expect(patches()).toBe(1);
});
