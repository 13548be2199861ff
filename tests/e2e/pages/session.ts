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
