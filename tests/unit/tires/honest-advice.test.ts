import { describe, expect, it } from "vitest";
import { depthCondition, patternAdvice, unusualDepth, wearPattern } from "@/lib/tires";

describe("advice never contradicts the condition", () => {
  it("an evenly worn tire under the limit is told to be replaced, not 'nothing to do'", () => {
    // 0.5 mm against the EU minimum of 1.6 mm (Directive 89/459/EEC) [pub].
    const level = depthCondition({ depthMm: 0.5, limitMm: 1.6 });
    expect(level.ok && level.level).toBe("replace");
    const p = wearPattern({ innerMm: 0.5, centreMm: 0.5, outerMm: 0.5 });
    expect(p.ok && p.pattern).toBe("even");
    const advice = patternAdvice("even", "replace");
    expect(advice).toMatch(/replace/i);
    expect(advice).not.toMatch(/nothing to do/i);
  });

  it("says 'nothing to do' only for a tire that needs nothing", () => {
    expect(patternAdvice("even", "good")).toMatch(/nothing to do/i);
    for (const level of ["unknown", "plan", "replace"] as const) expect(patternAdvice("even", level)).not.toMatch(/nothing to do/i);
    // A fault's advice is kept, and put after the replacement when the tire must go.
    expect(patternAdvice("inner-shoulder", "replace")).toMatch(/^Replace this tire now.*alignment/);
    expect(patternAdvice("under-inflation", "watch")).toMatch(/pressures/);
  });
});

describe("tread does not grow back [practice]", () => {
  it("asks about a reading deeper than new beyond the 0.5 mm gauge slack", () => {
    expect(unusualDepth({ deepestMm: 12, depthMm: 12, newDepthMm: 9 })?.reason).toBe("deeper-than-new");
    expect(unusualDepth({ deepestMm: 9.5, depthMm: 9.4, newDepthMm: 9 })).toBeNull();
    expect(unusualDepth({ deepestMm: 9.6, depthMm: 9.0, newDepthMm: 9 })?.reason).toBe("deeper-than-new");
  });

  it("asks about a jump up of more than 1 mm from the last reading, not about wear or a small gauge difference", () => {
    expect(unusualDepth({ deepestMm: 7, depthMm: 7, previousMm: 4 })?.reason).toBe("jump-up");
    expect(unusualDepth({ deepestMm: 5, depthMm: 4.9, previousMm: 4 })).toBeNull();
    expect(unusualDepth({ deepestMm: 3, depthMm: 3, previousMm: 4 })).toBeNull();
    expect(unusualDepth({ deepestMm: 6, depthMm: 6 })).toBeNull();
  });
});
