// What a driver owns, in the browser: a co-keeper records a check on the
// owner's car; a vehicle is handed to a new account with its history; and a
// driver takes the logbook out, deletes the account, and brings it back.
import { mkdirSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { HouseholdPages } from "./pages/household";
import { LogbookPages } from "./pages/logbook";
import { SessionPages } from "./pages/session";
import { DriverPassesPage } from "./pages/shop-pass";

const SCREENS = "tests/e2e/artifacts/screens";
const DOT = "DOT QF4X Z8K2 2123";

test("Ada invites Tomas to keep a car; Tomas records a check on it; Ada sees it under his name, then ends it", async ({ browser }) => {
  test.setTimeout(180_000);
  mkdirSync(SCREENS, { recursive: true });
  const nickname = `Ada's Korvan ${Date.now().toString(36)}`;
  const adaCtx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const ada = await adaCtx.newPage();
  await new SessionPages(ada).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const vehicleId = await DriverPassesPage.makeVehicle(ada.request, nickname);
  await ada.goto(`/vehicles/${vehicleId}`);
  const adaHome = new HouseholdPages(ada);
  await adaHome.invite(demoAccounts.tomas.email);
  // An invitation sent by mistake is withdrawn (after a confirmation).
  await adaHome.invite("neighbour@example.test");
  await ada.getByTestId("keeper-list").getByRole("listitem").filter({ hasText: "neighbour@example.test" }).getByRole("button", { name: "Withdraw" }).click();
  await ada.getByRole("alertdialog").getByRole("button", { name: "Withdraw" }).click();
  await expect(ada.getByTestId("keeper-list")).not.toContainText("neighbour@example.test");

  const tomasCtx = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const tomas = await tomasCtx.newPage();
  await new SessionPages(tomas).signInAndLand(demoAccounts.tomas.email, "/vehicles");
  const tomasHome = new HouseholdPages(tomas);
  const link = await tomasHome.linkFromMail(demoAccounts.tomas.email, /asks you to keep a tire logbook together/, "Look at the invitation");
  await tomas.goto(link);
  await tomas.getByRole("button", { name: `Keep ${nickname} with Ada Renwick` }).click();
  await expect(tomas).toHaveURL(/\/vehicles$/);
  const card = tomas.getByRole("listitem").filter({ hasText: nickname });
  await expect(card).toContainText("Kept with Ada Renwick");
  await card.getByRole("link", { name: "Open the logbook" }).click();
  await expect(tomas.getByText(`You keep this logbook with Ada Renwick`)).toBeVisible();
  await new LogbookPages(tomas).recordCheck({ "Front left": ["6.1", "6.2", "6.0"], "Front right": ["6.3", "6.4", "6.2"], "Rear left": ["6.8", "6.9", "6.8"], "Rear right": ["6.7", "6.8", "6.9"] }, "41650");
  const scrollWidth = await tomas.evaluate(() => document.documentElement.scrollWidth);
  expect(scrollWidth).toBeLessThanOrEqual(390);
  await tomas.screenshot({ path: `${SCREENS}/co-keeper-phone.png`, fullPage: true });

  await ada.reload();
  await expect(ada.getByTestId("keeper-list")).toContainText("Co-keeper · tomas@renwick.test");
  await expect(ada.getByRole("table").filter({ hasText: "Tread check" })).toContainText("Tomas Renwick");
  await adaHome.confirm("End", "End it");
  await expect(ada.getByText("Nobody else keeps it yet.")).toBeVisible();

  await tomas.reload();
  await expect(tomas.getByRole("heading", { name: /This page is not here/ })).toBeVisible();
  await adaCtx.close();
  await tomasCtx.close();
});

test("Ada hands a vehicle to a new account, which sees its history; Ada keeps a read-only copy", async ({ browser }) => {
  test.setTimeout(180_000);
  const nickname = `Ada's Tessel ${Date.now().toString(36)}`;
  const adaCtx = await browser.newContext();
  const ada = await adaCtx.newPage();
  await new SessionPages(ada).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const vehicleId = await DriverPassesPage.makeVehicle(ada.request, nickname);
  await ada.goto(`/vehicles/${vehicleId}`);
  const adaHome = new HouseholdPages(ada);
  // A first link is withdrawn; the second one is the one handed over.
  const first = await adaHome.makeHandOnLink();
  await ada.reload();
  await adaHome.confirm("Withdraw the link", "Withdraw");
  await ada.goto(first);
  await expect(ada.getByText("This link was withdrawn")).toBeVisible();
  await ada.goto(`/vehicles/${vehicleId}`);
  const url = await adaHome.makeHandOnLink();
  await ada.getByRole("button", { name: "Copy the link" }).click();
  await expect(ada.getByText("Copied.")).toBeVisible();

  const buyerCtx = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const buyer = await buyerCtx.newPage();
  await buyer.goto(url);
  await expect(buyer.getByTestId("hand-on-summary")).toContainText(DOT);
  await expect(buyer.getByText("Prices and receipt files stay with the seller.")).toBeVisible();
  await buyer.getByRole("link", { name: "Make an account" }).click();
  const email = `next-owner-${Date.now().toString(36)}@example.test`;
  await new HouseholdPages(buyer).signUp("Rowan Ashgrove", email, "a-long-enough-password");
  await expect(buyer).toHaveURL(/\/take-on\//);
  await buyer.getByRole("button", { name: `Take on ${nickname}` }).click();
  await expect(buyer).toHaveURL(/\/vehicles$/);
  await buyer.getByRole("link", { name: nickname }).click();
  await expect(buyer.getByText(DOT).first()).toBeVisible();

  await ada.goto(url);
  await expect(ada.getByText("This link was already used")).toBeVisible();
  await ada.goto("/vehicles");
  await expect(ada.getByRole("link", { name: nickname, exact: true })).toHaveCount(1);
  await ada.getByRole("link", { name: nickname, exact: true }).click();
  await expect(ada.getByText("A read-only copy")).toBeVisible();
  await expect(ada.getByText(DOT).first()).toBeVisible();
  await adaCtx.close();
  await buyerCtx.close();
});

test("a driver exports, deletes the account, imports into a new account and sees the same logbook", async ({ browser }, info) => {
  test.setTimeout(180_000);
  const ctx = await browser.newContext();
  const page = await ctx.newPage();
  const home = new HouseholdPages(page);
  const nickname = `Export runabout ${Date.now().toString(36)}`;
  const password = "a-long-enough-password";
  await page.goto("/sign-up");
  await home.signUp("Mirela Dunstan", `exporter-${Date.now().toString(36)}@example.test`, password);
  await expect(page).toHaveURL(/\/vehicles$/);
  await DriverPassesPage.makeVehicle(page.request, nickname);
  const zip = info.outputPath("logbook.zip");
  expect(await home.exportZip(zip)).toMatch(/^fourpatch-logbook-\d{4}-\d{2}-\d{2}\.zip$/);
  await home.deleteAccount(password);

  await page.goto("/sign-up");
  await home.signUp("Mirela Dunstan", `importer-${Date.now().toString(36)}@example.test`, password);
  await expect(page).toHaveURL(/\/vehicles$/);
  await home.importZip(zip, "empty");
  await expect(page.getByText(/Imported 1 vehicle\(s\), 1 set\(s\)/)).toBeVisible({ timeout: 20_000 });
  // The same file again into the same account as "empty" is refused with the reason; nothing changes.
  await home.importZip(zip, "empty");
  await expect(page.getByText(/already has vehicles/)).toBeVisible();
  await page.goto("/vehicles");
  await page.getByRole("link", { name: nickname }).click();
  await expect(page.getByText(DOT).first()).toBeVisible();
  // The printable history of the imported vehicle.
  await page.getByRole("link", { name: "Printable tire history" }).click();
  await expect(page.getByRole("heading", { name: `Tire history: ${nickname}` })).toBeVisible();
  await page.getByRole("link", { name: "Letter" }).click();
  await expect(page).toHaveURL(/paper=letter/);
  const pdf = page.waitForEvent("download");
  await page.getByRole("link", { name: "Download PDF" }).click();
  expect((await pdf).suggestedFilename()).toMatch(/\.pdf$/);
  await ctx.close();
});
