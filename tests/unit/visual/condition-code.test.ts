// The condition code: five levels that differ in shape and weight as well as
// colour, an `unknown` that never looks good, no traffic-light ramp, and the
// same words in the badge, the calendar text and the reminder labels.
import ICAL from "ical.js";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ConditionBadge, ConditionPatch } from "@/components/ui/condition-badge";
import { buildFeed } from "@/lib/reminders/feed";
import { conditionLabelFor, conditionTextFor } from "@/lib/reminders/severity";
import type { ReminderItem } from "@/lib/tires";
import { CONDITION_CODE, CONDITION_LEVELS, conditionText, patchFillRect, PATCH_BOX } from "@/lib/visual/condition-code";
import { conditionTheme } from "@/lib/visual/tokens";

// WCAG 2.1 relative luminance and contrast ratio (W3C, "relative luminance" definition).
function luminance(hex: string) {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
};
// Hue and saturation in HSL (the CSS Color 4 conversion).
function hsl(hex: string) {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const max = Math.max(r, g, b);
  const min = Math.min(r, g, b);
  const d = max - min;
  const l = (max + min) / 2;
  const s = d === 0 ? 0 : d / (1 - Math.abs(2 * l - 1));
  let h = 0;
  if (d !== 0) h = max === r ? 60 * (((g - b) / d) % 6) : max === g ? 60 * ((b - r) / d + 2) : 60 * ((r - g) / d + 4);
  return { h: (h + 360) % 360, s, l };
}

