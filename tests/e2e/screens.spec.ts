// Issue 10: the screens as users meet them. The history table stays calm while
// it is searched, sorted, paged and filtered; a purchase without DOT codes is
// warned about and its tires say "age unknown" until a code is added; deletes
// ask first; the technician's confirmation is in view on a phone.
import { mkdirSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { addDays, dotWeekOf, formatDotDateCode } from "../../lib/tires";
import { HistoryPages } from "./pages/history";
import { LogbookPages, POSITIONS } from "./pages/logbook";
import { PLUS_ADDS } from "../../lib/plan";
import { SessionPages } from "./pages/session";
import { DriverPassesPage, ShopWorkspacePage } from "./pages/shop-pass";

const SCREENS = "tests/e2e/artifacts/screens";
mkdirSync(SCREENS, { recursive: true });
const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1366, height: 900 };

async function openAdasCar(page: Page) {
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  await page.getByRole("link", { name: "The Velora" }).first().click();
  await expect(page.getByRole("heading", { name: "The Velora", level: 1 })).toBeVisible();
}

async function noSidewaysScroll(page: Page) {
  const [scroll, client] = await page.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
  expect(scroll, "the page scrolls sideways").toBeLessThanOrEqual(client);
}

for (const [name, viewport] of [["phone", PHONE], ["desktop", DESKTOP]] as const) {
  test(`the history table searches, sorts, pages and filters without a render loop (${name})`, async ({ page }) => {
    await page.setViewportSize(viewport);
    await openAdasCar(page);
    const h = new HistoryPages(page);
    await h.table().scrollIntoViewIfNeeded();
    await expect(h.status()).toContainText(/Page 1 of 2 · 11 entries/);
    await h.expectCalm();

    await h.header("Date").click();
    await expect(h.table().getByRole("columnheader", { name: /Date/ })).toHaveAttribute("aria-sort", "ascending");
    await h.expectCalm();

    await h.nextPage().click();
    await expect(h.status()).toContainText("Page 2 of 2");
    await h.expectCalm();

    await h.search().fill("a");
    await expect(h.status()).toContainText("Page 1 of");
    await h.expectCalm();
    await h.search().fill("alignment");
    await expect(h.status()).toContainText("1 entry");
    await expect(h.status()).not.toContainText("1 entries");
    await h.search().fill("");

    await h.filter().selectOption({ label: "Tread check" });
    await expect(h.table().getByTestId("history-row")).toHaveCount(8);
    await h.expectCalm();
    await h.filter().selectOption({ label: "Everything" });
    await noSidewaysScroll(page);
    await page.screenshot({ path: `${SCREENS}/history-table-${name}.png`, fullPage: true });

    // A tab stuck in a render loop cannot follow a link; this one does, at once.
    const started = Date.now();
    await page.getByRole("link", { name: "Reminders" }).first().click();
    await expect(page).toHaveURL(/\/reminders$/, { timeout: 1_000 });
    expect(Date.now() - started).toBeLessThan(1_000);
  });
}

function dotCode(daysAgo: number) {
  const w = dotWeekOf(addDays(new Date().toISOString().slice(0, 10), -daysAgo))!;
  return `DOT 5TRW 9KLM ${formatDotDateCode(w.week, w.year)}`;
}

