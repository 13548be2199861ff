// Fourpatch's mark: the four contact patches a car stands on, seen from
// underneath — tall and narrow, at the track's width and the wheelbase's
// length, each cut by three tread grooves, the front pair turned a little as
// if steering. One geometry for the header mark,
// the favicon and the app icons (scripts/make-icons.ts renders the files).
import { asphalt, groove } from "./tokens";

export const MARK_VIEWBOX = 32;

/** Patch rectangles in a 32 × 32 box: front pair above, rear pair below; the wheelbase is longer than the track. */
export const MARK_PATCHES = [
  { x: 6, y: 3, w: 7.5, h: 11.5, turn: -12 },
  { x: 18.5, y: 3, w: 7.5, h: 11.5, turn: -12 },
  { x: 6, y: 17.5, w: 7.5, h: 11.5, turn: 0 },
  { x: 18.5, y: 17.5, w: 7.5, h: 11.5, turn: 0 },
] as const;
export const MARK_RADIUS = 1.8;

/** The patch's steering turn as an SVG transform about its own centre (empty for the rear pair). */
export function markTurn(p: { x: number; y: number; w: number; h: number; turn: number }): string | undefined {
  return p.turn ? `rotate(${p.turn} ${p.x + p.w / 2} ${p.y + p.h / 2})` : undefined;
}

/** The three tread grooves cut through a patch, as path data. */
export function markGrooves(p: { x: number; y: number; w: number; h: number }): string {
  const top = p.y + 1.8;
  const bottom = p.y + p.h - 1.8;
  return [1, 2, 3].map((i) => p.x + (i * p.w) / 4).map((x) => `M${x.toFixed(2)},${top}V${bottom}`).join("");
}

export type MarkColours = { patch: string; groove: string; background?: string };

export const MARK_ON_LIGHT: MarkColours = { patch: groove[700], groove: "#ffffff" };
export const MARK_ICON: MarkColours = { patch: groove[300], groove: asphalt[950], background: asphalt[950] };

/**
 * The mark as a standalone SVG document. With a background the patches are
 * scaled into the middle `safe` share of the square, so a maskable icon's
 * circle crop (the inner 80 %) never cuts them.
 */
export function markSvg(colours: MarkColours, opts: { size?: number; safe?: number; rounded?: boolean } = {}): string {
  const size = opts.size ?? MARK_VIEWBOX;
  const safe = colours.background ? (opts.safe ?? 0.72) : 1;
  const scale = (size / MARK_VIEWBOX) * safe;
  const offset = (size - MARK_VIEWBOX * scale) / 2;
  const bg = colours.background
    ? `<rect width="${size}" height="${size}" rx="${opts.rounded === false ? 0 : (size * 0.22).toFixed(2)}" fill="${colours.background}"/>`
    : "";
  const patches = MARK_PATCHES.map(
    (p) =>
      `<g${markTurn(p) ? ` transform="${markTurn(p)}"` : ""}><rect x="${p.x}" y="${p.y}" width="${p.w}" height="${p.h}" rx="${MARK_RADIUS}" fill="${colours.patch}"/><path d="${markGrooves(p)}" stroke="${colours.groove}" stroke-width="0.8" stroke-linecap="round"/></g>`,
  ).join("");
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}" viewBox="0 0 ${size} ${size}">${bg}<g transform="translate(${offset.toFixed(3)} ${offset.toFixed(3)}) scale(${scale.toFixed(5)})">${patches}</g></svg>`;
}
