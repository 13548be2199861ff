import { describe, expect, it } from "vitest";
import { coinDepth, coinLabel, COIN_RESULTS, depthCondition, thirtySecondsToMm } from "@/lib/tires";
import {
  depthToMm,
  distanceToKm,
  kmToDistance,
  kpaToPressure,
  mmToDepth,
  pressureToKpa,
} from "@/lib/units";

describe("units", () => {
  it("converts depths through the exact inch: 1/32 in = 0.79375 mm [pub: international inch]", () => {
    expect(depthToMm(1, "32nds")).toBe(0.79375);
    expect(depthToMm(4, "32nds")).toBeCloseTo(3.175, 12);
    expect(mmToDepth(6.35, "32nds")).toBeCloseTo(8, 12);
    expect(depthToMm(7.5, "mm")).toBe(7.5);
  });

  it("converts miles with 1 mi = 1.609344 km [pub: international mile] and round-trips", () => {
    expect(distanceToKm(100, "mi")).toBeCloseTo(160.9344, 10);
    expect(kmToDistance(distanceToKm(12_345, "mi"), "mi")).toBeCloseTo(12_345, 8);
    expect(distanceToKm(500, "km")).toBe(500);
  });

  it("converts pressure: 1 bar = 100 kPa, 1 psi = 6.894757 kPa [pub: SI and the avoirdupois pound]", () => {
    expect(pressureToKpa(2.4, "bar")).toBeCloseTo(240, 10);
    expect(pressureToKpa(35, "psi")).toBeCloseTo(241.32, 2);
    expect(kpaToPressure(pressureToKpa(33, "psi"), "psi")).toBeCloseTo(33, 10);
    expect(kpaToPressure(230, "kpa")).toBe(230);
  });

});

describe("the coin method [practice, trade-facts §2]", () => {
  it("takes the lower edge of each bracket, always approximate", () => {
    const above = coinDepth("above-quarter");
    const between = coinDepth("between");
    const below = coinDepth("below-penny");
    if (!above.ok || !between.ok || !below.ok) throw new Error("coin results must decode");
    expect(above.depthMm).toBeCloseTo(thirtySecondsToMm(4), 12);
    expect(between.depthMm).toBeCloseTo(thirtySecondsToMm(2), 12);
    expect(below.depthMm).toBeLessThan(thirtySecondsToMm(2));
    expect([above, between, below].every((r) => r.approximate)).toBe(true);
    expect(above.caution).toMatch(/technician/);
  });

  it("a cent's head in full view reads as at or below the 1.6 mm EU minimum: replace", () => {
    const below = coinDepth("below-penny");
    if (!below.ok) throw new Error();
    const c = depthCondition({ depthMm: below.depthMm, limitMm: 1.6 });
    expect(c.ok && c.level).toBe("replace");
  });

  it("refuses what is not a coin result", () => {
    expect(coinDepth("constructor" as never)).toMatchObject({ ok: false, code: "bad-coin" });
    expect(COIN_RESULTS).toHaveLength(3);
    // Each choice the form offers says which coin and what it means.
    expect(COIN_RESULTS.map(coinLabel)).toEqual([expect.stringMatching(/quarter.*4\/32/), expect.stringMatching(/2\/32–4\/32/), expect.stringMatching(/cent.*under 2\/32/)]);
  });
});
