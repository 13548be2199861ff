// The mark and the files made from it: the manifest names icons that exist at
// the sizes it claims, the favicon is a well-formed ICO (Microsoft's ICONDIR /
// ICONDIRENTRY layout with a PNG payload), and the committed icon.svg is what
// the mark's geometry renders today (so a changed mark without regenerated
// icons fails here).
import { readFileSync } from "node:fs";
import path from "node:path";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import manifest from "@/app/manifest";
import { MARK_ICON, MARK_ON_LIGHT, MARK_PATCHES, markSvg } from "@/lib/visual/mark";

const root = path.join(import.meta.dirname, "../../..");

describe("the mark", () => {
  it("is four tall, narrow patches with a wheelbase longer than the track, the front pair turned", () => {
    expect(MARK_PATCHES).toHaveLength(4);
    for (const p of MARK_PATCHES) expect(p.h).toBeGreaterThan(p.w * 1.3);
    const cx = (p: (typeof MARK_PATCHES)[number]) => p.x + p.w / 2;
    const cy = (p: (typeof MARK_PATCHES)[number]) => p.y + p.h / 2;
    const track = cx(MARK_PATCHES[1]) - cx(MARK_PATCHES[0]);
    const wheelbase = cy(MARK_PATCHES[2]) - cy(MARK_PATCHES[0]);
    expect(wheelbase).toBeGreaterThan(track);
    expect(MARK_PATCHES.slice(0, 2).every((p) => p.turn !== 0)).toBe(true);
    expect(MARK_PATCHES.slice(2).every((p) => p.turn === 0)).toBe(true);
  });

  it("matches the committed favicon SVG (run scripts/make-icons.ts after changing the mark)", () => {
    expect(readFileSync(path.join(root, "app/icon.svg"), "utf8").trim()).toBe(markSvg(MARK_ICON, { size: 32, safe: 0.86 }));
  });

  it("matches the committed light-ground SVG the error page shows (public/icons/mark.svg)", () => {
    expect(readFileSync(path.join(root, "public/icons/mark.svg"), "utf8").trim()).toBe(markSvg(MARK_ON_LIGHT));
  });
});

describe("the web manifest and its icons", () => {
  const m = manifest();
  it("names PNG icons under public/ whose pixel sizes are the sizes it claims, with one maskable", async () => {
    expect(m.icons?.length).toBeGreaterThanOrEqual(3);
    for (const icon of m.icons ?? []) {
      const meta = await sharp(readFileSync(path.join(root, "public", icon.src))).metadata();
      expect(meta.format).toBe("png");
      expect(`${meta.width}x${meta.height}`).toBe(icon.sizes);
    }
    expect(m.icons?.some((i) => i.purpose === "maskable" && i.sizes === "512x512")).toBe(true);
    expect(m.icons?.some((i) => i.sizes === "192x192")).toBe(true);
    expect(m.start_url).toBe("/vehicles");
  });

  it("has an apple-icon of 180 px and a favicon.ico holding one 32 px PNG", async () => {
    expect((await sharp(readFileSync(path.join(root, "app/apple-icon.png"))).metadata()).width).toBe(180);
    const ico = readFileSync(path.join(root, "app/favicon.ico"));
    expect(ico.readUInt16LE(0)).toBe(0);
    expect(ico.readUInt16LE(2)).toBe(1);
    expect(ico.readUInt16LE(4)).toBe(1);
    expect(ico.readUInt8(6)).toBe(32);
    const size = ico.readUInt32LE(6 + 8);
    const offset = ico.readUInt32LE(6 + 12);
    expect(offset + size).toBe(ico.length);
    const png = ico.subarray(offset);
    expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    expect((await sharp(png).metadata()).width).toBe(32);
  });
});
