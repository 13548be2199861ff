/**
 * Uneven-wear patterns from inner / centre / outer groove depths, and the
 * front/rear difference of a set. The reading of patterns follows service
 * manuals and a public US Army technical manual, TM 9-2610-200-14 §2-18
 * [pub] (trade-facts §6): both shoulders worn → under-inflation; centre worn →
 * over-inflation; one shoulder worn → camber or alignment.
 */
import { CAUTION, fail, type Result } from "./result";

/**
 * Smallest groove difference read as a pattern [practice]: twice the spread
 * commonly seen between two gauge readings of the same groove (about
 * 0.5 mm), so gauge noise alone rarely raises a pattern.
 */
export const UNEVEN_WEAR_THRESHOLD_MM = 1.0;

/**
 * Front/rear average difference that calls for a rotation [practice]: about
 * 2/32 in, the smallest step a coin or stick gauge shows reliably.
 */
export const AXLE_DIFFERENCE_THRESHOLD_MM = 1.5;

export const PATTERN_SOURCE = "TM 9-2610-200-14 §2-18 and service manuals [pub]; thresholds are common practice [practice]";

export type WearPatternKind = "even" | "under-inflation" | "over-inflation" | "inner-shoulder" | "outer-shoulder";

export type WearPatternOk = {
  pattern: WearPatternKind;
  /** Largest difference between grooves, mm. */
  spreadMm: number;
  likelyCause: string;
  advice: string;
  source: string;
  caution: string;
};

const ADVICE: Record<WearPatternKind, { likelyCause: string; advice: string }> = {
  even: { likelyCause: "No uneven wear beyond gauge error.", advice: "Nothing to do for now; keep checking." },
  "under-inflation": {
    likelyCause: "Both shoulders are worn more than the centre, which usually means the tire ran under-inflated.",
    advice: "Check the pressures against the placard when the tires are cold.",
  },
  "over-inflation": {
    likelyCause: "The centre is worn more than the shoulders, which usually means the tire ran over-inflated.",
    advice: "Check the pressures against the placard when the tires are cold.",
  },
  "inner-shoulder": {
    likelyCause: "The inner shoulder is worn more than the outer, which usually points to camber or alignment.",
    advice: "Have the alignment checked; brake or suspension faults can also cause uneven wear.",
  },
  "outer-shoulder": {
    likelyCause: "The outer shoulder is worn more than the inner, which usually points to camber or alignment.",
    advice: "Have the alignment checked; brake or suspension faults can also cause uneven wear.",
  },
};

function num(n: unknown): n is number {
  return typeof n === "number" && Number.isFinite(n) && n >= 0 && n <= 40;
}

export function wearPattern(
  tire: { innerMm?: number | null; centreMm?: number | null; outerMm?: number | null },
  opts: { thresholdMm?: number } = {},
): Result<WearPatternOk, "too-few-grooves"> {
  const inner = tire?.innerMm;
  const centre = tire?.centreMm;
  const outer = tire?.outerMm;
  if (!num(inner) || !num(centre) || !num(outer)) {
    return fail("too-few-grooves", "A wear pattern needs the inner, centre and outer groove depths of the same check.");
  }
  const t = num(opts.thresholdMm) && opts.thresholdMm > 0 ? opts.thresholdMm : UNEVEN_WEAR_THRESHOLD_MM;
  const spreadMm = Math.max(inner, centre, outer) - Math.min(inner, centre, outer);
  let pattern: WearPatternKind = "even";
  if (inner <= centre - t && outer <= centre - t) pattern = "under-inflation";
  else if (centre <= inner - t && centre <= outer - t) pattern = "over-inflation";
  else if (inner <= outer - t) pattern = "inner-shoulder";
  else if (outer <= inner - t) pattern = "outer-shoulder";
  return { ok: true, pattern, spreadMm, ...ADVICE[pattern], source: PATTERN_SOURCE, caution: CAUTION };
}

export type Position = "front-left" | "front-right" | "rear-left" | "rear-right" | "spare";

