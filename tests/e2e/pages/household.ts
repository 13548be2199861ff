import { expect, type Page } from "@playwright/test";
import { confirmSignUp } from "./session";

/** Page objects for what a driver owns: co-keepers, handing a vehicle on, export and import. */
export class HouseholdPages {
  constructor(private readonly page: Page) {}

  sharing() {
    return this.page.getByRole("region", { name: "Keeping and handing on" }).or(this.page.locator("section[aria-labelledby=owned-h]"));
  }

  async invite(email: string) {
    await this.page.getByLabel("Invite by e-mail").fill(email);
    await this.page.getByRole("button", { name: "Invite" }).click();
    await expect(this.page.getByTestId("keeper-list")).toContainText(`Invited · ${email}`);
  }

  /** The first link of the newest message to `to` whose subject matches, read from the outbox fake. */
  async linkFromMail(to: string, subject: RegExp, linkName: string) {
    await this.page.goto(`/dev/outbox?to=${encodeURIComponent(to)}`);
    await this.page.getByRole("link", { name: subject }).first().click();
    const href = await this.page.frameLocator('iframe[title="Message"]').getByRole("link", { name: linkName }).getAttribute("href");
    expect(href).toBeTruthy();
    return href!;
  }

  async confirm(button: string | RegExp, confirmLabel: string) {
    await this.page.getByRole("button", { name: button }).click();
    await expect(this.page.getByRole("alertdialog")).toBeVisible();
    await this.page.getByRole("alertdialog").getByRole("button", { name: confirmLabel }).click();
    await expect(this.page.getByRole("alertdialog")).toHaveCount(0);
  }

  async makeHandOnLink() {
    await this.page.getByRole("link", { name: "Hand on to the next owner" }).click();
    await expect(this.page.getByRole("heading", { name: /^Hand on / })).toBeVisible();
    await this.page.getByRole("button", { name: "Make the link" }).click();
    const url = (await this.page.getByTestId("hand-on-url").textContent())!.trim();
    expect(url).toMatch(/\/take-on\/[A-Za-z0-9_-]{43}$/);
    return url;
  }

  async signUp(name: string, email: string, password: string) {
    await this.page.getByLabel("Your name").fill(name);
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Create my logbook" }).click();
    await confirmSignUp(this.page, email);
  }

  async exportZip(saveTo: string) {
    await this.page.goto("/account");
    const download = this.page.waitForEvent("download");
    await this.page.getByRole("button", { name: "Download everything (.zip)" }).click();
    const d = await download;
    await d.saveAs(saveTo);
    await expect(this.page.getByTestId("export-progress")).toContainText("Done");
    return d.suggestedFilename();
  }

  async deleteAccount(password: string) {
    await this.page.goto("/account");
    await this.page.getByLabel("Type DELETE to confirm").fill("DELETE");
    await this.page.getByLabel("Your password").fill(password);
    await this.page.getByRole("button", { name: "Delete my account and data" }).click();
    await expect(this.page).toHaveURL(/account=deleted/);
  }

  async importZip(file: string, mode: "empty" | "merge") {
    await this.page.goto("/account");
    await this.page.getByLabel("Export file (.zip)").setInputFiles(file);
    await this.page.getByRole("radio", { name: mode === "empty" ? /As this account's logbook/ : /As additional vehicles/ }).check();
    await this.page.getByRole("button", { name: "Import" }).click();
  }
}
