// Finding 7: the sign-in page's `next` parameter. The attack strings are the
// ones found against the app; how a browser resolves them follows the WHATWG
// URL standard (backslash as slash in special schemes, tab/newline stripped),
// checked here with Node's own WHATWG URL implementation.
import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/lib/safe-next";

const origin = "https://app.fourpatch.test";

describe("safeNextPath", () => {
  it.each([
    "/\\evil.test",
    "/%09/evil.test",
    "/%5C/evil.test",
    "/%2F/evil.test",
    "//evil.test",
    "/\t/evil.test",
    "https://evil.test/",
    "javascript:alert(1)",
    "evil.test",
    "/%E0%A4%A",
    "",
  ])("refuses %j", (next) => {
    expect(safeNextPath(next, origin)).toBe("/start");
  });

  it("the refused strings really lead off-site in a WHATWG URL parser (the reason for refusing them)", () => {
    expect(new URL("/\\evil.test", origin).host).toBe("evil.test");
    expect(new URL("/\t/evil.test", origin).host).toBe("evil.test");
  });

  it.each([
    ["/vehicles", "/vehicles"],
    ["/vehicles/3f0c?tab=sets#checks", "/vehicles/3f0c?tab=sets#checks"],
    ["/sets/a%20b", "/sets/a%20b"],
  ])("keeps %j", (next, want) => {
    expect(safeNextPath(next, origin)).toBe(want);
  });
});
