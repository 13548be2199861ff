"use client";
// The wear chart's plot, plain SVG drawn with the page (wear-chart.tsx holds
// the caption, the axis switch and the key): depth against date or odometer
// for each tire of a set, with the zone below the set's limit shaded and
// hatched in the condition palette (labelled with the limit), the "Plan" and
// "Watch" bands above it, and each tire's projection to the limit dashed.
// Each tire has its own colour *and* marker shape; a marker's title gives its
// reading. d3's scales choose the ticks and map values to the drawing, d3's
// shapes draw the lines and markers, and React draws the SVG with the page: a
// chart library that renders for itself cost ~110 KiB of script and a quarter
// of a second of a phone's main thread, for a few lines.
import { useLayoutEffect, useRef, useState } from "react";
import { scaleLinear, scaleUtc } from "d3-scale";
import { line, symbol, symbolCircle, symbolCross, symbolDiamond, symbolSquare, symbolTriangle } from "d3-shape";
import type { TireView } from "@/db/queries/logbook-view";
import { kmToDistance, mmToDepth, type DepthUnit, type DistanceUnit } from "@/lib/units";
import { POSITION_LABELS } from "@/lib/validation/labels";
import { DEPTH_PLAN_MARGIN_MM, DEPTH_WATCH_MARGIN_MM } from "@/lib/tires/depth";
import { asphalt, condition, limitZone } from "@/lib/visual/tokens";
import { useFormat } from "@/components/format/format-provider";

import { HATCH_ID, type ChartAxis } from "./wear-ids";

// Each tire's own colour and marker: identities, not conditions, so none of them is a condition colour.
const LOOK = [
  { stroke: "#217a71", shape: "circle" },
  { stroke: "#8a5a12", shape: "square" },
  { stroke: "#2a74a8", shape: "triangle" },
  { stroke: asphalt[700], shape: "diamond" },
  { stroke: "#6b6b1f", shape: "cross" },
] as const;

const day = (iso: string) => Date.UTC(Number(iso.slice(0, 4)), Number(iso.slice(5, 7)) - 1, Number(iso.slice(8, 10)));
const isoOf = (ms: number) => new Date(ms).toISOString().slice(0, 10);

type Shape = (typeof LOOK)[number]["shape"];
const SYMBOLS = { circle: symbolCircle, square: symbolSquare, triangle: symbolTriangle, diamond: symbolDiamond, cross: symbolCross } as const;
const markerPath = Object.fromEntries(Object.entries(SYMBOLS).map(([k, type]) => [k, symbol(type, 72)() ?? ""])) as Record<Shape, string>;
function Marker({ cx, cy, stroke, shape }: { cx: number; cy: number; stroke: string; shape: Shape }) {
  return <path d={markerPath[shape]} transform={`translate(${cx},${cy})`} fill={stroke} />;
}

export function WearPlot({ tires, limitMm, depthUnit, distanceUnit, axis }: { tires: TireView[]; limitMm: number; depthUnit: DepthUnit; distanceUnit: DistanceUnit; axis: ChartAxis }) {
  const f = useFormat();
  const withData = tires.filter((t) => t.series.length > 0);
  const y = (mm: number) => Math.round(mmToDepth(mm, depthUnit) * 100) / 100;
  const lines = withData.map((t, i) => {
    const points = t.series
      .filter((p) => axis === "date" || p.odometerKm != null)
      .map((p) => ({ x: axis === "date" ? day(p.date) : Math.round(kmToDistance(p.odometerKm as number, distanceUnit)), y: y(p.depthMm) }));
    const last = points.at(-1);
    const proj = t.projection;
    const end =
      last && proj
        ? axis === "date"
          ? proj.projectedDate
            ? { x: day(proj.projectedDate), y: y(limitMm) }
            : null
          : { x: Math.round(kmToDistance(proj.projectedOdometerKm, distanceUnit)), y: y(limitMm) }
        : null;
    // Only forward projections are drawn; a tire already at the limit has none to show.
    const projection = last && end && end.x > last.x ? [last, end] : [];
    return { tire: t, points, projection, look: LOOK[i % LOOK.length], name: POSITION_LABELS[t.position] };
  });
  // The axis runs to the first tire's projected limit plus a margin, so a far-off projection of a
  // slow-wearing tire cannot squeeze the measured readings into a corner; longer lines are clipped.
  const lastX = Math.max(...lines.flatMap((l) => l.points.map((p) => p.x)));
  const firstX = Math.min(...lines.flatMap((l) => l.points.map((p) => p.x)));
  const ends = lines.flatMap((l) => (l.projection[1] ? [l.projection[1].x] : []));
  const span = Math.max(lastX - firstX, axis === "date" ? 90 * 86_400_000 : 3_000);
  const xMax = ends.length ? Math.max(lastX, Math.min(Math.max(...ends), Math.min(...ends) + span * 0.5)) : lastX;
  const unitLabel = depthUnit === "32nds" ? "32nds in" : "mm";
  const tickFormat = (v: number) => (axis === "date" ? f.monthYear(isoOf(v)) : `${f.number(v / 1000, 1)}k ${distanceUnit}`);
  const xFormat = (v: number) => (axis === "date" ? f.date(isoOf(v)) : `${f.number(v)} ${distanceUnit}`);
  const limit = y(limitMm);
  const top = Math.max(...lines.flatMap((l) => l.points.map((p) => p.y)), y(limitMm + DEPTH_WATCH_MARGIN_MM));
  // Four to eight round ticks from zero to just above the deepest reading.
  const depth = scaleLinear().domain([0, top]).nice(6);
  const yMax = depth.domain()[1];
  const yTicks = depth.ticks(6);
  const scene = { axis, lines, firstX, xMax, yMax, yTicks, limit, watch: y(limitMm + DEPTH_WATCH_MARGIN_MM), plan: y(limitMm + DEPTH_PLAN_MARGIN_MM), unitLabel, tickFormat, xFormat };

  return <MeasuredPlot scene={scene} />;
}

