/**
 * The coin method: a coin pushed head-first into a groove shows only whether
 * the tread is above or below a known height, so a coin check is a bracket,
 * converted here to the lower edge of its bracket (the safe side) and always
 * marked approximate. Heights: the top of the head on a one-cent coin sits
 * about 2/32 in from its edge, on a quarter about 4/32 in (trade-facts §2)
 * [practice].
 */
import { thirtySecondsToMm } from "./depth";
import { CAUTION } from "./result";

export type CoinResult = "above-quarter" | "between" | "below-penny";

export const COIN_RESULTS: readonly CoinResult[] = ["above-quarter", "between", "below-penny"];

export const COIN_SOURCE = "Coin heights: trade-facts §2 [practice]";

const BRACKETS: Record<CoinResult, { lowThirtySeconds: number; label: string }> = {
  // The quarter's head is partly hidden: at least 4/32 in.
  "above-quarter": { lowThirtySeconds: 4, label: "Part of the head on the quarter is hidden: about 4/32 in or more" },
  // The quarter's head shows whole but the cent's does not: between 2/32 and 4/32 in.
  between: { lowThirtySeconds: 2, label: "The whole head on the quarter shows, part of the cent's is hidden: 2/32–4/32 in" },
  // The whole head on the cent shows: under 2/32 in; counted as 1/32 in.
  "below-penny": { lowThirtySeconds: 1, label: "The whole head on the cent shows: under 2/32 in" },
};

export function coinDepth(result: CoinResult): { ok: true; depthMm: number; approximate: true; label: string; caution: string } | { ok: false; error: string; code: "bad-coin" } {
  if (!COIN_RESULTS.includes(result)) return { ok: false, error: "Choose what the coin showed in the groove.", code: "bad-coin" };
  const b = BRACKETS[result];
  return { ok: true, depthMm: thirtySecondsToMm(b.lowThirtySeconds), approximate: true, label: b.label, caution: CAUTION };
}

export const coinLabel = (r: CoinResult) => BRACKETS[r].label;
