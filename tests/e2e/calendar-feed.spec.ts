// Journey: a driver subscribes their calendar to reminders. Ada (Plus)
// makes a feed link, the feed is fetched the way a calendar app would and
// parsed by ical.js, and the reminder e-mail arrives with working links.
import { expect, test, type APIRequestContext } from "@playwright/test";
import ICAL from "ical.js";
import { demoAccounts } from "../../db/seed/demo-accounts";
import { RemindersPage } from "./pages/reminders";
import { openNewestMail, SessionPages } from "./pages/session";

const SCREENS = "tests/e2e/artifacts/screens";
const ada = demoAccounts.ada;

async function fetchFeed(request: APIRequestContext, url: string) {
  const res = await request.get(url);
  return { status: res.status(), type: res.headers()["content-type"], text: await res.text() };
}

/**
 * The demo's stored winter set and its autumn swap (default 15 October, spring
 * 15 April): between the two it is overdue since the last 15 October; from
 * spring to autumn it is due on the next 15 October.
 */
function expectedAutumnSwap(today: string): string {
  const y = Number(today.slice(0, 4));
  const lastOnOrBefore = (md: string) => (`${y}-${md}` <= today ? `${y}-${md}` : `${y - 1}-${md}`);
  const lastAutumn = lastOnOrBefore("10-15");
  if (lastAutumn > lastOnOrBefore("04-15")) return lastAutumn;
  return `${y}-10-15` >= today ? `${y}-10-15` : `${y + 1}-10-15`;
}

