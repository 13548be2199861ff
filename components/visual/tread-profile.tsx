"use client";
// The tread-profile glyph: one tire's tread in cross-section. Bars are the
// inner, centre and outer groove depths standing on the carcass; the dashed
// ghost is the depth when new; the shaded band is the zone below the set's
// limit. The wear pattern (shoulder, centre, even) and the margin show
// without a number; the text alternative has the numbers.
import { cn } from "@/lib/cn";
import { useFormat } from "@/components/format/format-context";
import type { DepthUnit } from "@/lib/units";
import { asphalt, limitZone } from "@/lib/visual/tokens";
import { GLYPH_BOX, treadProfileGeometry, treadProfileText, type TreadProfileInput } from "@/lib/visual/tread-profile";

export type TreadProfileProps = TreadProfileInput & { depthUnit: DepthUnit; className?: string; "data-testid"?: string };

export function TreadProfile({ depthUnit, className, "data-testid": testId, ...input }: TreadProfileProps) {
  // Depths as the reader writes numbers ("6,5 mm" in German), from the formatter the server hands down.
  const f = useFormat();
  const g = treadProfileGeometry(input);
  const label = treadProfileText(input, (mm) => f.depth(mm, depthUnit));
  const { width, height, baseY } = GLYPH_BOX;
  const left = 2;
  const right = width - 2;
  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-label={label}
      className={cn("h-11 w-16 shrink-0", className)}
      data-testid={testId ?? "tread-profile"}
      data-inner-side={input.innerSide ?? "left"}
    >
      <title>{label}</title>
      {/* The zone below the limit, across the whole tread. */}
      <rect x={left} y={g.limitY} width={right - left} height={baseY - g.limitY} fill={limitZone.fill} fillOpacity={limitZone.fillOpacity * 1.8} data-part="limit-zone" />
      <line x1={left} x2={right} y1={g.limitY} y2={g.limitY} stroke={limitZone.line} strokeWidth={1.25} data-part="limit-line" />
      {g.bars.map((b) => (
        <g key={b.groove} data-groove={b.groove}>
          {/* What the rib stood at when new: the rubber already worn away. */}
          <rect x={b.x + 0.5} y={g.newY} width={b.width - 1} height={baseY - g.newY} rx={1.5} fill="none" stroke={asphalt[400]} strokeWidth={1} strokeDasharray={g.newKnown ? "2 1.5" : "1 2"} data-part="new" />
          {b.y !== null ? (
            // A rib at or below the limit is drawn hollow, so it stands out without colour too.
            <rect
              x={b.atLimit ? b.x + 0.75 : b.x}
              y={b.atLimit ? Math.min(b.y, baseY - 1.5) : b.y}
              width={b.atLimit ? b.width - 1.5 : b.width}
              height={b.atLimit ? Math.max(b.height, 1.5) : b.height}
              rx={1.5}
              fill={b.atLimit ? "#ffffff" : asphalt[800]}
              stroke={b.atLimit ? limitZone.line : "none"}
              strokeWidth={1.5}
              data-part="bar"
              data-at-limit={b.atLimit || undefined}
              data-depth={b.depthMm ?? undefined}
            />
          ) : (
            <path d={`M${b.x + 3},${baseY - 3}l${b.width - 6},-4`} stroke={asphalt[500]} strokeWidth={1.5} data-part="no-reading" />
          )}
        </g>
      ))}
      {/* The carcass the ribs stand on, with the two shoulders rounded off. */}
      <path d={`M${left},${baseY}H${right}V${baseY + 3}Q${right},${height - 1} ${right - 5},${height - 1}H${left + 5}Q${left},${height - 1} ${left},${baseY + 3}Z`} fill={asphalt[600]} />
    </svg>
  );
}

/** The glyph fed straight from a tire's latest reading, as the logbook views carry it. */
export function TireTreadProfile({
  tire,
  limitMm,
  depthUnit,
  innerSide,
  className,
}: {
  tire: { newDepthMm: number | null; latest: { innerMm: number | null; centreMm: number | null; outerMm: number | null } | null };
  limitMm: number;
  depthUnit: DepthUnit;
  innerSide?: "left" | "right";
  className?: string;
}) {
  return (
    <TreadProfile
      innerMm={tire.latest?.innerMm}
      centreMm={tire.latest?.centreMm}
      outerMm={tire.latest?.outerMm}
      newMm={tire.newDepthMm}
      limitMm={limitMm}
      depthUnit={depthUnit}
      innerSide={innerSide}
      className={className}
    />
  );
}
