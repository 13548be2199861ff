import { expect, type APIRequestContext, type Page } from "@playwright/test";

/** Page objects for the shop-pass journey: the driver's passes page and the technician's workspace. */
export class DriverPassesPage {
  constructor(private readonly page: Page) {}

  /** A vehicle with a mounted set of four, made through the logbook's own API as the signed-in driver. */
  static async makeVehicle(request: APIRequestContext, nickname: string) {
    const v = await request.post("/api/vehicles", { data: { nickname, make: "Korvan", model: "Tessel", year: "2018", odometerUnit: "km" } });
    expect(v.status(), await v.text()).toBe(201);
    const { vehicle } = (await v.json()) as { vehicle: { id: string } };
    const s = await request.post(`/api/vehicles/${vehicle.id}/sets`, {
      data: {
        kind: "summer",
        size: "205/55R16",
        odometer: "41200",
        mountNow: true,
        tires: ["front_left", "front_right", "rear_left", "rear_right"].map((position) => ({ position, dotCode: "DOT QF4X Z8K2 2123", newDepth: "8" })),
      },
    });
    expect(s.status(), await s.text()).toBe(201);
    return vehicle.id;
  }

  async open() {
    await this.page.goto("/passes");
    await expect(this.page.getByRole("heading", { name: "Shop passes", level: 1 })).toBeVisible();
  }

  async issue(opts: { vehicle: string; shopSearch: string; shop: string; scope: "Read only" | "Read and add entries"; duration: string; note?: string }) {
    const form = this.page.locator("form").filter({ has: this.page.getByRole("button", { name: "Give the pass" }) });
    await form.getByRole("checkbox", { name: new RegExp(opts.vehicle) }).check();
    await form.getByRole("searchbox", { name: "Find a shop by name or town" }).fill(opts.shopSearch);
    await form.getByRole("radio", { name: new RegExp(opts.shop) }).check();
    await form.getByRole("radio", { name: new RegExp(`^${opts.scope}`) }).check();
    await form.getByLabel("How long").selectOption({ label: opts.duration });
    if (opts.note) await form.getByLabel("Note for the shop (optional)").fill(opts.note);
    await form.getByRole("button", { name: "Give the pass" }).click();
    await expect(this.page.getByText("The pass is on its way")).toBeVisible();
  }

  pass(shop: string) {
    return this.page.getByTestId("driver-pass").filter({ hasText: shop });
  }

  accessLogFor(vehicle: string) {
    return this.page.locator("section[aria-labelledby=access-log] > div").filter({ has: this.page.getByRole("heading", { name: vehicle }) });
  }

  /** Ends the pass to `shop` whose card names `vehicle` (the demo has other passes to the same shop). */
  async revoke(shop: string, vehicle: string) {
    const card = this.pass(shop).filter({ hasText: vehicle });
    await card.getByRole("button", { name: "End the pass now" }).click();
    await card.getByRole("button", { name: "Yes, end it now" }).click();
    await expect(this.page.getByText(`${shop} can no longer open the logbook.`)).toBeVisible();
  }
}

export class ShopWorkspacePage {
  constructor(private readonly page: Page) {}

  async openPassFor(vehicle: string) {
    await this.page.goto("/shop");
    const card = this.page.getByTestId("shop-pass").filter({ hasText: vehicle });
    await expect(card).toBeVisible();
    await expect(card.getByTestId("time-left")).toContainText(/left/);
    await card.click();
    await expect(this.page.getByRole("heading", { name: vehicle, level: 1 })).toBeVisible();
  }

  tire(position: "front_left" | "front_right" | "rear_left" | "rear_right") {
    return this.page.getByTestId(`tire-${position}`);
  }

  async fillDepths(position: string, inner: string, centre: string, outer: string) {
    await this.page.getByLabel(`${position} inner depth in mm`).fill(inner);
    await this.page.getByLabel(`${position} centre depth in mm`).fill(centre);
    await this.page.getByLabel(`${position} outer depth in mm`).fill(outer);
  }

  workForm() {
    return this.page.locator("form").filter({ has: this.page.getByRole("heading", { name: "Record work" }) });
  }

  async recordWork(kind: string, odometer: string, notes: string) {
    const form = this.workForm();
    await form.getByLabel("Work done").selectOption({ label: kind });
    await form.getByLabel("Odometer (km)").fill(odometer);
    await form.getByLabel("Notes for the driver (optional)").fill(notes);
    await form.getByRole("button", { name: "Save to the driver's logbook" }).click();
  }
}