test("a purchase without DOT codes is warned about; its tires are 'age unknown' until a code is added", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize(PHONE);
  const nickname = `Spare runabout ${Date.now().toString(36)}`;
  await new SessionPages(page).signInAndLand(demoAccounts.tomas.email, "/vehicles");
  const v = await page.request.post("/api/vehicles", { data: { nickname, make: "Pellan", model: "Skiff", odometerUnit: "km" } });
  expect(v.status()).toBe(201);
  const logbook = new LogbookPages(page);
  await page.goto("/log-purchase");
  await logbook.chooseVehicle(nickname);
  await logbook.chooseKind("Summer");
  await logbook.typeSize("195/65 R15 91H");
  await page.getByRole("button", { name: "Save the purchase" }).click();
  const warning = page.locator("#missing-codes");
  await expect(warning).toContainText("4 tires have no DOT code.");
  await expect(warning).toBeInViewport();
  await page.screenshot({ path: `${SCREENS}/purchase-without-codes-phone.png` });
  await page.setViewportSize(DESKTOP);
  await page.screenshot({ path: `${SCREENS}/purchase-without-codes-desktop.png` });
  await page.setViewportSize(PHONE);
  // "Add the codes now" goes back to the first empty code; nothing is saved.
  await warning.getByRole("button", { name: "Add the codes now" }).click();
  await expect(logbook.dotInput("Front left")).toBeFocused();
  await page.getByRole("button", { name: "Save the purchase" }).click();
  await warning.getByRole("button", { name: "Save without the codes" }).click();
  await expect(page.getByText("The new set is saved in the logbook.")).toBeVisible({ timeout: 20_000 });

  const card = logbook.setCard(/Summer set/);
  for (const badge of await card.getByTestId("tire").locator("[data-condition]").all()) await expect(badge).toHaveAttribute("data-condition", "unknown");
  await expect(card.locator("[data-condition='good']")).toHaveCount(0);
  await expect(card.getByTestId("tire").first()).toContainText("Age unknown — read the code");
  await page.screenshot({ path: `${SCREENS}/purchase-without-codes-vehicle-phone.png`, fullPage: true });

  // The code, read later from the sidewall, is added in place.
  const fl = card.getByTestId("tire").filter({ hasText: "Front left" });
  await fl.getByRole("button", { name: /Add the DOT code/ }).click();
  await fl.getByLabel("DOT code").fill(dotCode(200));
  await expect(fl.getByTestId("dot-decoded")).toContainText("Made in week");
  await fl.getByRole("button", { name: "Save the tire" }).click();
  await expect(fl.locator("[data-condition]").first()).toHaveAttribute("data-condition", "good");
  await expect(fl).toContainText(dotCode(200));
  await noSidewaysScroll(page);
  for (const p of POSITIONS.slice(1)) await expect(card.getByTestId("tire").filter({ hasText: p }).locator("[data-condition]").first()).toHaveAttribute("data-condition", "unknown");
});

test("deleting history entries, files and a vehicle asks first; cancelling keeps them", async ({ page }) => {
  test.setTimeout(120_000);
  await page.setViewportSize(DESKTOP);
  const nickname = `Old hatch ${Date.now().toString(36)}`;
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const vehicleId = await DriverPassesPage.makeVehicle(page.request, nickname);
  await page.goto(`/vehicles/${vehicleId}`);
  const h = new HistoryPages(page);
  await expect(h.table().getByTestId("history-row")).toHaveCount(1);

  const del = h.table().getByRole("button", { name: /^Delete: Fitting/ });
  await del.click();
  const dialog = page.getByRole("alertdialog");
  await expect(dialog).toContainText("This cannot be undone.");
  await dialog.getByRole("button", { name: "Keep it" }).click();
  await expect(dialog).toBeHidden();
  await expect(h.table().getByTestId("history-row")).toHaveCount(1);
  await del.click();
  await page.getByRole("alertdialog").getByRole("button", { name: "Delete the entry" }).click();
  await expect(h.section().getByText("Nothing matches.")).toBeVisible();
  await h.expectCalm();

  // The vehicle: changed on its own page, then deleted after a confirmation naming what goes.
  await page.getByRole("link", { name: "Change or delete the vehicle" }).click();
  await page.getByLabel("Plate (optional)").fill("QF-123");
  await page.getByRole("button", { name: "Save the changes" }).click();
  await expect(page.getByText("The vehicle is saved.")).toBeVisible();
  await expect(page.getByRole("heading", { level: 1, name: nickname })).toBeVisible();
  await page.getByRole("link", { name: "Change or delete the vehicle" }).click();
  await page.getByRole("button", { name: `Delete ${nickname}` }).click();
  await expect(page.getByRole("alertdialog")).toContainText("1 set, 0 history entries and 0 files go with it.");
  await page.getByRole("alertdialog").getByRole("button", { name: "Delete the vehicle" }).click();
  await expect(page).toHaveURL(/\/vehicles$/);
  await expect(page.getByText(`${nickname} is deleted.`)).toBeVisible();
  await expect(page.getByRole("link", { name: nickname })).toHaveCount(0);
});

