// Renders the mark (lib/visual/mark.ts) into the favicon and the app icons:
//   app/icon.svg            favicon for browsers that take SVG (Next's icon convention)
//   app/favicon.ico         a 32 px PNG inside an ICO container, for the rest
//   app/apple-icon.png      180 px home-screen icon (Next's apple-icon convention)
//   public/icons/*.png      192 and 512 px manifest icons, plus a maskable 512
// Run after changing the mark: `npx tsx scripts/make-icons.ts`. The files are committed.
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import sharp from "sharp";
import { MARK_ICON, MARK_ON_LIGHT, markSvg } from "../lib/visual/mark";

const root = path.join(import.meta.dirname, "..");
const out = (p: string) => path.join(root, p);

async function png(svg: string, size: number) {
  return sharp(Buffer.from(svg), { density: 72 * (size / 32) }).resize(size, size).png({ compressionLevel: 9 }).toBuffer();
}

/** An ICO file holding one PNG image (ICONDIR + one ICONDIRENTRY, PNG payload as Windows Vista and later read it). */
function icoFromPng(data: Buffer, size: number): Buffer {
  const header = Buffer.alloc(6);
  header.writeUInt16LE(0, 0); // reserved
  header.writeUInt16LE(1, 2); // type: icon
  header.writeUInt16LE(1, 4); // one image
  const entry = Buffer.alloc(16);
  entry.writeUInt8(size >= 256 ? 0 : size, 0);
  entry.writeUInt8(size >= 256 ? 0 : size, 1);
  entry.writeUInt8(0, 2); // no palette
  entry.writeUInt8(0, 3);
  entry.writeUInt16LE(1, 4); // colour planes
  entry.writeUInt16LE(32, 6); // bits per pixel
  entry.writeUInt32LE(data.length, 8);
  entry.writeUInt32LE(6 + 16, 12); // offset of the image data
  return Buffer.concat([header, entry, data]);
}

async function main() {
  mkdirSync(out("public/icons"), { recursive: true });
  // The favicon sits on a browser tab of any colour: the icon version, on its own dark square.
  const favicon = markSvg(MARK_ICON, { size: 32, safe: 0.86 });
  writeFileSync(out("app/icon.svg"), `${favicon}\n`);
  writeFileSync(out("app/favicon.ico"), icoFromPng(await png(favicon, 32), 32));
  writeFileSync(out("app/apple-icon.png"), await png(markSvg(MARK_ICON, { size: 180, safe: 0.74, rounded: false }), 180));
  for (const size of [192, 512]) writeFileSync(out(`public/icons/icon-${size}.png`), await png(markSvg(MARK_ICON, { size, safe: 0.78 }), size));
  // Maskable: full-bleed background, the patches inside the 80 % safe circle.
  writeFileSync(out("public/icons/icon-maskable-512.png"), await png(markSvg(MARK_ICON, { size: 512, safe: 0.62, rounded: false }), 512));
  writeFileSync(out("public/icons/mark.svg"), `${markSvg(MARK_ON_LIGHT)}\n`);
  console.log("icons written: app/icon.svg, app/favicon.ico, app/apple-icon.png, public/icons/*");
}

await main();
