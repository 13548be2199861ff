// A set's tires at a glance, in plan order (front pair above the rear pair,
// inner grooves toward the centreline): the vehicles overview's small map of
// where the wear is. Each glyph carries its own text alternative, and each
// tire its condition patch beside its position.
import { ConditionPatch, conditionLabel } from "@/components/ui/condition-badge";
import { TireTreadProfile } from "@/components/visual/tread-profile";
import type { TireView } from "@/db/queries/logbook-view";
import type { DepthUnit } from "@/lib/units";
import { POSITION_LABELS } from "@/lib/validation/labels";

type GlanceTire = Pick<TireView, "id" | "position" | "newDepthMm" | "latest" | "condition">;
const ORDER = ["front_left", "front_right", "rear_left", "rear_right"] as const;
const SHORT: Record<(typeof ORDER)[number], string> = { front_left: "FL", front_right: "FR", rear_left: "RL", rear_right: "RR" };

export function SetAtAGlance({ tires, limitMm, depthUnit }: { tires: GlanceTire[]; limitMm: number; depthUnit: DepthUnit }) {
  const placed = ORDER.map((p) => tires.find((t) => t.position === p) ?? null);
  if (placed.every((t) => t === null)) return null;
  return (
    <ul className="grid w-fit grid-cols-2 gap-x-5 gap-y-1.5 rounded border border-asphalt-200 bg-asphalt-50 px-3 py-2" aria-label="Tread profile of each tire, front pair first" data-testid="set-at-a-glance">
      {placed.map((t, i) => {
        const position = ORDER[i];
        const left = position.endsWith("left");
        return (
          <li key={position} className={left ? "flex flex-row-reverse items-center gap-1.5" : "flex items-center gap-1.5"}>
            {t ? <TireTreadProfile tire={t} limitMm={limitMm} depthUnit={depthUnit} innerSide={left ? "right" : "left"} className="h-8 w-12" /> : <span className="h-8 w-12" />}
            <span className="flex flex-col items-center text-[0.6875rem] font-semibold text-asphalt-600">
              <abbr title={POSITION_LABELS[position]} className="no-underline">
                {SHORT[position]}
              </abbr>
              {t?.condition ? (
                <>
                  <ConditionPatch condition={t.condition} />
                  <span className="sr-only">{conditionLabel(t.condition)}</span>
                </>
              ) : null}
            </span>
          </li>
        );
      })}
    </ul>
  );
}
