"use client";
// The wear chart's plot (recharts), loaded after the page is shown by
// wear-chart.tsx, which draws the caption, the axis switch and the key in the
// page's own HTML: depth against date or odometer for each tire of a set,
// with the zone below the set's limit shaded and hatched in the condition
// palette (labelled with the limit), and each tire's projection to the limit
// dashed. Each tire has its own colour *and* marker shape.
import { CartesianGrid, Legend, Line, LineChart, ReferenceArea, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { TireView } from "@/db/queries/logbook-view";
import { kmToDistance, mmToDepth, type DepthUnit, type DistanceUnit } from "@/lib/units";
import { POSITION_LABELS } from "@/lib/validation/labels";
import { DEPTH_PLAN_MARGIN_MM, DEPTH_WATCH_MARGIN_MM } from "@/lib/tires/depth";
import { asphalt, condition, limitZone } from "@/lib/visual/tokens";
import { useFormat } from "@/components/format/format-provider";
import { HATCH_ID, type ChartAxis } from "./wear-chart";

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
function Marker({ cx, cy, stroke, shape }: { cx?: number; cy?: number; stroke: string; shape: Shape }) {
  if (cx == null || cy == null) return null;
  const s = 4.5;
  if (shape === "square") return <rect x={cx - s} y={cy - s} width={s * 2} height={s * 2} fill={stroke} />;
  if (shape === "triangle") return <polygon points={`${cx},${cy - s - 1} ${cx - s - 1},${cy + s} ${cx + s + 1},${cy + s}`} fill={stroke} />;
  if (shape === "diamond") return <polygon points={`${cx},${cy - s - 1} ${cx + s + 1},${cy} ${cx},${cy + s + 1} ${cx - s - 1},${cy}`} fill={stroke} />;
  if (shape === "cross") return <path d={`M${cx - s},${cy - s}L${cx + s},${cy + s}M${cx + s},${cy - s}L${cx - s},${cy + s}`} stroke={stroke} strokeWidth={2.5} />;
  return <circle cx={cx} cy={cy} r={s} fill={stroke} />;
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
  // Evenly spaced ticks, so labels never pile up where several projections end.
  const ticks = xMax > firstX ? [0, 1, 2, 3, 4].map((i) => Math.round(firstX + ((xMax - firstX) * i) / 4)) : [firstX];
  const tickFormat = (v: number) => (axis === "date" ? f.monthYear(isoOf(v)) : `${Math.round(v / 1000)}k ${distanceUnit}`);
  const xFormat = (v: number) => (axis === "date" ? f.date(isoOf(v)) : `${Math.round(v / 1000)}k ${distanceUnit}`);

  return (
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 10, right: 36, bottom: 8, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="#d5d9df" />
            <XAxis dataKey="x" type="number" domain={[firstX, xMax]} allowDataOverflow ticks={ticks} interval={0} tickFormatter={tickFormat} tick={{ fontSize: 12 }} allowDuplicatedCategory={false} />
            <YAxis dataKey="y" type="number" domain={[0, "auto"]} tick={{ fontSize: 12 }} width={40} unit={depthUnit === "mm" ? "" : ""} />
            <Tooltip labelFormatter={(v) => xFormat(Number(v))} formatter={(v, n) => [`${v} ${unitLabel}`, n]} />
            <Legend />
            {/* The depth conditions above the limit, as faint bands in the condition palette. */}
            <ReferenceArea
              y1={y(limitMm + DEPTH_PLAN_MARGIN_MM)}
              y2={y(limitMm + DEPTH_WATCH_MARGIN_MM)}
              fill={condition.watch.wash}
              fillOpacity={0.7}
              ifOverflow="hidden"
              label={{ value: "Watch", position: "insideRight", fill: condition.watch.ink, fontSize: 11 }}
            />
            <ReferenceArea
              y1={y(limitMm)}
              y2={y(limitMm + DEPTH_PLAN_MARGIN_MM)}
              fill={condition.plan.wash}
              fillOpacity={0.8}
              ifOverflow="hidden"
              label={{ value: "Plan", position: "insideRight", fill: condition.plan.ink, fontSize: 11 }}
            />
            <ReferenceArea
              y1={0}
              y2={y(limitMm)}
              fill={`url(#${HATCH_ID})`}
              stroke={limitZone.line}
              strokeOpacity={0.5}
              strokeDasharray="4 3"
              ifOverflow="extendDomain"
              label={{ value: `Below the ${y(limitMm)} ${unitLabel} limit`, position: "insideBottomRight", fill: limitZone.line, fontSize: 12, fontWeight: 700 }}
            />
            {lines.map((l) => (
              <Line
                key={l.tire.id}
                data={l.points}
                dataKey="y"
                name={l.name}
                stroke={l.look.stroke}
                strokeWidth={2}
                isAnimationActive={false}
                dot={(p: { cx?: number; cy?: number; index?: number }) => <Marker key={`${l.tire.id}-${p.index}`} cx={p.cx} cy={p.cy} stroke={l.look.stroke} shape={l.look.shape} />}
              />
            ))}
            {lines
              .filter((l) => l.projection.length)
              .map((l) => (
                <Line
                  key={`${l.tire.id}-p`}
                  data={l.projection}
                  dataKey="y"
                  name={`${l.name} (projection)`}
                  stroke={l.look.stroke}
                  strokeDasharray="6 4"
                  dot={false}
                  legendType="none"
                  tooltipType="none"
                  isAnimationActive={false}
                />
              ))}
          </LineChart>
        </ResponsiveContainer>
  );
}