/**
 * The drawing takes its box's size in CSS pixels, so its text keeps its size on
 * a phone and on a wide screen. The plot is drawn in the browser only (it
 * loads after the page), so it waits for the box's size and draws once: a
 * first drawing at a guessed size, redrawn at the measured one, was twice the
 * work of a phone's main thread at the page's start.
 */
function MeasuredPlot({ scene }: { scene: Scene }) {
  const box = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState<{ width: number; height: number } | null>(null);
  useLayoutEffect(() => {
    const el = box.current;
    if (!el) return;
    const measure = () => {
      const r = el.getBoundingClientRect();
      if (r.width > 0 && r.height > 0) setSize((s) => (s && Math.abs(s.width - r.width) < 1 && Math.abs(s.height - r.height) < 1 ? s : { width: Math.round(r.width), height: Math.round(r.height) }));
    };
    measure();
    const o = new ResizeObserver(measure);
    o.observe(el);
    return () => o.disconnect();
  }, []);
  return (
    <div ref={box} className="h-full w-full">
      {size ? <Plot scene={scene} width={size.width} height={size.height} className="h-full w-full" /> : null}
    </div>
  );
}

type Scene = {
  axis: ChartAxis;
  lines: { tire: TireView; points: { x: number; y: number }[]; projection: { x: number; y: number }[]; look: (typeof LOOK)[number]; name: string }[];
  firstX: number;
  xMax: number;
  yMax: number;
  yTicks: number[];
  limit: number;
  watch: number;
  plan: number;
  unitLabel: string;
  tickFormat: (v: number) => string;
  xFormat: (v: number) => string;
};

/**
 * A marker per reading while they can be told apart; a long history (weekly
 * checks over years) keeps its line and marks only every n-th reading and
 * the last, so a phone does not draw thousands of shapes.
 */
const MAX_MARKERS = 60;
function markersOf(points: { x: number; y: number }[]) {
  const every = Math.ceil(points.length / MAX_MARKERS);
  return points.map((p, i) => ({ p, i })).filter(({ i }) => i % every === 0 || i === points.length - 1);
}

const GRID = asphalt[200];
const INK = asphalt[700];

