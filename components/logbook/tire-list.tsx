"use client";
// A set's tires: position, DOT week, age, depth and condition, as a list
// that reads on a phone and as a grid on a desktop.
import { ConditionBadge } from "@/components/ui/condition-badge";
import { TireTreadProfile } from "@/components/visual/tread-profile";
import type { SetKind } from "@/lib/tires";
import type { TireView } from "@/db/queries/logbook-view";
import type { DepthUnit } from "@/lib/units";
import { POSITION_LABELS } from "@/lib/validation/labels";
import { useFormat } from "@/components/format/format-provider";
// The editor of a tire loads its code when opened.
import { TireEditor } from "./lazy-forms";

/** With `limitMm`, each tire shows its tread-profile glyph against that limit; `edit` lets the owner correct a tire's DOT code and position in place. */
export function TireList({
  tires,
  depthUnit,
  showPattern = false,
  limitMm,
  edit,
}: {
  tires: TireView[];
  depthUnit: DepthUnit;
  showPattern?: boolean;
  limitMm?: number;
  edit?: { vehicleId: string; setId: string; kind: SetKind };
}) {
  const f = useFormat();
  if (tires.length === 0) return <p className="text-sm text-asphalt-600">No tires recorded for this set.</p>;
  return (
    <ul className="grid gap-2 sm:grid-cols-2" aria-label="Tires">
      {tires.map((t) => (
        <li key={t.id} className="rounded border border-asphalt-200 p-3 text-sm" data-testid="tire">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <div className="flex items-center gap-3">
              {limitMm != null ? <TireTreadProfile tire={t} limitMm={limitMm} depthUnit={depthUnit} className="h-12 w-[4.4rem]" /> : null}
              <span className="font-semibold">{POSITION_LABELS[t.position]}</span>
            </div>
            {t.condition ? <ConditionBadge condition={t.condition} /> : <span className="text-asphalt-600">No condition yet</span>}
          </div>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            <dt className="text-asphalt-600">DOT</dt>
            <dd className="font-mono">{t.dotCode ?? "not recorded"}</dd>
            <dt className="text-asphalt-600">Made</dt>
            <dd>
              {t.dot?.ok
                ? `week ${t.dot.week} of ${t.dot.year} (from ${f.date(t.dot.weekStart)})`
                : t.dot
                  ? t.dot.error
                  : "unknown: read the DOT code on the sidewall (its last four digits are the week and year) and add it"}
            </dd>
            <dt className="text-asphalt-600">Age</dt>
            <dd>
              {f.age(t.age)}
              {t.replaceFrom ? <span className="text-asphalt-600"> · replace by {f.date(t.replaceFrom)}</span> : null}
            </dd>
            <dt className="text-asphalt-600">Depth</dt>
            <dd>
              {t.latest ? (
                <>
                  {t.latest.approximate ? "about " : ""}
                  {f.depth(t.depthMm, depthUnit)} on {f.date(t.latest.checkedOn)}
                </>
              ) : t.depthMm != null ? (
                <>{f.depth(t.depthMm, depthUnit)} when new</>
              ) : (
                "no check yet"
              )}
            </dd>
            {showPattern && t.pattern ? (
              <>
                <dt className="text-asphalt-600">Wear</dt>
                <dd>
                  <span className="font-semibold">{PATTERN_LABEL[t.pattern.kind]}.</span> {t.pattern.likelyCause} {t.pattern.advice}
                </dd>
              </>
            ) : null}
            {showPattern && t.projection ? (
              <>
                <dt className="text-asphalt-600">At limit</dt>
                <dd>
                  {t.projection.projectedDate ? `reached around ${f.date(t.projection.projectedDate)}` : "no date yet"}
                  {t.projection.method === "typical-rate" ? " (estimated from a typical wear rate)" : ` (confidence: ${t.projection.confidence})`}
                </dd>
              </>
            ) : null}
          </dl>
          {edit ? <TireEditor tire={t} edit={edit} /> : null}
        </li>
      ))}
    </ul>
  );
}

export const PATTERN_LABEL: Record<NonNullable<TireView["pattern"]>["kind"], string> = {
  even: "Even wear",
  "under-inflation": "Worn on both shoulders",
  "over-inflation": "Worn in the centre",
  "inner-shoulder": "Worn on the inner shoulder",
  "outer-shoulder": "Worn on the outer shoulder",
};
