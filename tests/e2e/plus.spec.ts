// Buying, using, changing and cancelling Plus in the browser, on a phone
// viewport, against the local Stripe fake (hosted checkout, signed webhooks).
import fs from "node:fs";
import ICAL from "ical.js";
import { expect, test, type Page } from "@playwright/test";
import { addDays, dotWeekOf, formatDotDateCode } from "../../lib/tires";
import { BillingPages } from "./pages/billing";
import { RemindersPage } from "./pages/reminders";
import { confirmSignUp } from "./pages/session";

const SCREENS = "tests/e2e/artifacts/screens";
fs.mkdirSync(SCREENS, { recursive: true });

test.use({ viewport: { width: 390, height: 844 } });

async function signUpNew(page: Page, name: string) {
  const email = `${name.split(" ")[0]!.toLowerCase()}-${Date.now()}@example.test`;
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill(name);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("a-long-enough-password");
  await page.getByRole("button", { name: "Create my logbook" }).click();
  await confirmSignUp(page, email);
  await expect(page).toHaveURL(/\/vehicles$/);
  return email;
}

/** A vehicle with a set of tires made about 5½ years ago, through the app's own API (so reminders have dates). */
async function addLogbook(page: Page, baseURL: string) {
  const today = new Date().toISOString().slice(0, 10);
  const w = dotWeekOf(addDays(today, -2000))!;
  const code = formatDotDateCode(w.week, w.year);
  const headers = { origin: baseURL };
  const v = await page.request.post("/api/vehicles", {
    headers,
    data: { nickname: "The grey wagon", make: "Velora", model: "Tessel", year: "2018", placardFrontSize: "205/55 R16 91V", placardFrontPressure: "230", pressureUnit: "kpa", odometerUnit: "km" },
  });
  expect(v.status()).toBe(201);
  const vehicleId = ((await v.json()) as { vehicle: { id: string } }).vehicle.id;
  const s = await page.request.post(`/api/vehicles/${vehicleId}/sets`, {
    headers,
    data: {
      kind: "summer",
      size: "205/55 R16 91V",
      purchasedOn: addDays(today, -1900),
      price: "380",
      currency: "EUR",
      seller: "Fernhollow Tyres",
      depthUnit: "mm",
      odometer: "52000",
      odometerUnit: "km",
      mountNow: true,
      tires: (["front_left", "front_right", "rear_left", "rear_right"] as const).map((position) => ({ position, dotCode: `DOT 3QXY ABC ${code}`, newDepth: "8" })),
    },
  });
  expect(s.status()).toBe(201);
}

test("a Free driver buys Plus, uses it, cancels, resumes and switches to yearly", async ({ page, request, baseURL }) => {
  await signUpNew(page, "Maren Thistledown");
  await addLogbook(page, baseURL!);
  const billing = new BillingPages(page);

  // A Free driver is offered an upgrade, not a dead control.
  const reminders = new RemindersPage(page);
  await reminders.open();
  await expect(page.getByRole("link", { name: "Upgrade to Plus" }).first()).toBeVisible();

  await billing.buyFromPricing("monthly");
  await page.screenshot({ path: `${SCREENS}/e2e-plus-checkout-phone.png`, fullPage: true });
  await billing.payWithCard("4242 4242 4242 4242");
  await expect(page).toHaveURL(/\/account\/billing\?checkout=done/);
  await expect(billing.plan()).toHaveText("Your plan: Plus");
  await expect(page.getByTestId("plan-price")).toContainText("per month");
  await expect(page.getByText("Renews on", { exact: true })).toBeVisible();
  await expect(billing.invoices()).toHaveCount(1);
  await expect(billing.invoices().first()).toContainText("Paid");
  await page.screenshot({ path: `${SCREENS}/e2e-plus-billing-phone.png`, fullPage: true });

  // Plus features: e-mail reminders and calendar alarms.
  await reminders.open();
  await expect(page.getByRole("heading", { name: "Your plan: Plus" })).toBeVisible();
  const settings = reminders.settings();
  await settings.getByLabel("Send me an e-mail before each date").check();
  await settings.getByLabel("Alarm 1, days before").fill("7");
  await reminders.saveSettings();
  await expect(settings.getByText("Saved. E-mail reminders are on.")).toBeVisible();
  const { https } = await reminders.makeFeedLink();
  const feed = await request.get(https);
  expect(feed.status()).toBe(200);
  const text = await feed.text();
  const events = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent");
  expect(events.length).toBeGreaterThan(0);
  const alarm = events[0]!.getFirstSubcomponent("valarm");
  expect(alarm).not.toBeNull();
  // RFC 5545 §3.8.6.3: a relative trigger of seven days before the start.
  expect((alarm!.getFirstPropertyValue("trigger") as ICAL.Duration).toSeconds()).toBe(-7 * 86_400);

  // The receipt went through the e-mail fake.
  await page.goto("/dev/outbox");
  await expect(page.getByRole("link", { name: /Your Fourpatch Plus receipt/ }).first()).toBeVisible();

  // Cancel at period end: asks first, then shows the end date; resume undoes it.
  await billing.open();
  await billing.cancelAtPeriodEnd();
  await expect(page.getByText("Ends on", { exact: true })).toBeVisible();
  const endDate = (await page.getByTestId("plan-date").textContent())!;
  await expect(page.getByText(`Plus is cancelled and ends on ${endDate}`)).toBeVisible();
  await billing.resume();
  await expect(page.getByText("Renews on", { exact: true })).toBeVisible();

  // Each question can be declined and changes nothing.
  await page.getByRole("button", { name: "Cancel Plus" }).click();
  await page.getByRole("button", { name: "Keep Plus" }).click();
  await expect(page.getByText("Renews on", { exact: true })).toBeVisible();
  await page.getByRole("button", { name: "Switch to yearly" }).click();
  await page.getByRole("button", { name: "Keep monthly" }).click();
  await expect(page.getByTestId("plan-price")).toContainText("per month");

  // Monthly → yearly: asks first, then a yearly price and a second invoice.
  await billing.switchTo("yearly");
  await expect(page.getByTestId("plan-price")).toContainText("per year");
  await expect(billing.invoices()).toHaveCount(2);
  await page.getByRole("button", { name: "Switch to monthly" }).click();
  await page.getByRole("button", { name: "Keep yearly" }).click();

  // No sideways scrolling on the phone.
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);

  // Cancel again and let the period end on the developer page: back to Free, settings kept.
  await billing.cancelAtPeriodEnd();
  await expect(page.getByText("Ends on", { exact: true })).toBeVisible();
  await page.goto("/dev/stripe");
  const mine = page.getByTestId("fake-subscription").filter({ hasText: "maren-" });
  await mine.getByRole("button", { name: "Reach the period end" }).click();
  await expect(mine).toContainText("canceled");
  await billing.open();
  await expect(billing.plan()).toHaveText("Your plan: Free");
  await expect(page.getByText(/Your Plus ended on/)).toBeVisible();
  await reminders.open();
  await expect(page.getByRole("heading", { name: "Your plan: Free" })).toBeVisible();
  const after = await request.get(https);
  expect(await after.text()).not.toContain("BEGIN:VALARM");
});

