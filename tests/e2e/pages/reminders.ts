import { expect, type Page } from "@playwright/test";

export type PageReminder = { id: string; kind: string; date: string; subject: string };

/** Page object for /reminders: the coming items and the calendar feed. */
export class RemindersPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/reminders");
    await expect(this.page.getByRole("heading", { level: 1, name: "Reminders" })).toBeVisible();
  }

  /** The coming items as the page lists them, in order. */
  async items(): Promise<PageReminder[]> {
    const list = this.page.getByRole("list", { name: "Coming reminders, in date order" });
    await expect(list).toBeVisible();
    return list.locator("li[data-reminder-id]").evaluateAll((lis) =>
      lis.map((li) => ({
        id: li.getAttribute("data-reminder-id") ?? "",
        kind: li.getAttribute("data-kind") ?? "",
        date: li.querySelector("time")?.getAttribute("datetime") ?? "",
        subject: li.querySelector("[data-subject]")?.textContent?.trim() ?? "",
      })),
    );
  }

  /** Makes a feed link and returns both addresses as the page shows them. */
  async makeFeedLink(): Promise<{ https: string; webcal: string }> {
    const button = this.page.getByRole("button", { name: /Make my calendar link|Make a new feed link|Make another link/ });
    const replacing = (await button.textContent())?.includes("Make my calendar link") === false;
    await button.click();
    // Replacing a link breaks the calendars subscribed to it: the page asks first.
    if (replacing) {
      const dialog = this.page.getByRole("alertdialog");
      await expect(dialog).toContainText("stops working at once");
      await dialog.getByRole("button", { name: "Make a new link" }).click();
    }
    await expect(this.page.getByText("Your feed link is ready")).toBeVisible();
    const https = await this.page.getByLabel(/Feed address \(https\)/).inputValue();
    const webcal = await this.page.getByLabel(/Subscribe address \(webcal\)/).inputValue();
    return { https, webcal };
  }

  /** Presses the copy button next to the https address and returns what the clipboard holds. */
  async copyHttpsLink(): Promise<string> {
    await this.page.getByRole("button", { name: "Copy" }).first().click();
    await expect(this.page.getByText("Copied to the clipboard.")).toBeVisible();
    return this.page.evaluate(() => navigator.clipboard.readText());
  }

  qrCode() {
    return this.page.getByRole("img", { name: /QR code of the subscribe address/ });
  }

  settings() {
    return this.page.getByRole("form", { name: "Reminder settings" });
  }

  async saveSettings() {
    await this.settings().getByRole("button", { name: "Save reminder settings" }).click();
  }

  async turnFeedOff() {
    await this.page.getByRole("button", { name: "Turn the feed off" }).click();
    await this.page.getByRole("button", { name: "Yes, turn it off" }).click();
    await expect(this.page.getByRole("button", { name: "Make my calendar link" })).toBeVisible();
  }
}