describe("the condition code", () => {
  it("gives each of the five levels its own patch shape, so no two read alike without colour", () => {
    const shapes = CONDITION_LEVELS.map((l) => JSON.stringify(CONDITION_CODE[l].shape));
    expect(new Set(shapes).size).toBe(CONDITION_LEVELS.length);
  });

  it("fills less of the patch as the level gets more urgent (the rubber left to give)", () => {
    const fills = (["good", "watch", "plan", "replace"] as const).map((l) => CONDITION_CODE[l].shape.fill);
    for (let i = 1; i < fills.length; i++) expect(fills[i]).toBeLessThan(fills[i - 1]);
    // The drawn rectangle follows: full, two thirds, one third, none.
    expect(patchFillRect("good")!.height).toBe(PATCH_BOX.h);
    expect(patchFillRect("watch")!.height).toBeCloseTo((PATCH_BOX.h * 2) / 3, 1);
    expect(patchFillRect("plan")!.height).toBeCloseTo(PATCH_BOX.h / 3, 1);
    expect(patchFillRect("replace")).toBeNull();
    // Filled from the bottom: the top of the fill plus its height is the patch's bottom.
    const w = patchFillRect("watch")!;
    expect(w.y + w.height).toBeCloseTo(PATCH_BOX.y + PATCH_BOX.h, 5);
  });

  it("never lets an unknown age look good: another shape, another colour, another word", () => {
    const u = CONDITION_CODE.unknown;
    const g = CONDITION_CODE.good;
    expect(u.shape.fill).toBe(0);
    expect(u.shape.dashed).toBe(true);
    expect(u.colours.wash).not.toBe(g.colours.wash);
    expect(u.colours.ink).not.toBe(g.colours.ink);
    expect(u.word).toMatch(/unknown/i);
    expect(u.word).toMatch(/read the code/);
    expect(u.word).not.toMatch(/good/i);
  });

  it("keeps every badge's word legible: ink on wash at WCAG AAA contrast (7:1)", () => {
    for (const l of CONDITION_LEVELS) expect(contrast(CONDITION_CODE[l].colours.ink, CONDITION_CODE[l].colours.wash), l).toBeGreaterThanOrEqual(7);
    // The Tailwind colours used as text on white (form errors, notes) stay at AA or better.
    for (const l of ["good", "watch", "plan", "replace", "unknown"] as const) expect(contrast(conditionTheme[l], "#ffffff"), l).toBeGreaterThanOrEqual(4.5);
  });

  it("is no traffic-light ramp: no yellow or orange, no signal red, no grass green", () => {
    for (const l of CONDITION_LEVELS) {
      for (const c of [CONDITION_CODE[l].colours.ink, CONDITION_CODE[l].colours.wash]) {
        const { h, s } = hsl(c);
        if (s < 0.2) continue; // greys and near-whites carry no hue
        expect(h >= 20 && h <= 75, `${l} ${c} is yellow/orange`).toBe(false);
        expect(h < 12 || h > 350, `${l} ${c} is signal red`).toBe(false);
        expect(h >= 80 && h <= 150, `${l} ${c} is grass green`).toBe(false);
      }
    }
    // The old ramp's colours fail the same checks (the test can fail).
    expect(hsl("#7a5b00").h).toBeGreaterThan(20);
    expect(hsl("#7a5b00").h).toBeLessThan(75);
  });

  it("grows heavier with urgency in greyscale: replace is the darkest chip, good among the lightest", () => {
    const wash = (l: keyof typeof CONDITION_CODE) => luminance(CONDITION_CODE[l].colours.wash);
    expect(wash("replace")).toBeLessThan(0.1);
    for (const l of ["good", "watch", "plan", "unknown"] as const) expect(wash(l)).toBeGreaterThan(0.6);
    expect(CONDITION_CODE.plan.edgeWidth).toBeGreaterThan(CONDITION_CODE.watch.edgeWidth);
  });

  it("renders the badge with the shape, the word and the level", () => {
    for (const l of CONDITION_LEVELS) {
      const html = renderToStaticMarkup(createElement(ConditionBadge, { condition: l }));
      expect(html).toContain(`data-condition="${l}"`);
      expect(html).toContain(`data-patch="${l}"`);
      expect(html).toContain(CONDITION_CODE[l].word.replace("—", "—"));
    }
    // Replace's patch is struck through; unknown's is dashed with a question mark; good's is a full patch.
    expect(renderToStaticMarkup(createElement(ConditionPatch, { condition: "replace" }))).toMatch(/stroke-linecap="round"/);
    const unknown = renderToStaticMarkup(createElement(ConditionPatch, { condition: "unknown" }));
    expect(unknown).toContain("stroke-dasharray");
    expect(unknown).toContain("?");
    expect(renderToStaticMarkup(createElement(ConditionPatch, { condition: "good" }))).toMatch(new RegExp(`<rect[^>]*height="${PATCH_BOX.h}"[^>]*fill="currentColor"`));
  });

  it("says the same thing in plain text, shape first and word always", () => {
    expect(conditionText("plan")).toBe("▰▱▱ Plan to replace");
    expect(conditionText("good")).toBe("▰▰▰ Good");
    expect(conditionTextFor("replace")).toBe("▱▱▱ Replace now");
    expect(conditionTextFor("info")).toBe("Coming up");
    expect(conditionLabelFor("watch")).toBe(CONDITION_CODE.watch.word);
    const marks = CONDITION_LEVELS.map((l) => CONDITION_CODE[l].textMark);
    expect(new Set(marks).size).toBe(marks.length);
  });

  it("puts the condition in the calendar event's description (parsed back with ical.js)", () => {
    const item: ReminderItem = {
      id: "v/s/age-replace",
      kind: "age-replace",
      vehicleId: "v",
      setId: "s",
      subject: "Tires reach 10 years",
      date: "2027-03-01",
      severity: "replace",
      overdue: false,
      explanation: "Because.",
    };
    const text = buildFeed({ items: [item], plan: "plus", timezone: "UTC", alarmLeadDays: [], baseUrl: "https://fp.example", now: new Date("2026-12-01T00:00:00Z") });
    const event = new ICAL.Component(ICAL.parse(text)).getFirstSubcomponent("vevent")!;
    expect(String(event.getFirstPropertyValue("description"))).toMatch(/^Condition: ▱▱▱ Replace now\n/);
  });
});