test("on a phone the technician sees the saved confirmation where they are looking", async ({ browser }) => {
  test.setTimeout(180_000);
  const nickname = `Ada's Korvan ${Date.now().toString(36)}`;
  const driverCtx = await browser.newContext({ viewport: PHONE });
  const driver = await driverCtx.newPage();
  await new SessionPages(driver).signInAndLand(demoAccounts.ada.email, "/vehicles");
  await DriverPassesPage.makeVehicle(driver.request, nickname);
  const passes = new DriverPassesPage(driver);
  await passes.open();
  await passes.issue({ vehicle: nickname, shopSearch: "quillby", shop: "Quillby Tread Works", scope: "Read and add entries", duration: "A working day (8 hours)" });

  const techCtx = await browser.newContext({ viewport: PHONE });
  const tech = await techCtx.newPage();
  await new SessionPages(tech).signInAndLand(demoAccounts.jo.email, "/shop");
  const shop = new ShopWorkspacePage(tech);
  await shop.openPassFor(nickname);
  for (const p of ["Front left", "Front right", "Rear left", "Rear right"]) await shop.fillDepths(p, "6.4", "6.8", "6.6");
  await shop.recordWork("Inspection", "41950", "All four look fine.");
  const outcome = tech.getByTestId("work-outcome").getByText("Inspection saved to the driver's logbook, with the tread check.");
  await expect(outcome).toBeInViewport();
  // Not hidden under the sticky header either: its top is below the header's bottom.
  const header = await tech.locator("header").first().boundingBox();
  await expect.poll(async () => (await outcome.boundingBox())!.y).toBeGreaterThanOrEqual(header ? header.y + header.height - 1 : 0);
  await expect(tech.locator("[data-sonner-toast]")).toContainText("Inspection saved");
  await tech.screenshot({ path: `${SCREENS}/technician-confirmation-phone.png` });
  await techCtx.close();
  await driverCtx.close();
});

test("pricing promises only what the plan changes, and a 404 has a way back", async ({ page }) => {
  await page.goto("/pricing");
  await expect(page.getByText(/more vehicles/i)).toHaveCount(0);
  for (const line of PLUS_ADDS) await expect(page.getByText(line)).toBeVisible();
  const res = await page.goto("/vehicles/00000000-0000-4000-8000-000000000000/nowhere");
  expect(res?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "This page is not here" })).toBeVisible();
  await expect(page).toHaveTitle("Page not found · Fourpatch");
  await page.getByRole("link", { name: "Fourpatch home" }).click();
  await expect(page).toHaveURL(/\/$/);
});

test("the seasonal swap asks where the set coming off goes before any request", async ({ page }) => {
  await openAdasCar(page);
  const requests: string[] = [];
  page.on("request", (r) => r.url().includes("/swap") && requests.push(r.url()));
  const card = new LogbookPages(page).setCard(/Winter/);
  await card.getByRole("button", { name: "Put this set on the car" }).click();
  await card.getByLabel(/will be kept|set coming off is kept/).fill("");
  await card.getByRole("button", { name: "Save the swap" }).click();
  await expect(card.getByText(/Say where .* will be kept\./)).toBeVisible();
  expect(requests).toEqual([]);
  await card.getByRole("button", { name: "Cancel" }).click();
});

test("times are shown in the viewer's own zone and locale (a browser in Berlin, in German)", async ({ browser }) => {
  const ctx = await browser.newContext({ timezoneId: "Europe/Berlin", locale: "de-DE", viewport: DESKTOP });
  const page = await ctx.newPage();
  await openAdasCar(page);
  // The browser tells the server its zone once (a cookie), and the page is drawn again in it.
  await expect.poll(async () => (await ctx.cookies()).find((c) => c.name === "fp_tz")?.value).toBe("Europe%2FBerlin");
  const log = page.getByRole("region", { name: "Who looked at this logbook" });
  // December in Berlin is CET: "MEZ" in German (EU summer time ends on the last Sunday of October, Directive 2000/84/EC).
  await expect(log.getByRole("cell").first()).toContainText(/MEZ|MESZ/);
  await expect(log).not.toContainText("UTC");
  // German grouping in numbers ("73.740 km"), German month names in dates; no ISO dates.
  await expect(page.getByRole("heading", { level: 1 }).locator("xpath=..")).toContainText(/\d{1,3}\.\d{3} km/);
  await expect(page.locator("main")).not.toContainText(/\b20\d\d-\d\d-\d\d\b/);
  // The tread glyph's text alternative writes depths with a German decimal comma (the EU limit, 1,6 mm).
  await expect(page.getByRole("img", { name: /^Tread profile: .*limit 1,6 mm/ }).first()).toBeAttached();
  await ctx.close();
});

test("an expired password-reset link offers a new one; a deleted account is told so", async ({ page }) => {
  await page.goto("/reset-password?token=used-token&error=INVALID_TOKEN");
  await expect(page.getByText("This reset link has expired or was already used.")).toBeVisible();
  await page.getByRole("link", { name: "Send me a new link" }).click();
  await expect(page).toHaveURL(/\/forgot-password$/);
  await expect(page.getByRole("button", { name: "Send me a reset link" })).toBeVisible();
  await page.goto("/?account=deleted");
  await expect(page.getByRole("status").filter({ hasText: "Your account is deleted" })).toBeVisible();
});
