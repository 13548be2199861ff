import { expect, type Page } from "@playwright/test";
import { DEMO_PASSWORD } from "../../../db/seed/demo-accounts";

/** Page object for signing in and out. */
export class SessionPages {
  constructor(private readonly page: Page) {}

  async signIn(email: string, password = DEMO_PASSWORD) {
    await this.page.goto("/sign-in");
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  async signInAndLand(email: string, path: string, password = DEMO_PASSWORD) {
    await this.signIn(email, password);
    await expect(this.page).toHaveURL(new RegExp(`${path}$`));
  }

  async signOut() {
    await this.page.getByRole("button", { name: "Sign out" }).click();
    await expect(this.page).toHaveURL(/\/sign-in/);
    // Ended on the server too, not only a page change: the browser's cookie no longer opens a session.
    const session = await this.page.request.get("/api/auth/get-session");
    expect(await session.json()).toBeNull();
  }
}

/** The newest message to an address in the e-mail fake's outbox. */
export async function openNewestMail(page: Page, to: string, subject: string | RegExp) {
  await page.goto(`/dev/outbox?to=${encodeURIComponent(to)}`);
  await page.getByRole("link", { name: subject }).first().click();
  await expect(page.getByRole("heading", { name: subject })).toBeVisible();
}

/**
 * After "Create my logbook": the form says to check the inbox, and the new
 * account opens only through the link in the verification e-mail, read from
 * the outbox fake (the mail is sent without waiting, so the outbox is
 * reloaded until it is there). Following it signs in and lands where the
 * sign-up would have gone.
 */
export async function confirmSignUp(page: Page, email: string) {
  await expect(page.getByText("Check your inbox")).toBeVisible();
  await expect(page.getByText(`We sent a link to ${email}.`)).toBeVisible();
  await expect(async () => {
    await page.goto(`/dev/outbox?to=${encodeURIComponent(email)}`);
    await page.getByRole("link", { name: "Confirm your address for Fourpatch" }).first().click({ timeout: 1_000 });
  }).toPass({ timeout: 10_000 });
  const href = await page.frameLocator('iframe[title="Message"]').getByRole("link", { name: "Confirm my address" }).getAttribute("href");
  expect(href).toContain("/api/auth/verify-email?token=");
  await page.goto(href!);
}