test.describe("a driver subscribes to calendar reminders", () => {
  test("feed link → calendar feed with the demo's dates → reminder e-mail with working links", async ({ page, context, request, browser }) => {
    await context.grantPermissions(["clipboard-read", "clipboard-write"]);
    await new SessionPages(page).signInAndLand(ada.email, "/vehicles");
    const reminders = new RemindersPage(page);
    await reminders.open();
    await expect(page.getByText("local law", { exact: false }).first()).toBeVisible();
    const items = await reminders.items();
    expect(items.length).toBeGreaterThan(3);

    const { https, webcal } = await reminders.makeFeedLink();
    expect(await reminders.copyHttpsLink()).toBe(https);
    expect(https).toMatch(/\/api\/feed\/[A-Za-z0-9_-]{43}\.ics$/);
    expect(webcal).toBe(https.replace(/^http:\/\//, "webcal://"));
    await expect(reminders.qrCode()).toBeVisible();
    await page.screenshot({ path: `${SCREENS}/e2e-reminders-desktop.png`, fullPage: true });

    // Fetched as a calendar app would: no cookies, just the secret address.
    const anonymous = await fetchFeed(request, https);
    expect(anonymous.status).toBe(200);
    expect(anonymous.type).toBe("text/calendar; charset=utf-8");
    const cal = new ICAL.Component(ICAL.parse(anonymous.text));
    const events = cal.getAllSubcomponents("vevent");

    // The feed holds exactly the page's items: same UIDs, dates and summaries.
    expect(events).toHaveLength(items.length);
    const byUid = new Map(events.map((e) => [String(e.getFirstPropertyValue("uid")), e]));
    for (const item of items) {
      const e = byUid.get(`${item.id}@fourpatch`);
      expect(e, item.subject).toBeDefined();
      const start = e!.getFirstPropertyValue("dtstart") as ICAL.Time;
      const end = e!.getFirstPropertyValue("dtend") as ICAL.Time;
      // All-day DATE values, DTEND exclusive (RFC 5545 §3.6.1).
      expect(start.isDate).toBe(true);
      expect(start.toString()).toBe(item.date);
      expect(end.subtractDate(start).toSeconds()).toBe(86_400);
      expect(String(e!.getFirstPropertyValue("summary"))).toBe(item.subject);
      // Ada's Plus alarms, 14 days and 1 day before (RFC 5545 §3.6.6).
      const triggers = e!.getAllSubcomponents("valarm").map((a) => {
        expect(a.getFirstPropertyValue("action")).toBe("DISPLAY");
        expect(String(a.getFirstPropertyValue("description"))).not.toBe("");
        return (a.getFirstPropertyValue("trigger") as ICAL.Duration).toSeconds();
      });
      expect(triggers.sort((a, b) => a - b)).toEqual([-14 * 86_400, -86_400]);
      expect(String(e!.getFirstPropertyValue("description"))).toContain("local law and a qualified tire technician decide");
    }

    // The demo's expected events: the winter set stored at the shop goes on by the autumn swap,
    // is near its age limit, and the summer set has a projected depth date.
    const today = new Date().toISOString().slice(0, 10);
    const summaries = events.map((e) => ({ s: String(e.getFirstPropertyValue("summary")), d: (e.getFirstPropertyValue("dtstart") as ICAL.Time).toString() }));
    expect(summaries).toContainEqual({ s: "Winter tires on The Velora: time to fit the winter tires", d: expectedAutumnSwap(today) });
    expect(summaries.some((x) => x.s === "Winter tires on The Velora: tires reach 6 years, replace them")).toBe(true);
    expect(summaries.some((x) => x.s === "Summer tires on The Velora: tread reaches 1.6 mm")).toBe(true);
    expect(String(cal.getFirstPropertyValue("refresh-interval"))).toBe("P1D");

    // A second fetch keeps every UID (calendar apps update, never duplicate).
    const again = new ICAL.Component(ICAL.parse((await fetchFeed(request, https)).text));
    expect(again.getAllSubcomponents("vevent").map((e) => String(e.getFirstPropertyValue("uid"))).sort()).toEqual([...byUid.keys()].sort());

    // The daily run, triggered through the cron route the way an external scheduler would.
    expect((await request.post("/api/cron/reminders", { headers: { authorization: "Bearer wrong" } })).status()).toBe(401);
    const run = await request.post("/api/cron/reminders", { headers: { authorization: "Bearer e2e-cron-secret" } });
    expect(run.status()).toBe(200);
    expect(((await run.json()) as { summary: { emails: number } }).summary.emails).toBeGreaterThanOrEqual(1);
    // Run again: nothing new to send.
    const rerun = await request.post("/api/cron/reminders", { headers: { authorization: "Bearer e2e-cron-secret" } });
    expect(((await rerun.json()) as { summary: { emails: number } }).summary.emails).toBe(0);

    await openNewestMail(page, ada.email, /tire reminder/);
    await expect(page.getByTestId("plain-text")).toContainText("local law and a qualified tire technician decide", { useInnerText: false });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: `${SCREENS}/e2e-digest-email-phone.png`, fullPage: true });
    await page.setViewportSize({ width: 1280, height: 800 });
    const mail = page.frameLocator("iframe[title=Message]");
    const setLinks = await mail.getByRole("link", { name: "Open this set in your logbook" }).evaluateAll((as) => as.map((a) => (a as HTMLAnchorElement).href));
    const allLink = await mail.getByRole("link", { name: "See all your reminders" }).getAttribute("href");
    const unsubscribe = await mail.getByRole("link", { name: "Stop e-mails of this kind" }).getAttribute("href");
    expect(setLinks.length).toBeGreaterThanOrEqual(1);

    // Every set link opens that set's page for Ada, and names a set of the feed.
    const feedSetIds = new Set([...byUid.keys()].map((uid) => uid.split("/")[1]));
    for (const href of setLinks) {
      expect(feedSetIds.has(href.split("/").pop()!)).toBe(true);
      const res = await page.goto(href);
      expect(res?.status()).toBe(200);
    }
    expect((await page.goto(allLink!))?.status()).toBe(200);
    await expect(page.getByRole("heading", { level: 1, name: "Reminders" })).toBeVisible();

    // The unsubscribe link works for someone not signed in.
    const stranger = await browser.newContext();
    const anon = await stranger.newPage();
    await anon.goto(unsubscribe!);
    await anon.getByRole("button", { name: "Stop tire reminder e-mails" }).click();
    await expect(anon.getByText("You will get no more tire reminder e-mails.")).toBeVisible();
    await anon.setViewportSize({ width: 390, height: 844 });
    await anon.screenshot({ path: `${SCREENS}/e2e-unsubscribed-phone.png` });
    await stranger.close();
    await reminders.open();
    await expect(page.getByText("You stopped reminder e-mails from a link")).toBeVisible();

    // A new link kills the old address; turning the feed off kills the new one.
    const second = await reminders.makeFeedLink();
    expect(second.https).not.toBe(https);
    expect((await fetchFeed(request, https)).status).toBe(404);
    expect((await fetchFeed(request, second.https)).status).toBe(200);
    await reminders.turnFeedOff();
    expect((await fetchFeed(request, second.https)).status).toBe(404);
  });

  test("a Free driver sees the plan's limits and gets the basic feed without alarms", async ({ page, request }) => {
    await new SessionPages(page).signInAndLand(demoAccounts.tomas.email, "/vehicles");
    const reminders = new RemindersPage(page);
    await reminders.open();
    await expect(page.getByRole("heading", { name: "Your plan: Free" })).toBeVisible();
    await expect(page.getByText("Calendar alarms and e-mail reminders come with Plus.")).toBeVisible();
    const items = await reminders.items();
    expect(items.every((i) => ["age-watch", "age-replace", "depth-limit"].includes(i.kind))).toBe(true);
    await page.setViewportSize({ width: 390, height: 844 });
    const { https } = await reminders.makeFeedLink();
    await page.screenshot({ path: `${SCREENS}/e2e-reminders-free-phone.png`, fullPage: true });
    const text = (await fetchFeed(request, https)).text;
    const events = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent");
    expect(events).toHaveLength(items.length);
    expect(text).not.toContain("BEGIN:VALARM");

    // Settings: a bad value is named beside its field and nothing typed is lost; a good one is kept.
    const settings = reminders.settings();
    await settings.getByLabel("Rotate every (km)").fill("lots");
    await settings.getByLabel("Fit winter tires on (month-day)").fill("10-01");
    await reminders.saveSettings();
    await expect(settings.getByText("Enter a distance in km.")).toBeVisible();
    await expect(settings.getByLabel("Fit winter tires on (month-day)")).toHaveValue("10-01");
    await settings.getByLabel("Rotate every (km)").fill("12000");
    await reminders.saveSettings();
    await expect(settings.getByText(/^Saved\./)).toBeVisible();
    await page.reload();
    await expect(reminders.settings().getByLabel("Rotate every (km)")).toHaveValue("12000");
    await expect(reminders.settings().getByLabel("Fit winter tires on (month-day)")).toHaveValue("10-01");
  });
});
