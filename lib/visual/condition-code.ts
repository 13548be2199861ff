// Fourpatch's condition code: the five levels a tire or a set can show, each
// with its word, its colours (from ./tokens) and its patch shape. The badge,
// the e-mails, the print layout and the calendar text all read this table,
// so a level looks and reads the same everywhere.
import { condition as palette } from "./tokens";

export const CONDITION_LEVELS = ["good", "watch", "plan", "replace", "unknown"] as const;
export type ConditionLevel = (typeof CONDITION_LEVELS)[number];

/**
 * How much of the patch icon is filled, bottom up: the rubber a tire has left
 * to give, in the same picture whether age or depth decided the level.
 * `struck` crosses the empty patch out; `dashed` draws an outline that is not
 * there yet (nothing is known).
 */
export type PatchShape = { fill: number; struck: boolean; dashed: boolean };

export type ConditionCode = {
  level: ConditionLevel;
  /** The word shown beside the shape, always. */
  word: string;
  /** A few words more, for titles and screen readers. */
  meaning: string;
  /** The same idea in characters, for plain text (calendar descriptions, e-mail previews). */
  textMark: string;
  shape: PatchShape;
  colours: { ink: string; wash: string; edge: string };
  /** Badge border width in px: heavier as the level gets more urgent. */
  edgeWidth: number;
};

export const CONDITION_CODE: Record<ConditionLevel, ConditionCode> = {
  good: {
    level: "good",
    word: "Good",
    meaning: "No action needed now; keep checking.",
    textMark: "▰▰▰",
    shape: { fill: 1, struck: false, dashed: false },
    colours: palette.good,
    edgeWidth: 1,
  },
  watch: {
    level: "watch",
    word: "Watch",
    meaning: "Check more often; have a technician look at it.",
    textMark: "▰▰▱",
    shape: { fill: 2 / 3, struck: false, dashed: false },
    colours: palette.watch,
    edgeWidth: 1,
  },
  plan: {
    level: "plan",
    word: "Plan to replace",
    meaning: "Book new tires within the lead time.",
    textMark: "▰▱▱",
    shape: { fill: 1 / 3, struck: false, dashed: false },
    colours: palette.plan,
    edgeWidth: 2,
  },
  replace: {
    level: "replace",
    word: "Replace now",
    meaning: "At or past the limit: replace before driving on it much further.",
    textMark: "▱▱▱",
    shape: { fill: 0, struck: true, dashed: false },
    colours: palette.replace,
    edgeWidth: 2,
  },
  unknown: {
    level: "unknown",
    word: "Age unknown — read the code",
    meaning: "The tire's age cannot be known from the logbook: read the DOT code on its sidewall.",
    textMark: "▱?▱",
    shape: { fill: 0, struck: false, dashed: true },
    colours: palette.unknown,
    edgeWidth: 1,
  },
};

export function conditionCode(level: ConditionLevel): ConditionCode {
  return CONDITION_CODE[level];
}

/** "▰▱▱ Plan to replace": the level in plain text, shape first, word always. */
export function conditionText(level: ConditionLevel): string {
  const c = CONDITION_CODE[level];
  return `${c.textMark} ${c.word}`;
}

/**
 * Geometry of the patch icon in a 12 × 16 box: a tall rounded contact patch
 * whose filled part rises from the bottom by `shape.fill`. Pure, so tests can
 * check that the levels differ in shape and not only in colour.
 */
export const PATCH_BOX = { width: 12, height: 16, x: 1.5, y: 1.5, w: 9, h: 13, r: 3 } as const;

export function patchFillRect(level: ConditionLevel): { x: number; y: number; width: number; height: number } | null {
  const { fill } = CONDITION_CODE[level].shape;
  if (fill <= 0) return null;
  const height = Math.round(PATCH_BOX.h * fill * 100) / 100;
  return { x: PATCH_BOX.x, y: Math.round((PATCH_BOX.y + PATCH_BOX.h - height) * 100) / 100, width: PATCH_BOX.w, height };
}
