import { expect, type Page } from "@playwright/test";

export type Position = "Front left" | "Front right" | "Rear left" | "Rear right";
export const POSITIONS: Position[] = ["Front left", "Front right", "Rear left", "Rear right"];

/** Page object for the driver's logbook: the purchase flow, the vehicle page, the tread check and the set page. */
export class LogbookPages {
  constructor(private readonly page: Page) {}

  async openPurchase() {
    await this.page.getByRole("link", { name: "Log a purchase" }).first().click();
    await expect(this.page.getByRole("heading", { name: "Log a tire purchase" })).toBeVisible();
  }

  async chooseVehicle(name: RegExp | string) {
    const select = this.page.getByLabel("Vehicle", { exact: true });
    const option = select.locator("option", { hasText: name });
    await select.selectOption({ value: (await option.getAttribute("value"))! });
  }

  async chooseKind(kind: "Summer" | "All-season" | "All-weather" | "Winter") {
    await this.page.getByRole("radio", { name: kind, exact: true }).check();
  }

  async typeSize(size: string) {
    await this.page.getByLabel("Tire size", { exact: true }).fill(size);
  }

  sizeDecoded() {
    return this.page.getByTestId("size-decoded");
  }

  dotInput(position: Position) {
    return this.page.getByLabel(`${position} — DOT code`);
  }

  /** The decoded line under a tire's DOT code. */
  dotDecoded(position: Position) {
    return this.page.getByRole("listitem").filter({ has: this.dotInput(position) }).getByTestId("dot-decoded");
  }

  async purchaseDetails(opts: { price: string; seller: string }) {
    await this.page.getByLabel("Price, all tires").fill(opts.price);
    await this.page.getByLabel("Bought from").fill(opts.seller);
  }

  async oldSet(fate: "stored" | "retired", where?: string) {
    await this.page.getByRole("radio", { name: fate === "stored" ? "Stored, to use again" : "Retired (worn out or sold)" }).check();
    if (where) await this.page.getByLabel("Old set stored where").fill(where);
  }

  async attachReceipt(name: string, buffer: Buffer) {
    await this.page.getByLabel("Add the receipt").setInputFiles({ name, mimeType: "application/pdf", buffer });
    await expect(this.page.getByRole("list", { name: "Files to upload" })).toContainText(name);
  }

  async savePurchase() {
    await this.page.getByRole("button", { name: "Save the purchase" }).click();
    await expect(this.page.getByText("The new set is saved in the logbook.")).toBeVisible({ timeout: 20_000 });
  }

  setCard(title: RegExp | string) {
    return this.page.getByTestId("set-card").filter({ has: this.page.getByRole("heading", { name: title }) });
  }

  async recordCheck(readings: Record<Position, [string, string, string]>, odometer: string) {
    await this.page.getByRole("link", { name: "Record a tread check" }).first().click();
    await expect(this.page.getByRole("heading", { name: /Tread check/ })).toBeVisible();
    await this.page.getByLabel(/^Odometer/).fill(odometer);
    for (const p of POSITIONS) {
      const group = this.page.getByRole("group", { name: p, exact: true });
      await group.getByLabel(/^Inner/).fill(readings[p][0]);
      await group.getByLabel(/^Centre/).fill(readings[p][1]);
      await group.getByLabel(/^Outer/).fill(readings[p][2]);
    }
    await this.page.getByRole("button", { name: "Save the check" }).click();
    await expect(this.page.getByText("The tread check is saved; the chart includes it.")).toBeVisible({ timeout: 20_000 });
  }

  /** The markers the chart draws for measured readings (projections have none). */
  chartMarkers() {
    return this.page.getByTestId("wear-chart").locator("[data-marker]");
  }
}