export type AxleTire = {
  position: Position;
  innerMm?: number | null;
  centreMm?: number | null;
  outerMm?: number | null;
};

export type AxlePatternOk = {
  frontAverageMm: number;
  rearAverageMm: number;
  differenceMm: number;
  rotate: boolean;
  tires: { position: Position; depthMm: number; pattern: WearPatternKind | null }[];
  advice: string[];
  source: string;
  caution: string;
};

/** A set's front/rear difference and each tire's pattern (the spare is left out). */
export function axlePattern(
  set: { tires: readonly AxleTire[] },
  opts: { thresholdMm?: number; axleThresholdMm?: number } = {},
): Result<AxlePatternOk, "need-both-axles"> {
  const tires = (Array.isArray(set?.tires) ? set.tires : [])
    .filter((t) => t && t.position !== "spare")
    .map((t) => {
      const grooves = [t.innerMm, t.centreMm, t.outerMm].filter(num);
      const p = wearPattern(t, opts);
      return { position: t.position, depthMm: grooves.length ? Math.min(...grooves) : NaN, pattern: p.ok ? p.pattern : null };
    })
    .filter((t) => Number.isFinite(t.depthMm));
  const avg = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
  const front = tires.filter((t) => t.position.startsWith("front")).map((t) => t.depthMm);
  const rear = tires.filter((t) => t.position.startsWith("rear")).map((t) => t.depthMm);
  if (front.length === 0 || rear.length === 0) {
    return fail("need-both-axles", "Compare the axles with at least one front and one rear tire measured.");
  }
  const axleT = num(opts.axleThresholdMm) && opts.axleThresholdMm > 0 ? opts.axleThresholdMm : AXLE_DIFFERENCE_THRESHOLD_MM;
  const frontAverageMm = avg(front);
  const rearAverageMm = avg(rear);
  const differenceMm = frontAverageMm - rearAverageMm;
  const rotate = Math.abs(differenceMm) >= axleT;
  const advice: string[] = [];
  if (rotate) {
    advice.push(
      `The ${differenceMm < 0 ? "front" : "rear"} tires are ${Math.round(Math.abs(differenceMm) * 10) / 10} mm shallower on average: a rotation would even out the wear (if the tires and the vehicle's manual allow it).`,
    );
  }
  const fronts = tires.filter((t) => t.position.startsWith("front"));
  if (fronts.length === 2 && fronts.every((t) => t.pattern === "inner-shoulder" || t.pattern === "outer-shoulder")) {
    advice.push("Both front tires wear on one shoulder: have the front alignment checked.");
  }
  if (tires.filter((t) => t.pattern === "under-inflation" || t.pattern === "over-inflation").length > 0) {
    advice.push("Some tires show inflation wear: check all pressures against the placard.");
  }
  return { ok: true, frontAverageMm, rearAverageMm, differenceMm, rotate, tires, advice, source: PATTERN_SOURCE, caution: CAUTION };
}

/**
 * The advice shown beside a tire's wear shape, never contradicting its
 * condition: "nothing to do" is only said of a tire that needs nothing.
 * `level` is the tire's overall condition (age and depth); "unknown" means
 * its age could not be read.
 */
export function patternAdvice(kind: WearPatternKind, level: "good" | "unknown" | "watch" | "plan" | "replace"): string {
  const shape = kind === "even" ? null : ADVICE[kind].advice;
  if (level === "replace") {
    return shape
      ? `Replace this tire now, and before the new one goes on: ${shape.charAt(0).toLowerCase()}${shape.slice(1)}`
      : "Replace this tire now; its wear is even, so the cause is distance or age, not a fault.";
  }
  if (level === "plan") return shape ? `Plan new tires soon. ${shape}` : "Plan new tires soon; the wear is even.";
  if (level === "unknown") return shape ?? "Read the DOT code on the sidewall and add it: the age decides too.";
  return shape ?? ADVICE.even.advice;
}
