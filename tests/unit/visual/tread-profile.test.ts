// The tread-profile glyph's geometry: bar heights proportional to depth over
// the depth when new, the limit at its proportional height, the inner groove
// on the side asked for, and a text alternative with every number.
import fc from "fast-check";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { TreadProfile } from "@/components/visual/tread-profile";
import { GLYPH_BOX, TYPICAL_NEW_MM, treadProfileGeometry, treadProfileText } from "@/lib/visual/tread-profile";

const span = GLYPH_BOX.baseY - GLYPH_BOX.topY;

describe("tread-profile geometry", () => {
  it("draws each bar at depth / depth-when-new of the full height, standing on the carcass", () => {
    const g = treadProfileGeometry({ innerMm: 3.3, centreMm: 6.4, outerMm: 8, newMm: 8, limitMm: 1.6 });
    const [inner, centre, outer] = g.bars;
    expect(inner.groove).toBe("inner");
    expect(inner.height / span).toBeCloseTo(3.3 / 8, 2);
    expect(centre.height / span).toBeCloseTo(6.4 / 8, 2);
    expect(outer.height).toBeCloseTo(span, 5);
    for (const b of g.bars) expect(b.y! + b.height).toBeCloseTo(GLYPH_BOX.baseY, 5);
    expect(g.newY).toBeCloseTo(GLYPH_BOX.topY, 5);
  });

  it("puts the limit line at limit / depth-when-new above the carcass, and marks bars at or below it", () => {
    const g = treadProfileGeometry({ innerMm: 1.6, centreMm: 1.2, outerMm: 2, newMm: 8, limitMm: 1.6 });
    expect((GLYPH_BOX.baseY - g.limitY) / span).toBeCloseTo(1.6 / 8, 2);
    expect(g.bars.map((b) => b.atLimit)).toEqual([true, true, false]);
    // A bar at the limit ends exactly on the line; one below it ends inside the zone.
    expect(g.bars[0].y).toBeCloseTo(g.limitY, 5);
    expect(g.bars[1].y!).toBeGreaterThan(g.limitY);
  });

  it("keeps heights proportional for any readings (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 12, noNaN: true }), fc.double({ min: 0, max: 12, noNaN: true }), fc.double({ min: 6, max: 12, noNaN: true }), (a, b, newMm) => {
        const g = treadProfileGeometry({ innerMm: a, centreMm: b, outerMm: null, newMm, limitMm: 1.6 });
        const [ia, ib] = [g.bars[0], g.bars[1]];
        // Rounding to 0.01 of a unit is the only slack.
        expect(Math.abs(ia.height / span - a / g.scaleMm)).toBeLessThan(0.01);
        expect(Math.abs(ib.height / span - b / g.scaleMm)).toBeLessThan(0.01);
        if (a > b + 0.05) expect(ia.height).toBeGreaterThan(ib.height);
        expect(g.scaleMm).toBeGreaterThanOrEqual(Math.max(a, b, newMm) - 1e-9);
        for (const bar of g.bars) if (bar.y !== null) expect(bar.y).toBeGreaterThanOrEqual(GLYPH_BOX.topY - 1e-9);
      }),
    );
  });

  it("widens the scale rather than overflowing when a reading exceeds the depth when new", () => {
    const g = treadProfileGeometry({ innerMm: 9, centreMm: 8, outerMm: 8, newMm: 8, limitMm: 1.6 });
    expect(g.scaleMm).toBe(9);
    expect(g.bars[0].y).toBeCloseTo(GLYPH_BOX.topY, 5);
    expect(g.newY).toBeGreaterThan(GLYPH_BOX.topY);
  });

  it("uses a typical new depth for the scale when none was logged, and says so", () => {
    const g = treadProfileGeometry({ innerMm: 4, centreMm: 4, outerMm: 4, newMm: null, limitMm: 1.6 });
    expect(g.newKnown).toBe(false);
    expect(g.scaleMm).toBe(TYPICAL_NEW_MM);
    expect(treadProfileText({ innerMm: 4, centreMm: 4, outerMm: 4, newMm: null, limitMm: 1.6 }, (mm) => `${mm} mm`)).toContain("depth when new not logged");
  });

  it("draws the inner groove toward the car's centreline when asked (a left wheel in the plan has it on the right)", () => {
    const right = treadProfileGeometry({ innerMm: 2, centreMm: 5, outerMm: 6, newMm: 8, limitMm: 1.6, innerSide: "right" });
    expect(right.bars.map((b) => b.groove)).toEqual(["outer", "centre", "inner"]);
    expect(right.bars[2].x).toBeGreaterThan(right.bars[0].x);
    expect(right.bars[2].depthMm).toBe(2);
  });

  it("shows a missing groove as no bar, and an empty tire as the ghost and the zone only", () => {
    const coin = treadProfileGeometry({ innerMm: null, centreMm: 3, outerMm: null, newMm: 8, limitMm: 1.6 });
    expect(coin.bars.map((b) => b.y === null)).toEqual([true, false, true]);
    expect(treadProfileGeometry({ innerMm: null, centreMm: null, outerMm: null, newMm: 8, limitMm: 1.6 }).empty).toBe(true);
  });

  it("keeps the limit zone a minority of the drawing even for a high limit", () => {
    const g = treadProfileGeometry({ innerMm: 3, centreMm: 3, outerMm: 3, newMm: 4, limitMm: 4 });
    expect((GLYPH_BOX.baseY - g.limitY) / span).toBeLessThanOrEqual(1 / 1.5 + 1e-9);
  });
});

describe("the TreadProfile SVG", () => {
  it("is an image with every depth in its text alternative, in the driver's unit", () => {
    const html = renderToStaticMarkup(createElement(TreadProfile, { innerMm: 3.3, centreMm: 6.4, outerMm: 6.6, newMm: 8, limitMm: 1.6, depthUnit: "mm" }));
    expect(html).toContain('role="img"');
    expect(html).toContain("inner 3.3 mm, centre 6.4 mm, outer 6.6 mm of 8 mm when new; limit 1.6 mm");
    expect(html.match(/data-part="bar"/g)).toHaveLength(3);
    expect(html).toContain('data-part="limit-zone"');
    // 1.6 mm is 2/32 in (1/32 in = 0.79375 mm, NIST HB 44 inch = 25.4 mm exactly).
    const imperial = renderToStaticMarkup(createElement(TreadProfile, { innerMm: 1.6, centreMm: null, outerMm: null, newMm: 8, limitMm: 1.6, depthUnit: "32nds" }));
    expect(imperial).toContain("inner 2/32 in, centre not measured, outer not measured");
    expect(imperial).toContain("at or below the limit: inner");
  });
});
