import { expect, test } from "@playwright/test";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { confirmSignUp, openNewestMail, SessionPages } from "./pages/session";

test.describe("accounts and roles", () => {
  test("the landing page says what Fourpatch does and carries the safety caution", async ({ page }) => {
    await page.goto("/");
    await expect(page.getByRole("heading", { level: 1 })).toContainText("Four patches of rubber");
    await expect(page.getByText("a qualified tire technician decide").first()).toBeVisible();
  });

  test("a new driver signs up and lands on an empty vehicles page", async ({ page }) => {
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Nell Brightwater");
    const email = `nell-${Date.now()}@example.test`;
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill("short");
    await page.getByRole("button", { name: "Create my logbook" }).click();
    await expect(page.getByText("Use at least 10 characters.")).toBeVisible();
    await page.getByLabel("Password").fill("a-long-enough-password");
    await page.getByRole("button", { name: "Create my logbook" }).click();
    // No session before the address is confirmed: the link in the e-mail opens the logbook.
    await confirmSignUp(page, email);
    await expect(page).toHaveURL(/\/vehicles$/);
    await expect(page.getByRole("heading", { name: "Nell's vehicles" })).toBeVisible();
  });

  test("sign-up with a taken address looks like any other; an unconfirmed account is told to confirm and gets the link again", async ({ page }) => {
    // A taken address: the same answer as a new one, and its owner hears of the attempt.
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Someone Else");
    await page.getByLabel("E-mail").fill(demoAccounts.tomas.email);
    await page.getByLabel("Password").fill("a-long-enough-password");
    await page.getByRole("button", { name: "Create my logbook" }).click();
    await expect(page.getByText("Check your inbox")).toBeVisible();
    await expect(page.getByText("already exists")).toHaveCount(0);
    await expect(async () => {
      await page.goto(`/dev/outbox?to=${encodeURIComponent(demoAccounts.tomas.email)}`);
      await page.getByRole("link", { name: "Someone tried to sign up with your address" }).first().click({ timeout: 1_000 });
    }).toPass({ timeout: 10_000 });
    await expect(page.frameLocator('iframe[title="Message"]').getByRole("link", { name: "Sign in to my logbook" })).toBeVisible();

    // A new address not yet confirmed: sign-in says so and sends the link again.
    const email = `unconfirmed-${Date.now()}@example.test`;
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Ivo Penhallow");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill("a-long-enough-password");
    await page.getByRole("button", { name: "Create my logbook" }).click();
    await expect(page.getByText("Check your inbox")).toBeVisible();
    await new SessionPages(page).signIn(email, "a-long-enough-password");
    await expect(page.getByText("Confirm your e-mail address first")).toBeVisible();
    await page.getByRole("button", { name: "Send the link again" }).click();
    await expect(page.getByText("A new link is on its way.")).toBeVisible();
    await expect(page).toHaveURL(/\/sign-in/);
    await expect(async () => {
      await page.goto(`/dev/outbox?to=${encodeURIComponent(email)}`);
      await expect(page.getByRole("link", { name: "Confirm your address for Fourpatch" })).toHaveCount(2, { timeout: 1_000 });
    }).toPass({ timeout: 10_000 });
    await page.getByRole("link", { name: "Confirm your address for Fourpatch" }).first().click();
    const href = await page.frameLocator('iframe[title="Message"]').getByRole("link", { name: "Confirm my address" }).getAttribute("href");
    await page.goto(href!);
    await expect(page).toHaveURL(/\/vehicles$/);
    // The link signs in once: followed again, it only leads to the sign-in form.
    await page.context().clearCookies();
    await page.goto(href!);
    await expect(page).toHaveURL(/\/sign-in\?verified=1/);
    await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
  });

  for (const [who, home] of [
    ["ada", "/vehicles"],
    ["tomas", "/vehicles"],
    ["wren", "/shop"],
    ["jo", "/shop"],
    ["ops", "/admin"],
  ] as const) {
    test(`demo account ${who} (${demoAccounts[who].role}) lands on ${home}`, async ({ page }) => {
      await new SessionPages(page).signInAndLand(demoAccounts[who].email, home);
    });
  }

  test("a wrong password is refused with a clear message", async ({ page }) => {
    await new SessionPages(page).signIn(demoAccounts.ada.email, "not-the-password");
    await expect(page.getByText("That e-mail and password do not match an account.")).toBeVisible();
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test("signed out, every signed-in area redirects to sign-in", async ({ page }) => {
    for (const path of ["/vehicles", "/shop", "/admin"]) {
      await page.goto(path);
      await expect(page).toHaveURL(/\/sign-in\?next=/);
    }
  });

  test("each area refuses the other roles, in the page and on direct requests", async ({ page, request }) => {
    const session = new SessionPages(page);
    await session.signInAndLand(demoAccounts.tomas.email, "/vehicles");
    for (const path of ["/shop", "/admin"]) {
      await page.goto(path);
      await expect(page.getByRole("heading", { name: "Not for this account" })).toBeVisible();
    }
    // The same with the browser's cookie but no browser: the server decides.
    const cookies = (await page.context().cookies()).map((c) => `${c.name}=${c.value}`).join("; ");
    const admin = await request.get("/admin", { headers: { cookie: cookies } });
    const html = await admin.text();
    expect(html).toContain("Not for this account");
    expect(html).not.toContain(demoAccounts.ops.email);
    await page.goto("/vehicles");
    await session.signOut();

    await session.signInAndLand(demoAccounts.jo.email, "/shop");
    await page.goto("/admin");
    await expect(page.getByRole("heading", { name: "Not for this account" })).toBeVisible();
    await page.goto("/shop");
    await session.signOut();

    await session.signInAndLand(demoAccounts.ops.email, "/admin");
    await expect(page.getByTestId("account-list").getByText(demoAccounts.ada.email)).toBeVisible();
    await page.goto("/shop");
    await expect(page.getByRole("heading", { name: "Not for this account" })).toBeVisible();
  });

  test("a driver resets a forgotten password through the e-mail in the outbox", async ({ page }) => {
    const email = `reset-${Date.now()}@example.test`;
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Orla Fenwick");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill("the-first-password");
    await page.getByRole("button", { name: "Create my logbook" }).click();
    await confirmSignUp(page, email);
    await expect(page).toHaveURL(/\/vehicles$/);
    await new SessionPages(page).signOut();

    await page.goto("/forgot-password");
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send me a reset link" }).click();
    await expect(page.getByText("Check your inbox")).toBeVisible();

    await openNewestMail(page, email, "Choose a new Fourpatch password");
    const link = await page.frameLocator("iframe").getByRole("link", { name: "Choose a new password" }).getAttribute("href");
    expect(link).toContain("/reset-password");
    await page.goto(link!);
    await expect(page).toHaveURL(/\/reset-password\?token=/);
    await page.getByLabel("New password", { exact: true }).fill("the-second-password");
    await page.getByLabel("New password again").fill("the-second-password");
    await page.getByRole("button", { name: "Save the new password" }).click();
    await expect(page).toHaveURL(/\/sign-in/);

    const session = new SessionPages(page);
    await session.signIn(email, "the-first-password");
    await expect(page.getByText("That e-mail and password do not match an account.")).toBeVisible();
    await session.signInAndLand(email, "/vehicles", "the-second-password");
  });

  test("an operator disables an account, which can then no longer sign in", async ({ page }) => {
    const email = `disable-${Date.now()}@example.test`;
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Quinn Harrowby");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill("quinns-password-1");
    await page.getByRole("button", { name: "Create my logbook" }).click();
    await confirmSignUp(page, email);
    await expect(page).toHaveURL(/\/vehicles$/);
    const session = new SessionPages(page);
    await session.signOut();

    await session.signInAndLand(demoAccounts.ops.email, "/admin");
    await page.getByRole("button", { name: "Disable Quinn Harrowby" }).click();
    // Disabling asks first.
    await page.getByRole("alertdialog").getByRole("button", { name: "Disable" }).click();
    await expect(page.getByRole("button", { name: "Enable Quinn Harrowby" })).toBeVisible();
    await session.signOut();

    await session.signIn(email, "quinns-password-1");
    await expect(page).toHaveURL(/\/sign-in/);
    await expect(page.getByText(/do not match|disabled/)).toBeVisible();
  });
});
