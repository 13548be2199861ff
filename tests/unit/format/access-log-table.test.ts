// The driver's access log as rendered: a visit counted several times reads
// "Opened the logbook · 3 times" in the reader's words and zone.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { FormatContext } from "@/components/format/format-context";
import { AccessLogTable } from "@/components/passes/access-log-table";
import { formatter } from "@/lib/format";

const row = (count: number) => ({
  id: `r${count}`,
  at: "2026-12-02T09:00:00Z",
  lastAt: "2026-12-02T09:20:00Z",
  actorName: "Jo Example",
  shopName: "Example Tread Works",
  action: "read_logbook",
  detail: null,
  count,
});

function render(rows: ReturnType<typeof row>[], locale = "en-GB", timeZone = "Asia/Tokyo") {
  const html = renderToStaticMarkup(createElement(FormatContext.Provider, { value: formatter({ locale, timeZone }) }, createElement(AccessLogTable, { rows })));
  return html.replace(/<[^>]+>/g, " ").replace(/\s+/g, " ");
}

describe("access log table", () => {
  it("counts a repeated visit with the plural word and no placeholder left in the text", () => {
    const text = render([row(3)]);
    expect(text).toContain("Opened the logbook");
    expect(text).toMatch(/· 3 times, last /);
    expect(text).not.toContain("#");
  });

  it("gives the last visit in the reader's zone (Tokyo is UTC+9 all year: 09:20 UTC is 18:20 there)", () => {
    expect(render([row(2)])).toMatch(/last 2 Dec 2026, 18:20 (GMT\+9|JST)/);
  });
});
