// Geometry of the tread-profile glyph: a cross-section of one tire's tread,
// its inner, centre and outer groove depths standing as bars on the carcass,
// measured against a ghost of the depth when new and a shaded zone below the
// set's limit. Pure, so the proportions are unit-tested; the SVG component
// (components/visual/tread-profile.tsx) only draws what this returns.

export type GrooveName = "inner" | "centre" | "outer";
export const GROOVES: readonly GrooveName[] = ["inner", "centre", "outer"];

/**
 * A new passenger tire's usual tread depth, used for the scale when the depth
 * when new was not logged (about 8 mm for summer tires [practice]).
 */
export const TYPICAL_NEW_MM = 8;

export const GLYPH_BOX = {
  width: 64,
  height: 44,
  /** Top of the drawing area: a bar at the scale's full depth reaches here. */
  topY: 4,
  /** Where the bars stand: the top of the carcass band. */
  baseY: 36,
  padX: 5,
  barWidth: 14,
  gap: 4,
} as const;

export type TreadProfileInput = {
  innerMm: number | null | undefined;
  centreMm: number | null | undefined;
  outerMm: number | null | undefined;
  /** The depth when new, if logged. */
  newMm: number | null | undefined;
  /** The set's depth limit. */
  limitMm: number;
  /** Which side of the glyph the inner groove is drawn on (toward the car's centreline in a plan). */
  innerSide?: "left" | "right";
};

export type GlyphBar = {
  groove: GrooveName;
  x: number;
  width: number;
  /** Top of the bar; null when the groove has no reading. */
  y: number | null;
  height: number;
  depthMm: number | null;
  /** At or below the limit. */
  atLimit: boolean;
};

export type TreadProfileGeometry = {
  /** The depth that the full drawing height stands for. */
  scaleMm: number;
  newKnown: boolean;
  /** Y of the depth when new (or of the scale's top when it is not known). */
  newY: number;
  /** Y of the limit line; the zone runs from here down to baseY. */
  limitY: number;
  bars: GlyphBar[];
  /** True when no groove has a reading: the glyph shows only the ghost and the zone. */
  empty: boolean;
};

const usable = (v: number | null | undefined): v is number => typeof v === "number" && Number.isFinite(v) && v >= 0;
const r2 = (v: number) => Math.round(v * 100) / 100;

export function treadProfileGeometry(input: TreadProfileInput): TreadProfileGeometry {
  const { topY, baseY, padX, barWidth, gap } = GLYPH_BOX;
  const span = baseY - topY;
  const readings: Record<GrooveName, number | null> = {
    inner: usable(input.innerMm) ? input.innerMm : null,
    centre: usable(input.centreMm) ? input.centreMm : null,
    outer: usable(input.outerMm) ? input.outerMm : null,
  };
  const measured = GROOVES.map((g) => readings[g]).filter((v): v is number => v !== null);
  const newKnown = usable(input.newMm) && input.newMm > 0;
  // A reading above the depth when new (gauge error, a regrooved tire) widens the scale rather than overflowing it.
  const scaleMm = Math.max(newKnown ? (input.newMm as number) : TYPICAL_NEW_MM, ...measured, input.limitMm * 1.5, 0.1);
  const yOf = (mm: number) => r2(baseY - (Math.min(Math.max(mm, 0), scaleMm) / scaleMm) * span);
  const order: GrooveName[] = input.innerSide === "right" ? ["outer", "centre", "inner"] : ["inner", "centre", "outer"];
  const bars = order.map((groove, i): GlyphBar => {
    const depthMm = readings[groove];
    const x = padX + i * (barWidth + gap);
    if (depthMm === null) return { groove, x, width: barWidth, y: null, height: 0, depthMm: null, atLimit: false };
    const y = yOf(depthMm);
    return { groove, x, width: barWidth, y, height: r2(baseY - y), depthMm, atLimit: depthMm <= input.limitMm };
  });
  return { scaleMm, newKnown, newY: yOf(newKnown ? (input.newMm as number) : scaleMm), limitY: yOf(input.limitMm), bars, empty: measured.length === 0 };
}

/** The glyph's text alternative: every depth in words, in the driver's unit. */
export function treadProfileText(input: TreadProfileInput, format: (mm: number) => string): string {
  const parts = GROOVES.map((g) => {
    const v = input[`${g}Mm` as const];
    return `${g} ${usable(v) ? format(v) : "not measured"}`;
  });
  const g = treadProfileGeometry(input);
  if (g.empty) return `Tread profile: no reading yet; limit ${format(input.limitMm)}.`;
  const newPart = g.newKnown ? ` of ${format(input.newMm as number)} when new` : " (depth when new not logged)";
  const low = g.bars.filter((b) => b.atLimit).map((b) => b.groove);
  const lowPart = low.length ? `; at or below the limit: ${low.join(", ")}` : "";
  return `Tread profile: ${parts.join(", ")}${newPart}; limit ${format(input.limitMm)}${lowPart}.`;
}
