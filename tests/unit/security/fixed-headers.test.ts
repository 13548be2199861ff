// The fixed headers of next.config.mjs (build files, API answers) and the
// pages' headers of lib/security-headers.ts (proxy.ts) are written in two
// places: the values both set must stay the same, and the API's CSP must
// allow nothing a page's CSP allows.
import { describe, expect, it } from "vitest";
import type { NextConfig } from "next";
// @ts-expect-error -- next.config.mjs is plain JavaScript, without declarations
import rawConfig from "@/next.config.mjs";
import { securityHeaders } from "@/lib/security-headers";

const nextConfig = rawConfig as NextConfig;

async function fixed(source: string): Promise<Record<string, string>> {
  const rules = (await nextConfig.headers?.()) ?? [];
  const out: Record<string, string> = {};
  for (const r of rules) if (r.source === "/:path*" || r.source === source) for (const h of r.headers) out[h.key.toLowerCase()] = h.value;
  return out;
}

describe("fixed headers of next.config.mjs", () => {
  const page = securityHeaders({ nonce: "n", https: false, dev: false });

  it("give every answer the pages' values of the headers both set", async () => {
    const all = await fixed("/:path*");
    expect(Object.keys(all).sort()).toEqual(["referrer-policy", "x-content-type-options", "x-frame-options"]);
    for (const [k, v] of Object.entries(all)) expect(v, k).toBe(page[k]);
  });

  it("give API answers a CSP that allows nothing, and the pages' opener policy", async () => {
    const api = await fixed("/api/:path*");
    expect(api["cross-origin-opener-policy"]).toBe(page["cross-origin-opener-policy"]);
    const directives = Object.fromEntries(api["content-security-policy"].split(";").map((d) => d.trim().split(/\s+/)).map(([k, ...v]) => [k, v.join(" ")]));
    expect(directives["default-src"]).toBe("'none'");
    expect(directives["frame-ancestors"]).toBe("'none'");
    // Nothing the page policy opens is reopened for the API (no script, style, image, connect source).
    expect(Object.keys(directives).filter((k) => !["default-src", "frame-ancestors", "base-uri", "form-action"].includes(k))).toEqual([]);
  });
});
