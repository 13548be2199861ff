import { describe, expect, it } from "vitest";
import { jsonBody, jsonBytes } from "@/lib/json-text";

// The bytes are checked against the platform's own TextEncoder (WHATWG Encoding
// Standard, UTF-8) and JSON.stringify (ECMA-262), not against the module's own output.
describe("kept JSON bytes (lib/json-text.ts)", () => {
  const logbook = { nickname: "Blue wagon — Renwick", depth: "5.2 mm · 6/32 in", tires: [{ dot: "4325", note: "ÄÖÜ ✓" }] };

  it("are the UTF-8 of JSON.stringify, encoded once per object", () => {
    const bytes = jsonBytes(logbook);
    expect(Buffer.from(bytes).equals(Buffer.from(new TextEncoder().encode(JSON.stringify(logbook))))).toBe(true);
    expect(jsonBytes(logbook)).toBe(bytes);
    // A different object with the same content is encoded on its own.
    expect(jsonBytes({ ...logbook })).not.toBe(bytes);
    expect(new TextDecoder().decode(jsonBytes(null))).toBe("null");
    expect(new TextDecoder().decode(jsonBytes("a—b"))).toBe('"a—b"');
  });

  it("serve many responses: each body is a copy the stream may take over", async () => {
    const first = new Response(jsonBody(logbook));
    const second = new Response(jsonBody(logbook));
    expect(await first.json()).toEqual(logbook);
    expect(await second.json()).toEqual(logbook);
    const body = jsonBody(logbook);
    body.fill(0);
    expect(JSON.parse(new TextDecoder().decode(jsonBytes(logbook)))).toEqual(logbook);
  });
});
