// Changing and deleting history (issue 10): the driver changes a tread check,
// deletes a service entry and a tire through their confirmations; a
// technician on a phone changes the check the shop recorded under its pass,
// and the driver's access log says so. History is made through the API; the
// clicks are the ones a person makes.
import { expect, test, type APIRequestContext } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { condition } from "../../lib/visual/tokens";
import { SessionPages } from "./pages/session";
import { DriverPassesPage } from "./pages/shop-pass";

const hexToRgb = (hex: string) => `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(", ")})`;

async function post<T>(request: APIRequestContext, url: string, data: unknown): Promise<T> {
  const res = await request.post(url, { data });
  expect(res.status(), await res.text()).toBe(201);
  return (await res.json()) as T;
}

test("the driver changes a check, deletes a service entry and a tire, each confirmed", async ({ page }) => {
  await page.setViewportSize({ width: 1366, height: 900 });
  await new SessionPages(page).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const vehicleId = await DriverPassesPage.makeVehicle(page.request, `Edit test ${Date.now().toString(36)}`);
  const book = (await (await page.request.get(`/api/vehicles/${vehicleId}`)).json()) as { sets: { id: string; tires: { id: string; position: string }[] }[] };
  const set = book.sets[0];
  const tireOf = (p: string) => set.tires.find((t) => t.position === p)!.id;
  await post(page.request, `/api/vehicles/${vehicleId}/checks`, { setId: set.id, odometer: "41300", readings: set.tires.map((t) => ({ tireId: t.id, centre: "6.5" })) });
  await post(page.request, `/api/vehicles/${vehicleId}/service-entries`, { kind: "balancing", odometer: "41300", notes: "Balanced the fronts.", checks: [] });

  await page.goto(`/vehicles/${vehicleId}`);
  const history = page.getByTestId("history");
  await expect(history.getByTestId("history-row")).toHaveCount(3); // the fitting, the check, the balancing

  // Change the check: the same form as recording one, filled with what was saved.
  await history.getByRole("button", { name: /^Change: Tread check/ }).click();
  const edit = page.getByTestId("edit-entry");
  const frontLeft = edit.getByRole("group", { name: "Front left" });
  await expect(frontLeft.getByLabel("Centre (mm)")).toHaveValue("6.5");
  await frontLeft.getByLabel("Centre (mm)").fill("5.2");
  await edit.getByRole("button", { name: "Save the changes" }).click();
  const toast = page.locator("[data-sonner-toast]").filter({ hasText: /The tread check of .* is changed\./ });
  await expect(toast).toBeVisible();
  // The toast wears Fourpatch's own "done" wash, not the library's green.
  await expect(toast).toHaveCSS("background-color", hexToRgb(condition.good.wash));
  await expect(edit).toHaveCount(0);
  await expect(history.getByTestId("history-row").filter({ hasText: "Tread check" })).toContainText("Front left 5.2 mm");

  // Delete the service entry, after saying yes.
  await history.getByRole("button", { name: /^Delete: Balancing/ }).click();
  const dialog = page.getByRole("alertdialog");
  await expect(dialog).toContainText("tread checks taken with it stay");
  await dialog.getByRole("button", { name: "Delete the entry" }).click();
  await expect(page.locator("[data-sonner-toast]").filter({ hasText: /Balancing of .* deleted\./ })).toBeVisible();
  await expect(history.getByTestId("history-row")).toHaveCount(2);

  // Delete one tire: the confirmation names what goes with it.
  const tireCard = page.getByTestId("set-card").first().getByTestId("tire").filter({ hasText: "Front right" });
  await tireCard.getByRole("button", { name: /of the front right tire/ }).click();
  await tireCard.getByRole("button", { name: /^Delete this tire/ }).click();
  await expect(dialog).toContainText("1 tread reading goes with it");
  await dialog.getByRole("button", { name: "Delete the tire and its readings" }).click();
  await expect(page.locator("[data-sonner-toast]").filter({ hasText: "The front right tire is deleted." })).toBeVisible();
  await expect(page.getByTestId("set-card").first().getByTestId("tire")).toHaveCount(3);
  expect((await page.request.patch(`/api/tires/${tireOf("front_right")}`, { data: { position: "front_right" } })).status()).toBe(404);
});

test("a technician on a phone changes the check the shop recorded under its pass; the driver's access log says so", async ({ browser }) => {
  const driverCtx = await browser.newContext();
  const driver = await driverCtx.newPage();
  await new SessionPages(driver).signInAndLand(demoAccounts.ada.email, "/vehicles");
  const nickname = `Pass edit ${Date.now().toString(36)}`;
  const vehicleId = await DriverPassesPage.makeVehicle(driver.request, nickname);
  const { shops } = (await (await driver.request.get("/api/shops?q=quillby")).json()) as { shops: { id: string }[] };
  const { pass } = await post<{ pass: { id: string } }>(driver.request, "/api/passes", { shopId: shops[0].id, vehicleIds: [vehicleId], scope: "view_add", duration: "4h" });

  const techCtx = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const tech = await techCtx.newPage();
  await new SessionPages(tech).signInAndLand(demoAccounts.jo.email, "/shop");
  const { logbook } = (await (await tech.request.get(`/api/passes/${pass.id}/vehicles/${vehicleId}`)).json()) as { logbook: { sets: { id: string; tires: { id: string }[] }[] } };
  const set = logbook.sets[0];
  await post(tech.request, `/api/passes/${pass.id}/vehicles/${vehicleId}/checks`, { setId: set.id, readings: set.tires.map((t) => ({ tireId: t.id, centre: "6.1" })) });

  await tech.goto(`/shop/passes/${pass.id}/${vehicleId}`);
  await tech.getByRole("button", { name: /^Change the tread check of/ }).click();
  const form = tech.getByTestId("pass-edit");
  const rearLeft = form.getByRole("group", { name: "Rear left" });
  await expect(rearLeft.getByLabel("Centre (mm)")).toHaveValue("6.1");
  await rearLeft.getByLabel("Centre (mm)").fill("5.9");
  await form.getByRole("button", { name: "Save the changes" }).click();
  await expect(tech.locator("[data-sonner-toast]").filter({ hasText: /is changed\./ })).toBeVisible();
  await expect(form).toHaveCount(0);
  // Nothing on the phone scrolls sideways.
  expect(await tech.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

  const log = (await (await driver.request.get(`/api/passes/access-log?vehicleId=${vehicleId}`)).json()) as { entries: { action: string; actorName: string }[] };
  expect(log.entries.find((e) => e.action === "edit_check")).toMatchObject({ actorName: demoAccounts.jo.name });
  await techCtx.close();
  await driverCtx.close();
});

test("the dev outbox gives each message's time in the viewer's zone, not UTC", async ({ browser }) => {
  const ctx = await browser.newContext({ timezoneId: "Europe/Berlin", locale: "de-DE" });
  const page = await ctx.newPage();
  await page.goto("/sign-in");
  // The browser tells the server its zone once (a cookie); the next page is drawn in it.
  await expect.poll(async () => (await ctx.cookies()).find((c) => c.name === "fp_tz")?.value).toBe("Europe%2FBerlin");
  await page.goto("/dev/outbox");
  const first = page.getByRole("listitem").first();
  // December in Berlin is CET, "MEZ" in German (EU summer time ends on the last Sunday of October, Directive 2000/84/EC).
  await expect(first).toContainText(/MEZ|MESZ/);
  await expect(page.locator("main")).not.toContainText("UTC");
  await ctx.close();
});
