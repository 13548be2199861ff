// The second journey: a shop technician working on a shared logbook during
// service. The driver gives a pass, the technician records a check and
// work, the driver sees it and the access log, ends the pass, and the
// technician's next request is refused.
import { mkdirSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { confirmSignUp, openNewestMail, SessionPages } from "./pages/session";
import { DriverPassesPage, ShopWorkspacePage } from "./pages/shop-pass";

const SCREENS = "tests/e2e/artifacts/screens";

test("a driver shares a logbook with a shop, the technician adds to it, and the pass is ended", async ({ browser }) => {
  test.setTimeout(180_000);
  mkdirSync(SCREENS, { recursive: true });
  const nickname = `Ada's Korvan ${Date.now().toString(36)}`;

  // --- The driver gives the pass.
  const driverCtx = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const driver = await driverCtx.newPage();
  await new SessionPages(driver).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const vehicleId = await DriverPassesPage.makeVehicle(driver.request, nickname);
  const passes = new DriverPassesPage(driver);
  await passes.open();
  await passes.issue({
    vehicle: nickname,
    shopSearch: "quillby",
    shop: "Quillby Tread Works",
    scope: "Read and add entries",
    duration: "A working day (8 hours)",
    note: "Front left pulls a little when braking.",
  });
  await expect(passes.pass("Quillby Tread Works").filter({ hasText: nickname })).toContainText(/7 hours 5\d min left|8 hours left/);
  await driver.screenshot({ path: `${SCREENS}/driver-passes-phone.png`, fullPage: true });

  // --- The technician, on a tablet in the bay, finds it and opens the logbook.
  const techCtx = await browser.newContext({ viewport: { width: 820, height: 1180 } });
  const tech = await techCtx.newPage();
  await new SessionPages(tech).signInAndLand(demoAccounts.jo.email, "/shop");
  const shop = new ShopWorkspacePage(tech);
  await shop.openPassFor(nickname);
  await expect(shop.tire("front_left")).toContainText("DOT QF4X Z8K2 2123");
  await expect(shop.tire("front_left")).toContainText("Week 21 of 2023");
  await expect(tech.getByText("Guidance only: local law and a qualified tire technician decide.")).toBeVisible();
  await expect(tech.getByRole("region", { name: "Pass" })).toContainText(/left/);

  for (const p of ["Front left", "Front right", "Rear left", "Rear right"]) await shop.fillDepths(p, "6.4", "6.8", "6.6");
  await shop.fillDepths("Front left", "4.1", "6.0", "6.2");
  await shop.recordWork("Rotation", "41950", "Rotated front to back; front left wears on its inner shoulder.");
  await expect(tech.getByTestId("work-outcome").getByText("Rotation saved to the driver's logbook, with the tread check.")).toBeVisible();
  // The new reading is the tire's depth now (the minimum of its grooves).
  await expect(shop.tire("front_left")).toContainText("4.1 mm");
  await tech.screenshot({ path: `${SCREENS}/technician-logbook-tablet.png`, fullPage: true });
  await tech.screenshot({ path: `${SCREENS}/technician-logbook-tablet-viewport.png` });
  await tech.setViewportSize({ width: 390, height: 844 });
  await tech.screenshot({ path: `${SCREENS}/technician-logbook-phone.png`, fullPage: true });
  await tech.getByRole("heading", { name: "Record work" }).scrollIntoViewIfNeeded();
  await tech.screenshot({ path: `${SCREENS}/technician-record-work-phone-viewport.png` });
  await tech.goto("/shop");
  await tech.screenshot({ path: `${SCREENS}/technician-passes-phone.png`, fullPage: true });
  await tech.goBack();

  // --- The driver sees the work, the access log and the e-mail.
  await driver.goto(`/vehicles/${vehicleId}`);
  await expect(driver.getByText("Rotated front to back; front left wears on its inner shoulder.").first()).toBeVisible();
  await passes.open();
  const log = passes.accessLogFor(nickname);
  await expect(log.getByRole("row").filter({ hasText: "Jo Marsh" }).filter({ hasText: "Recorded work" })).toBeVisible();
  await expect(log.getByRole("row").filter({ hasText: "Jo Marsh" }).filter({ hasText: "Opened the logbook" }).first()).toBeVisible();
  await openNewestMail(driver, demoAccounts.ada.email, `Quillby Tread Works added to the logbook of ${nickname}`);

  // --- The driver ends the pass; the technician's page is still open.
  await passes.open();
  await passes.revoke("Quillby Tread Works", nickname);
  await tech.setViewportSize({ width: 820, height: 1180 });
  await shop.recordWork("Inspection", "41960", "One more look.");
  await expect(tech.getByText("The driver withdrew this pass").first()).toBeVisible();
  // What was typed stays in the form.
  await expect(tech.getByLabel("Notes for the driver (optional)")).toHaveValue("One more look.");
  // A reload shows the logbook closed.
  await tech.reload();
  await expect(tech.getByRole("heading", { name: "The logbook is closed to the shop" })).toBeVisible();
  await expect(tech.getByText("DOT QF4X Z8K2 2123")).toHaveCount(0);
  await tech.screenshot({ path: `${SCREENS}/technician-pass-ended-tablet.png` });

  await driverCtx.close();
  await techCtx.close();
});

test("the shop owner sees the shop's passes, its profile and its staff", async ({ page }) => {
  await new SessionPages(page).signInAndLand(demoAccounts.wren.email, "/shop");
  await expect(page.getByRole("heading", { name: "Passes at Quillby Tread Works" })).toBeVisible();
  // No ISO dates anywhere on the shop's home (its record of work once showed them).
  await expect(page.locator("main")).not.toContainText(/\b20\d\d-\d\d-\d\d\b/);
  await page.goto("/shop/profile");
  await expect(page.getByRole("heading", { name: /profile and staff/ })).toBeVisible();
  await expect(page.getByText(demoAccounts.jo.email)).toBeVisible();
  await page.screenshot({ path: `${SCREENS}/shop-profile-desktop.png`, fullPage: true });
});

test("the owner invites a technician, who joins once through the e-mailed link, and is later removed", async ({ page }) => {
  const email = `new-tech-${Date.now()}@example.test`;
  const session = new SessionPages(page);
  await session.signInAndLand(demoAccounts.wren.email, "/shop");
  await page.goto("/shop/profile");
  await page.getByLabel("Invite a technician by e-mail").fill(email);
  await page.getByRole("button", { name: "Send the invitation" }).click();
  await expect(page.getByText(`An invitation went to ${email}.`)).toBeVisible();
  await expect(page.getByText(`${email} · waiting to be accepted`)).toBeVisible();

  await openNewestMail(page, email, "Wren Halloway invited you to Quillby Tread Works on Fourpatch");
  const link = await page.frameLocator("iframe").getByRole("link", { name: "Join Quillby Tread Works" }).getAttribute("href");
  expect(link).toMatch(/\/join\//);
  const path = new URL(link!).pathname;
  await page.goto("/shop/profile");
  await session.signOut();

  await page.goto(path);
  await expect(page.getByText(`The invitation is for ${email}.`)).toBeVisible();
  // "Create an account" comes back to the invitation once the account exists.
  await page.getByRole("link", { name: "Create an account" }).click();
  await expect(page).toHaveURL(/\/sign-up\?next=/);
  await page.getByLabel("Your name").fill("Perrin Dunmore");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("a-long-enough-password");
  await page.getByRole("button", { name: "Create my logbook" }).click();
  // The invited address is confirmed through its e-mail; the link comes back to the invitation, signed in.
  await confirmSignUp(page, email);
  await expect(page).toHaveURL(new RegExp(`${path}$`));
  await page.getByRole("button", { name: "Join Quillby Tread Works" }).click();
  await expect(page).toHaveURL(/\/shop$/);
  await expect(page.getByRole("heading", { name: "Passes at Quillby Tread Works" })).toBeVisible();
  await page.goto(path);
  await expect(page.getByText("This invitation was already used")).toBeVisible();
  await page.goto("/shop");
  await session.signOut();

  await session.signInAndLand(demoAccounts.wren.email, "/shop");
  await page.goto("/shop/profile");
  await page.getByRole("button", { name: "Remove Perrin" }).click();
  // Removing someone asks first; keeping them changes nothing.
  await page.getByRole("alertdialog").getByRole("button", { name: "Keep it" }).click();
  await expect(page.getByText("Perrin Dunmore is no longer on the staff.")).toHaveCount(0);
  await page.getByRole("button", { name: "Remove Perrin" }).click();
  await expect(page.getByRole("alertdialog")).toContainText("can no longer open the shop's passes");
  await page.getByRole("alertdialog").getByRole("button", { name: "Remove Perrin" }).click();
  await expect(page.getByText("Perrin Dunmore is no longer on the staff.")).toBeVisible();
  await session.signOut();
  // No shop any more: the account lands on its own vehicles page, and the workspace is closed to it.
  await session.signInAndLand(email, "/vehicles", "a-long-enough-password");
  await page.goto("/shop");
  await expect(page.getByRole("heading", { name: "You are no longer on the staff" })).toBeVisible();
  await expect(page.getByText("Quillby Tread Works removed this account from its staff")).toBeVisible();
});