test("a failed renewal shows the payment problem and the fix; a declined card leaves a second driver on Free", async ({ page }) => {
  // Signed out, Pricing leads to an account first.
  await page.goto("/pricing");
  await page.getByRole("link", { name: "Start free, then buy Plus" }).click();
  await expect(page).toHaveURL(/\/sign-up$/);
  await signUpNew(page, "Odile Brackwater");
  const billing = new BillingPages(page);
  await billing.open();
  await expect(billing.plan()).toHaveText("Your plan: Free");
  await page.getByRole("button", { name: /^Buy Plus yearly/ }).click();
  await expect(page).toHaveURL(/\/dev\/stripe\/checkout\//);
  await billing.payWithCard("4000 0000 0000 0002");
  await expect(page.getByText("Your card was declined.")).toBeVisible();
  await billing.payWithCard("4000 0000 0000 9995");
  await expect(page.getByText("Your card has insufficient funds.")).toBeVisible();
  await page.screenshot({ path: `${SCREENS}/e2e-plus-declined-phone.png`, fullPage: true });
  await page.getByRole("link", { name: "Cancel and go back" }).click();
  await expect(page.getByText("Checkout was cancelled; nothing was charged.")).toBeVisible();
  await expect(billing.plan()).toHaveText("Your plan: Free");

  // Now pay, then make the renewal fail on the developer page.
  await page.getByRole("button", { name: /^Buy Plus monthly/ }).click();
  await billing.payWithCard("4242424242424242");
  await expect(billing.plan()).toHaveText("Your plan: Plus");
  await page.goto("/dev/stripe");
  const mine = page.getByTestId("fake-subscription").filter({ hasText: "odile-" });
  await mine.getByRole("button", { name: "Make the next renewal fail" }).click();
  await expect(mine.getByText("next renewal will fail")).toBeVisible();
  await mine.getByRole("button", { name: "Let the next renewal pay" }).click();
  await expect(mine.getByText("next renewal will fail")).toHaveCount(0);
  await mine.getByRole("button", { name: "Make the next renewal fail" }).click();
  await expect(mine.getByText("next renewal will fail")).toBeVisible();
  await mine.getByRole("button", { name: "Advance to renewal" }).click();
  await expect(mine).toContainText("past_due");
  await page.getByRole("button", { name: "Send again" }).first().click();

  await billing.open();
  await expect(page.getByText("Your last payment failed")).toBeVisible();
  await page.getByRole("link", { name: "Fix the payment" }).click();
  await expect(page).toHaveURL(/\/dev\/stripe\/invoice\/in_/);
  await billing.payWithCard("4242 4242 4242 4242");
  await expect(page.getByText("Paid. Thank you.")).toBeVisible();
  await page.getByRole("link", { name: "Back to billing" }).click();
  await expect(page.getByText("Your last payment failed")).toHaveCount(0);
  await expect(billing.plan()).toHaveText("Your plan: Plus");
});
