// Fourpatch's design tokens, in one place: the Tailwind theme, the e-mails
// (which need literal colours), the wear chart and the icons all read them
// from here. Plain values only, so tailwind.config.ts can import this file.

/** Neutrals: the grey of worn asphalt. */
export const asphalt = {
  50: "#f6f7f8",
  100: "#eceef1",
  200: "#d5d9df",
  300: "#b1b8c2",
  400: "#86909e",
  500: "#677282",
  600: "#525b69",
  700: "#434a56",
  800: "#2c3139",
  900: "#1b1f24",
  950: "#101316",
} as const;

/** Brand: a deep teal, the colour of the patch stamp. */
export const groove = {
  50: "#effaf8",
  100: "#d7f2ed",
  200: "#afe4db",
  300: "#7dcfc3",
  400: "#4bb3a6",
  500: "#2d978b",
  600: "#217a71",
  700: "#1e625c",
  800: "#1c4f4b",
  900: "#1a423f",
  950: "#0a2624",
} as const;

/**
 * The condition code's colours. They run from the brand teal through slate
 * and violet to a dark "oxblood rubber" and grow heavier with urgency: good is
 * a light wash, replace is a solid dark chip with white ink. Lightness and
 * weight carry the order, so they survive greyscale and colour-blind eyes;
 * the shape of the patch icon and the word carry it too (never colour alone).
 * `ink` is text and icon colour on `wash`; every pair is above 7:1 contrast.
 */
export const condition = {
  good: { ink: groove[800], wash: "#e2f3ef", edge: groove[300] },
  watch: { ink: "#2c4a7c", wash: "#e6edf8", edge: "#9fb3d6" },
  plan: { ink: "#5b2a86", wash: "#efe6f7", edge: "#5b2a86" },
  replace: { ink: "#ffffff", wash: "#6e1440", edge: "#6e1440" },
  unknown: { ink: asphalt[800], wash: asphalt[100], edge: asphalt[500] },
} as const;

/** The zone below a set's depth limit on the chart and in the tread-profile glyph. */
export const limitZone = { fill: "#6e1440", fillOpacity: 0.12, line: "#6e1440" } as const;

/**
 * The Tailwind names `condition-<level>` (a strong colour for text, icons and
 * borders on white) and `condition-<level>-bg` (a light wash). Replace's chip
 * is solid dark, so its strong colour is the chip colour and its wash a pale tint.
 */
export const conditionTheme = {
  good: condition.good.ink,
  "good-bg": condition.good.wash,
  watch: condition.watch.ink,
  "watch-bg": condition.watch.wash,
  plan: condition.plan.ink,
  "plan-bg": condition.plan.wash,
  replace: condition.replace.wash,
  "replace-bg": "#f7e4ed",
  unknown: condition.unknown.ink,
  "unknown-bg": condition.unknown.wash,
} as const;