function Plot({ scene, width, height, className }: { scene: Scene; width: number; height: number; className: string }) {
  const { axis, lines, firstX, xMax, yMax, yTicks, limit, watch, plan, unitLabel, tickFormat, xFormat } = scene;
  const left = 40;
  const right = width - 36;
  const top = 10;
  const bottom = height - 50; // the x labels, then the legend
  // A single reading still gets an axis: a day (or a few hundred km) either side.
  const pad = xMax > firstX ? 0 : axis === "date" ? 86_400_000 : 500;
  const dates = scaleUtc().domain([firstX - pad, xMax + pad]).range([left, right]);
  const distances = scaleLinear().domain([firstX - pad, xMax + pad]).range([left, right]);
  const sx = (v: number) => (axis === "date" ? dates(v) : distances(v));
  const yScale = scaleLinear().domain([0, yMax]).range([bottom, top]).clamp(true);
  const sy = (v: number) => yScale(v);
  // Few round ticks, so labels never pile up where several projections end; two or three on a phone.
  const count = right - left >= 400 ? 6 : 4;
  let ticks = (axis === "date" ? dates.ticks(count).map(Number) : distances.ticks(count)).filter((t) => t >= firstX - pad && t <= xMax + pad);
  // A label takes about 64 px: every other tick goes until they fit.
  while (ticks.length > 2 && ticks.length * 64 > right - left) ticks = ticks.filter((_, i) => i % 2 === 0);
  const anchor = (t: number) => (sx(t) - left < 36 ? "start" : right - sx(t) < 36 ? "end" : "middle");
  const clip = `wear-clip-${width}`;
  const draw = line<{ x: number; y: number }>()
    .x((p) => sx(p.x))
    .y((p) => sy(p.y));
  const path = (pts: { x: number; y: number }[]) => draw(pts) ?? "";
  const band = (from: number, to: number) => ({ x: left, y: sy(to), width: right - left, height: Math.max(0, sy(from) - sy(to)) });
  const legendGap = (width - 20) / Math.max(1, lines.length);
  return (
    <svg viewBox={`0 0 ${width} ${height}`} className={className} fontSize={12} aria-hidden>
      <defs>
        <clipPath id={clip}>
          <rect x={left} y={top - 6} width={right - left + 6} height={bottom - top + 12} />
        </clipPath>
      </defs>
      {yTicks.map((t) => (
        <g key={`y${t}`}>
          <line x1={left} x2={right} y1={sy(t)} y2={sy(t)} stroke={GRID} strokeDasharray="3 3" />
          <text x={left - 6} y={sy(t)} dy="0.32em" textAnchor="end" fill={INK}>
            {t}
          </text>
        </g>
      ))}
      {ticks.map((t) => (
        <g key={`x${t}`}>
          <line x1={sx(t)} x2={sx(t)} y1={top} y2={bottom} stroke={GRID} strokeDasharray="3 3" />
          <text x={sx(t)} y={bottom + 16} textAnchor={anchor(t)} fill={INK}>
            {tickFormat(t)}
          </text>
        </g>
      ))}
      {/* The depth conditions above the limit, as faint bands in the condition palette. */}
      <rect {...band(plan, watch)} fill={condition.watch.wash} fillOpacity={0.7} />
      <text x={right - 4} y={sy(watch) + 13} textAnchor="end" fontSize={11} fill={condition.watch.ink}>
        Watch
      </text>
      <rect {...band(limit, plan)} fill={condition.plan.wash} fillOpacity={0.8} />
      <text x={right - 4} y={sy(plan) + 13} textAnchor="end" fontSize={11} fill={condition.plan.ink}>
        Plan
      </text>
      <rect {...band(0, limit)} fill={`url(#${HATCH_ID})`} stroke={limitZone.line} strokeOpacity={0.5} strokeDasharray="4 3" />
      <text x={right - 6} y={bottom - 6} textAnchor="end" fontWeight={700} fill={limitZone.line}>
        {`Below the ${limit} ${unitLabel} limit`}
      </text>
      <line x1={left} x2={right} y1={bottom} y2={bottom} stroke={INK} />
      <g clipPath={`url(#${clip})`}>
        {lines.map((l) =>
          l.projection.length ? <path key={`${l.tire.id}-p`} d={path(l.projection)} fill="none" stroke={l.look.stroke} strokeWidth={2} strokeDasharray="6 4" /> : null,
        )}
        {lines.map((l) => (
          <g key={l.tire.id}>
            <path d={path(l.points)} fill="none" stroke={l.look.stroke} strokeWidth={2} />
            {markersOf(l.points).map(({ p, i }) => (
              <g key={i} data-marker>
                <title>{`${l.name}: ${p.y} ${unitLabel}, ${xFormat(p.x)}`}</title>
                <Marker cx={sx(p.x)} cy={sy(p.y)} stroke={l.look.stroke} shape={l.look.shape} />
              </g>
            ))}
          </g>
        ))}
      </g>
      {lines.map((l, i) => (
        <g key={`k${l.tire.id}`} transform={`translate(${10 + i * legendGap + 8},${height - 12})`}>
          <Marker cx={0} cy={-4} stroke={l.look.stroke} shape={l.look.shape} />
          <text x={10} y={0} fill={INK}>
            {l.name}
          </text>
        </g>
      ))}
    </svg>
  );
}
