import { expect, type Page } from "@playwright/test";

/** Page objects for buying and managing Plus: pricing, the payment fake's hosted pages, the billing page. */
export class BillingPages {
  constructor(private readonly page: Page) {}

  async buyFromPricing(which: "monthly" | "yearly") {
    await this.page.goto("/pricing");
    await this.page.getByRole("button", { name: new RegExp(`^Buy Plus ${which}`) }).click();
    await expect(this.page).toHaveURL(/\/dev\/stripe\/checkout\/cs_test_/);
  }

  async payWithCard(number: string) {
    const form = this.page.getByRole("form", { name: "Card details" });
    await form.getByLabel("Card number").fill(number);
    await form.getByLabel("Expiry (MM / YY)").fill("12 / 34");
    await form.getByLabel("CVC").fill("123");
    await form.getByRole("button", { name: /^Pay / }).click();
  }

  async open() {
    await this.page.goto("/account/billing");
    await expect(this.page.getByRole("heading", { level: 1, name: "Billing" })).toBeVisible();
  }

  plan() {
    return this.page.getByRole("heading", { name: /^Your plan: / });
  }

  async cancelAtPeriodEnd() {
    await this.page.getByRole("button", { name: "Cancel Plus" }).click();
    await this.page.getByRole("button", { name: "Yes, cancel at period end" }).click();
  }

  async resume() {
    await this.page.getByRole("button", { name: "Resume Plus" }).click();
  }

  async switchTo(which: "yearly" | "monthly") {
    await this.page.getByRole("button", { name: `Switch to ${which}` }).click();
    await this.page.getByRole("button", { name: `Yes, switch to ${which}` }).click();
  }

  invoices() {
    return this.page.getByRole("list", { name: "Invoices" }).locator("li");
  }
}
