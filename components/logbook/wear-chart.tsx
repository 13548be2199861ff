"use client";
// The set page's wear chart: the caption, the axis switch and the key of the
// limit zone in the page's HTML; the plot (wear-plot.tsx, SVG with d3's
// scales and shapes) loads after the page, in a box of its final size, so it
// adds nothing to the page's first load. The same facts are in the table
// under the chart.
import { useState } from "react";
import dynamic from "next/dynamic";
import type { TireView } from "@/db/queries/logbook-view";
import { mmToDepth, type DepthUnit, type DistanceUnit } from "@/lib/units";
import { limitZone } from "@/lib/visual/tokens";
import { HATCH_ID, type ChartAxis } from "./wear-ids";

const WearPlot = dynamic(() => import("./wear-plot").then((m) => m.WearPlot), {
  ssr: false,
  loading: () => <div className="flex h-full w-full items-center justify-center text-sm text-asphalt-600">Drawing the chart…</div>,
});



/** The hatch of the limit zone, so the zone reads in greyscale and in print as well as in colour. */
function LimitHatch() {
  return (
    <svg width="0" height="0" aria-hidden className="absolute">
      <defs>
        <pattern id={HATCH_ID} width="7" height="7" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="7" height="7" fill={limitZone.fill} fillOpacity={limitZone.fillOpacity} />
          <line x1="0" y1="0" x2="0" y2="7" stroke={limitZone.line} strokeOpacity={0.35} strokeWidth={2} />
        </pattern>
      </defs>
    </svg>
  );
}

export function WearChart({ tires, limitMm, limitSource, depthUnit, distanceUnit }: { tires: TireView[]; limitMm: number; limitSource?: string; depthUnit: DepthUnit; distanceUnit: DistanceUnit }) {
  const [axis, setAxis] = useState<ChartAxis>("date");
  if (!tires.some((t) => t.series.length > 0)) {
    return <p className="rounded border border-dashed border-asphalt-300 p-4 text-asphalt-600">No tread checks yet: the chart appears after the first one.</p>;
  }
  const unitLabel = depthUnit === "32nds" ? "32nds in" : "mm";
  const limit = Math.round(mmToDepth(limitMm, depthUnit) * 100) / 100;
  return (
    <figure className="space-y-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <figcaption className="text-sm text-asphalt-700">
          Tread depth ({unitLabel}) of each tire against {axis === "date" ? "the date" : "the odometer"}; dashed lines are projections to the hatched zone below the limit; the bands above it are where a tire turns “Plan to replace” and “Watch”.
        </figcaption>
        <div role="group" aria-label="Chart axis" className="inline-flex rounded border border-asphalt-300">
          {(["date", "odometer"] as const).map((a) => (
            <button
              key={a}
              type="button"
              aria-pressed={axis === a}
              onClick={() => setAxis(a)}
              className={`min-h-11 px-3 text-sm font-semibold ${axis === a ? "bg-groove-700 text-white" : "bg-white text-asphalt-800"}`}
            >
              By {a}
            </button>
          ))}
        </div>
      </div>
      <LimitHatch />
      <div className="h-72 w-full sm:h-96" data-testid="wear-chart">
        <WearPlot tires={tires} limitMm={limitMm} depthUnit={depthUnit} distanceUnit={distanceUnit} axis={axis} />
      </div>
      <p className="flex items-start gap-2 text-sm text-asphalt-700" data-testid="limit-key">
        <svg viewBox="0 0 20 14" className="mt-0.5 h-3.5 w-5 shrink-0" aria-hidden>
          <rect width="20" height="14" fill={`url(#${HATCH_ID})`} stroke={limitZone.line} strokeOpacity={0.5} strokeDasharray="3 2" />
        </svg>
        <span>
          Below the limit: {limit} {unitLabel}
          {limitSource ? ` — ${limitSource}` : ""}. Local law sets the legal minimum.
        </span>
      </p>
    </figure>
  );
}
