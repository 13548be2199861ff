// The root error page keeps to plain strings and a built image (it is on every
// page's first load): it must still look like the rest — the same button
// classes buttonVariants gives, the mark from public/ — and say what happened.
import { existsSync } from "node:fs";
import path from "node:path";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import ErrorPage from "@/app/error";
import { buttonVariants } from "@/components/ui/button-variants";

const root = path.join(import.meta.dirname, "../../..");
const classSet = (s: string) => new Set(s.split(/\s+/).filter(Boolean));

function render(digest?: string) {
  const error = Object.assign(new Error("boom"), digest ? { digest } : {});
  return renderToStaticMarkup(createElement(ErrorPage, { error, reset: () => {} }));
}

describe("the root error page", () => {
  it("says what happened, names the reference and offers two ways on", () => {
    const html = render("4071123");
    expect(html).toContain("Something went wrong on this page");
    expect(html).toContain("saved whole or not at all");
    expect(html).toMatch(/Reference: (<!-- -->)?4071123/);
    expect(html).toMatch(/<button type="button"[^>]*>Try again<\/button>/);
    expect(html).toMatch(/<a href="\/vehicles"[^>]*>Back to my vehicles<\/a>/);
    expect(render()).not.toContain("Reference");
  });

  it("styles its controls exactly as buttonVariants does", () => {
    const html = render();
    const cls = (text: string) => new RegExp(`class="([^"]+)"[^>]*>${text}<`).exec(html)?.[1] ?? "";
    expect(classSet(cls("Try again"))).toEqual(classSet(buttonVariants()));
    expect(classSet(cls("Back to my vehicles"))).toEqual(classSet(buttonVariants({ variant: "secondary" })));
  });

  it("shows the mark from a file that exists under public/", () => {
    const src = /<img src="([^"]+)"/.exec(render())?.[1];
    expect(src).toBe("/icons/mark.svg");
    expect(existsSync(path.join(root, "public", src!))).toBe(true);
  });
});
