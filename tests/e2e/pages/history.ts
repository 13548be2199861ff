import { expect, type Page } from "@playwright/test";

/** Page object for the vehicle page's history table. */
export class HistoryPages {
  constructor(private readonly page: Page) {}

  section() {
    return this.page.getByRole("region", { name: "History" });
  }
  search() {
    return this.section().getByLabel("Search the history");
  }
  filter() {
    return this.section().getByLabel("Show");
  }
  table() {
    return this.section().getByRole("table");
  }
  header(name: string) {
    return this.table().getByRole("button", { name });
  }
  nextPage() {
    return this.section().getByRole("button", { name: "Next page" });
  }
  previousPage() {
    return this.section().getByRole("button", { name: "Previous page" });
  }
  status() {
    return this.section().getByTestId("history-status");
  }

  /**
   * DOM mutations in the history section during `ms` of idle time. A page at
   * rest makes none; the render loop of issue 10 made thousands a second.
   */
  async mutationsWhileIdle(ms = 700) {
    return this.page.evaluate(async (wait) => {
      const target = document.querySelector("[data-testid='history']") ?? document.body;
      let n = 0;
      const o = new MutationObserver((list) => (n += list.length));
      o.observe(target, { subtree: true, childList: true, attributes: true, characterData: true });
      await new Promise((r) => setTimeout(r, wait));
      o.disconnect();
      return n;
    }, ms);
  }

  async expectCalm() {
    expect(await this.mutationsWhileIdle()).toBeLessThan(5);
  }
}
