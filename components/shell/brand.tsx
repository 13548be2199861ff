import Link from "next/link";
import { MARK_ON_LIGHT, MARK_PATCHES, MARK_RADIUS, MARK_VIEWBOX, markGrooves, markTurn } from "@/lib/visual/mark";

/** The mark: the four contact patches a car stands on, seen from underneath, the front pair steering (lib/visual/mark.ts). */
export function BrandMark({ className = "size-7" }: { className?: string }) {
  return (
    <svg viewBox={`0 0 ${MARK_VIEWBOX} ${MARK_VIEWBOX}`} className={className} aria-hidden data-testid="brand-mark">
      {MARK_PATCHES.map((p) => (
        <g key={`${p.x}-${p.y}`} transform={markTurn(p)}>
          <rect x={p.x} y={p.y} width={p.w} height={p.h} rx={MARK_RADIUS} fill={MARK_ON_LIGHT.patch} />
          <path d={markGrooves(p)} stroke={MARK_ON_LIGHT.groove} strokeWidth={0.8} strokeLinecap="round" />
        </g>
      ))}
    </svg>
  );
}

export function Brand({ href = "/" }: { href?: string }) {
  return (
    <Link href={href} className="flex items-center gap-2 text-lg font-extrabold tracking-tight text-asphalt-950 no-underline">
      <BrandMark />
      Fourpatch
    </Link>
  );
}
