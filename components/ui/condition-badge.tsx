// The condition code on screen: a patch icon whose filled share is the rubber
// left to give, the level's word beside it, and the level's colours from
// lib/visual/tokens. The one component every screen uses for a condition.
import { cn } from "@/lib/cn";
import { CONDITION_CODE, PATCH_BOX, patchFillRect, type ConditionLevel } from "@/lib/visual/condition-code";

export type Condition = ConditionLevel;
export { CONDITION_LEVELS, type ConditionLevel } from "@/lib/visual/condition-code";

export function conditionLabel(c: Condition) {
  return CONDITION_CODE[c].word;
}

/** The level's shape alone (decorative: the word travels with it wherever it is shown). */
export function ConditionPatch({ condition, className, ink }: { condition: Condition; className?: string; ink?: string }) {
  const code = CONDITION_CODE[condition];
  const color = ink ?? (condition === "replace" ? code.colours.wash : code.colours.ink);
  const { x, y, w, h, r } = PATCH_BOX;
  const fill = patchFillRect(condition);
  const full = fill && fill.height >= h;
  const bottom = y + h;
  return (
    <svg viewBox={`0 0 ${PATCH_BOX.width} ${PATCH_BOX.height}`} className={cn("h-4 w-3 shrink-0", className)} aria-hidden data-patch={condition} style={{ color }}>
      <rect x={x} y={y} width={w} height={h} rx={r} fill="none" stroke="currentColor" strokeWidth={1.5} strokeDasharray={code.shape.dashed ? "2.2 1.6" : undefined} />
      {fill ? (
        full ? (
          <rect x={x} y={y} width={w} height={h} rx={r} fill="currentColor" />
        ) : (
          <path d={`M${x},${fill.y}H${x + w}V${bottom - r}A${r},${r} 0 0 1 ${x + w - r},${bottom}H${x + r}A${r},${r} 0 0 1 ${x},${bottom - r}Z`} fill="currentColor" />
        )
      ) : null}
      {fill ? (
        // Two tread grooves cut through whatever rubber is left.
        <path d={`M${x + w / 3},${Math.max(fill.y + 1.5, y + 2)}V${bottom - 2}M${x + (2 * w) / 3},${Math.max(fill.y + 1.5, y + 2)}V${bottom - 2}`} stroke={code.colours.wash} strokeWidth={1} />
      ) : null}
      {code.shape.struck ? <path d={`M${x - 0.5},${bottom + 0.5}L${x + w + 0.5},${y - 0.5}`} stroke="currentColor" strokeWidth={2} strokeLinecap="round" /> : null}
      {code.shape.dashed ? (
        <text x={PATCH_BOX.width / 2} y={y + h / 2 + 3} textAnchor="middle" fontSize={8.5} fontWeight={700} fill="currentColor">
          ?
        </text>
      ) : null}
    </svg>
  );
}

export function ConditionBadge({ condition, className, detail }: { condition: Condition; className?: string; detail?: string }) {
  const code = CONDITION_CODE[condition];
  return (
    <span
      className={cn("condition-badge inline-flex items-center gap-1.5 rounded px-2 py-0.5 text-sm font-semibold", className)}
      style={{ color: code.colours.ink, backgroundColor: code.colours.wash, borderColor: code.colours.edge, borderWidth: code.edgeWidth, borderStyle: code.shape.dashed ? "dashed" : "solid" }}
      data-condition={condition}
      title={code.meaning}
    >
      <ConditionPatch condition={condition} ink={code.colours.ink} className="h-[1.125rem] w-[0.85rem]" />
      <span>{code.word}</span>
      {detail ? <span className="font-normal">· {detail}</span> : null}
    </span>
  );
}
