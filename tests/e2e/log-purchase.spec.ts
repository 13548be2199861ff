import fs from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { addDays, dotWeekOf, formatDotDateCode } from "../../lib/tires";
import { LogbookPages, POSITIONS, type Position } from "./pages/logbook";
import { confirmSignUp, SessionPages } from "./pages/session";

const SCREENS = "tests/e2e/artifacts/screens";
fs.mkdirSync(SCREENS, { recursive: true });

const today = () => new Date().toISOString().slice(0, 10);
function dateCode(daysAgo: number) {
  const w = dotWeekOf(addDays(today(), -daysAgo))!;
  return { code: formatDotDateCode(w.week, w.year), week: w.week, year: w.year };
}

// A small valid PDF, as a receipt scan would be.
const RECEIPT = Buffer.from(
  "%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 200 200]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n",
);

async function logPurchase(page: Page, who: "tomas" | "ada", opts: { vehicle: RegExp; kind: "Winter" | "All-season"; size: string; load: string; fate: "stored" | "retired"; where?: string; screen: string; share?: boolean }) {
  const session = new SessionPages(page);
  const logbook = new LogbookPages(page);
  await session.signInAndLand(demoAccounts[who].email, "/vehicles");
  await logbook.openPurchase();
  await logbook.chooseVehicle(opts.vehicle);
  await logbook.chooseKind(opts.kind);
  await logbook.typeSize(opts.size);
  // The size decodes as it is typed: load in kg, speed in km/h, and the placard check.
  await expect(logbook.sizeDecoded()).toContainText(opts.load);
  await expect(logbook.sizeDecoded()).toContainText("210 km/h (H)");
  await expect(logbook.sizeDecoded()).toContainText("Against the placard size");

  // Four DOT codes, three made about 5 months ago, one about 9 months ago.
  const codes: Record<Position, ReturnType<typeof dateCode>> = {
    "Front left": dateCode(150),
    "Front right": dateCode(150),
    "Rear left": dateCode(150),
    "Rear right": dateCode(270),
  };
  if (opts.share) {
    // The shortcut: one code typed once fills all four, then one tire is corrected by hand.
    await page.getByLabel("All tires share this code").check();
    await logbook.dotInput("Front left").fill(`DOT 5TRW 9KLM ${codes["Front left"].code}`);
    for (const p of POSITIONS) await expect(logbook.dotInput(p)).toHaveValue(`DOT 5TRW 9KLM ${codes["Front left"].code}`);
    await page.getByLabel("All tires share this code").uncheck();
    await logbook.dotInput("Rear right").fill(`DOT 5TRW 9KLM ${codes["Rear right"].code}`);
  } else {
    for (const p of POSITIONS) await logbook.dotInput(p).fill(`DOT 5TRW 9KLM ${codes[p].code}`);
  }
  for (const p of POSITIONS) {
    await expect(logbook.dotDecoded(p)).toContainText(`Made in week ${codes[p].week} of ${codes[p].year}`);
    await expect(logbook.dotDecoded(p)).toContainText("months old");
    await expect(logbook.dotDecoded(p).locator("[data-condition='good']")).toBeVisible();
  }
  // A mistyped code is explained at once, and nothing else is lost.
  await logbook.dotInput("Rear right").fill("DOT 5TRW 9KLM 5724");
  await expect(page.getByTestId("dot-error")).toContainText("week");
  await logbook.dotInput("Rear right").fill(`DOT 5TRW 9KLM ${codes["Rear right"].code}`);

  await logbook.purchaseDetails({ price: "389.90", seller: "Quillby Tread Works" });
  // Saving without saying what becomes of the set on the car names the question.
  await page.getByRole("button", { name: "Save the purchase" }).click();
  await expect(page.getByText("Choose whether the old set is stored or retired.").or(page.getByText("Choose whether the set coming off is stored or retired."))).toBeVisible();
  await expect(logbook.dotInput("Front left")).toHaveValue(`DOT 5TRW 9KLM ${codes["Front left"].code}`);
  await logbook.oldSet(opts.fate, opts.where);
  await logbook.attachReceipt("receipt.pdf", RECEIPT);
  await logbook.savePurchase();

  // On the vehicle page: the set with its four tires' DOT codes, ages and condition, and the receipt.
  const card = logbook.setCard(new RegExp(`${opts.kind} set`));
  await expect(card).toContainText("On the car");
  await expect(card.getByTestId("tire")).toHaveCount(4);
  for (const p of POSITIONS) await expect(card).toContainText(`DOT 5TRW 9KLM ${codes[p].code}`);
  await expect(card.getByText(/months old/).first()).toBeVisible();
  await expect(card.locator("[data-condition]").first()).toBeVisible();
  await expect(card.getByRole("link", { name: /Receipt: receipt\.pdf/ })).toBeVisible();
  await expect(page.getByText(/local law/i).first()).toBeVisible();
  await page.screenshot({ path: `${SCREENS}/${opts.screen}-vehicle-after-purchase.png`, fullPage: true });

  // The receipt is served to its owner.
  const href = await card.getByRole("link", { name: /Receipt: receipt\.pdf/ }).getAttribute("href");
  const res = await page.request.get(href!);
  expect(res.status()).toBe(200);
  expect(res.headers()["content-type"]).toBe("application/pdf");
  return { logbook, card };
}

