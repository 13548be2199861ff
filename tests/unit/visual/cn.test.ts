// `cn` (lib/cn.ts) against tailwind-merge, the library it replaced on the
// pages (the reference: tailwind-merge 3.7, kept as a development
// dependency): for every pair of classes found in the app's source, a later
// class removes an earlier one exactly when tailwind-merge's would. A class
// added to the app that `cn` misjudges fails here.
import fs from "node:fs";
import path from "node:path";
import { twMerge } from "tailwind-merge";
import { describe, expect, it } from "vitest";
import { cn } from "@/lib/cn";

const root = path.resolve(import.meta.dirname, "../../..");

function sourceClasses(): string[] {
  const tokens = new Set<string>();
  for (const dir of ["app", "components", "lib"]) {
    for (const f of fs.readdirSync(path.join(root, dir), { recursive: true }) as string[]) {
      // lib/cn.ts names kinds of utility, not classes.
      if (!/\.tsx?$/.test(f) || (dir === "lib" && f === "cn.ts")) continue;
      const src = fs.readFileSync(path.join(root, dir, f), "utf8");
      for (const m of src.matchAll(/(["'`])((?:(?!\1)[^\\\n])*)\1/g)) {
        for (const t of m[2].split(/\s+/)) if (/^[!a-z0-9[-]/.test(t) && !/["'`<>={}$]/.test(t)) tokens.add(t);
      }
    }
  }
  // Classes either side recognises (a class recognised by neither is kept by both).
  return [...tokens].filter((t) => twMerge(`${t} ${t}`) === t || cn(t, t) === t).sort();
}

describe("cn", () => {
  it("merges like tailwind-merge for every pair of classes in the source", () => {
    const classes = sourceClasses();
    expect(classes.length).toBeGreaterThan(300);
    const wrong: string[] = [];
    for (const a of classes) for (const b of classes) if (cn(a, b) !== twMerge(`${a} ${b}`)) wrong.push(`"${a} ${b}": cn "${cn(a, b)}", tailwind-merge "${twMerge(`${a} ${b}`)}"`);
    expect(wrong.slice(0, 40)).toEqual([]);
  });

  it("lets a caller's class replace a component's default, per variant", () => {
    expect(cn("rounded-lg border border-asphalt-200 bg-white p-4 shadow-card sm:p-5", "p-0 sm:p-0")).toBe("rounded-lg border border-asphalt-200 bg-white shadow-card p-0 sm:p-0");
    expect(cn("inline-flex rounded px-2 py-0.5 text-sm font-semibold", "text-xs sm:text-sm")).toBe("inline-flex rounded px-2 py-0.5 font-semibold text-xs sm:text-sm");
    expect(cn("h-11 w-16 shrink-0", "h-20 w-28 sm:h-24 sm:w-36")).toBe("shrink-0 h-20 w-28 sm:h-24 sm:w-36");
    expect(cn("border border-asphalt-200", "border-condition-replace/30")).toBe("border border-condition-replace/30");
    expect(cn("px-3", "pl-9")).toBe("px-3 pl-9");
    expect(cn("a", false, null, undefined, ["b", { c: true, d: false }])).toBe("a b c");
  });
});