async function checkAndSeeChart(page: Page, logbook: LogbookPages, screen: string) {
  await page.getByRole("link", { name: "Wear chart and details" }).first().click();
  await expect(page.getByText("No tread checks yet: the chart appears after the first one.")).toBeVisible();
  await logbook.recordCheck(
    { "Front left": ["7.6", "7.9", "7.8"], "Front right": ["7.8", "7.9", "7.9"], "Rear left": ["8", "8", "8"], "Rear right": ["7.9", "8", "8"] },
    "99000",
  );
  await expect(logbook.chartMarkers()).toHaveCount(4);
  await expect(page.getByTestId("readings-table").locator("tbody tr")).toHaveCount(4);
  await page.screenshot({ path: `${SCREENS}/${screen}-set-after-check.png`, fullPage: true });
}

test.describe("a household driver logs a new tire purchase", () => {
  test.describe("on a phone", () => {
    test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });

    test("Tomas logs a winter set with four DOT codes and a receipt, then records a tread check", async ({ page }) => {
      const { logbook } = await logPurchase(page, "tomas", {
        vehicle: /Tomas's runabout/,
        kind: "Winter",
        size: "195/65 R15 91H",
        load: "615 kg (91)",
        fate: "stored",
        where: "Garage loft",
        screen: "phone",
      });
      await expect(logbook.setCard("All-season tires")).toContainText("Stored at Garage loft");
      // Nothing on the page is wider than the phone.
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await checkAndSeeChart(page, logbook, "phone");
    });
  });

  test.describe("on a desktop", () => {
    test.use({ viewport: { width: 1280, height: 800 } });

    test("Ada logs an all-season set for the van, retiring the old one, then records a tread check", async ({ page }) => {
      const { logbook } = await logPurchase(page, "ada", {
        vehicle: /The van/,
        kind: "All-season",
        size: "215/65 R16 102H",
        load: "850 kg (102)",
        fate: "retired",
        screen: "desktop",
        share: true,
      });
      await expect(page.getByText(/Retired/).first()).toBeVisible();
      await checkAndSeeChart(page, logbook, "desktop");
    });
  });
});

test("the demo's set page shows the wear chart with the zone below the limit and the inner-shoulder diagnosis", async ({ page }) => {
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  await page.getByRole("link", { name: "Summer tires" }).first().click();
  await expect(page.getByRole("heading", { name: "Summer tires" })).toBeVisible();
  await expect(page.getByText("Worn on the inner shoulder.")).toBeVisible();
  await expect(page.getByTestId("wear-chart").getByText(/^Below the 1\.6 mm limit$/)).toBeVisible();
  expect(await new LogbookPages(page).chartMarkers().count()).toBeGreaterThan(20);
  await page.screenshot({ path: `${SCREENS}/desktop-demo-set.png`, fullPage: true });
});

test("a new driver adds the vehicle inside the purchase flow; a wrong field keeps everything typed", async ({ page }) => {
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Bram Oakhollow");
  const email = `bram-${Date.now()}@example.test`;
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("a-long-enough-password");
  await page.getByRole("button", { name: "Create my logbook" }).click();
  await confirmSignUp(page, email);
  await expect(page).toHaveURL(/\/vehicles$/);
  const logbook = new LogbookPages(page);
  await logbook.openPurchase();
  // With no vehicle yet, the form asks for one in place.
  await page.getByLabel("Name for the vehicle").fill("Bram's hatch");
  await page.getByLabel("Make").fill("Velora");
  await page.getByLabel("Model").fill("Pip");
  await page.getByLabel("Placard tire size").fill("185/65 R15 88T");
  await logbook.typeSize("185/65 R15 88T");
  await expect(logbook.sizeDecoded()).toContainText("Fits");
  const { code } = dateCode(60);
  for (const p of POSITIONS) await logbook.dotInput(p).fill(`DOT 5TRW 9KLM ${code}`);
  await page.getByLabel("Date of purchase").fill("2099-01-01");
  await page.getByRole("button", { name: "Save the purchase" }).click();
  await expect(page.getByText("The purchase date is in the future.")).toBeVisible();
  await expect(page.getByLabel("Model")).toHaveValue("Pip");
  await expect(logbook.dotInput("Rear right")).toHaveValue(`DOT 5TRW 9KLM ${code}`);
  await page.getByLabel("Date of purchase").fill(today());
  await logbook.savePurchase();
  await expect(page.getByRole("heading", { name: "Bram's hatch" })).toBeVisible();
  await expect(logbook.setCard(/Summer set/).getByTestId("tire")).toHaveCount(4);
});
