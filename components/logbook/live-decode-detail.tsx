"use client";
// What a DOT code and a tire size mean, shown as the driver types them
// (loaded by live-decode.tsx once there is something to decode).
// Everything here comes from lib/tires; nothing is judged in the component.
import { AlertTriangle, CheckCircle2, XCircle } from "lucide-react";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { ageCondition } from "@/lib/tires/age";
import { checkFit, overallDiameter, parseTireSize } from "@/lib/tires/size";
import { decodeDotCode } from "@/lib/tires/dot";
import { loadIndexKg, speedSymbolKmh } from "@/lib/tires/load-index";
import type { FitStatus, SetKind } from "@/lib/tires";
import { todayIso } from "@/lib/validation/labels";
import { useFormat } from "@/components/format/format-provider";

export function DotDecoded({ code, kind }: { code: string; kind: SetKind }) {
  const f = useFormat();
  const today = todayIso();
  const d = decodeDotCode(code, { today });
  if (!d.ok) {
    return (
      <p className="text-sm text-condition-replace" data-testid="dot-error">
        {d.error}
      </p>
    );
  }
  const age = ageCondition({ manufactureWeekStart: d.weekStart, kind, today, precision: d.precision });
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-asphalt-800" data-testid="dot-decoded">
      <span>
        Made in week {d.week} of {d.year} ({f.date(d.weekStart)} – {f.date(d.weekEnd)})
      </span>
      {age.ok ? (
        <>
          <span className="font-semibold">{f.age(age.age)}</span>
          <ConditionBadge condition={age.level} detail="by age" />
        </>
      ) : null}
    </div>
  );
}

const FIT_LOOK: Record<FitStatus, { label: string; Icon: typeof CheckCircle2; className: string }> = {
  pass: { label: "Fits", Icon: CheckCircle2, className: "text-condition-good" },
  warn: { label: "Check", Icon: AlertTriangle, className: "text-condition-watch" },
  fail: { label: "Does not match", Icon: XCircle, className: "text-condition-replace" },
};

export function SizeDecoded({ size, placard, winter }: { size: string; placard: string | null | undefined; winter: boolean }) {
  const p = parseTireSize(size);
  if (!p.ok) return <p className="text-sm text-condition-replace">{p.error}</p>;
  const s = p.size;
  const li = s.loadIndex !== null ? loadIndexKg(s.loadIndex) : null;
  const sp = s.speedSymbol !== null ? speedSymbolKmh(s.speedSymbol) : null;
  const dia = overallDiameter(s);
  const fit = placard ? checkFit(s, placard, { winter }) : null;
  return (
    <div className="space-y-2 text-sm" data-testid="size-decoded">
      <dl className="grid grid-cols-3 gap-2 rounded border border-asphalt-200 bg-asphalt-50 p-2">
        <div>
          <dt className="text-xs text-asphalt-600">Load per tire</dt>
          <dd className="font-semibold">{li?.ok ? `${li.kg} kg (${li.loadIndex})` : "not given"}</dd>
        </div>
        <div>
          <dt className="text-xs text-asphalt-600">Top speed</dt>
          <dd className="font-semibold">{sp?.ok ? `${sp.orAbove ? "over " : ""}${sp.kmh} km/h (${sp.symbol})` : "not given"}</dd>
        </div>
        <div>
          <dt className="text-xs text-asphalt-600">Diameter</dt>
          <dd className="font-semibold">{dia.ok ? `${Math.round(dia.mm)} mm` : "—"}</dd>
        </div>
      </dl>
      {fit && fit.ok ? (
        <div aria-live="polite">
          <p className="font-semibold">
            Against the placard size {placard}:{" "}
            <span className={FIT_LOOK[fit.status].className}>{FIT_LOOK[fit.status].label}</span>
          </p>
          <ul className="mt-1 space-y-1">
            {fit.checks.map((c) => {
              const { Icon, className, label } = FIT_LOOK[c.status];
              return (
                <li key={c.aspect + c.reason} className="flex gap-2">
                  <Icon aria-hidden className={`mt-0.5 size-4 shrink-0 ${className}`} />
                  <span>
                    <span className="sr-only">{label}: </span>
                    {c.reason}
                  </span>
                </li>
              );
            })}
          </ul>
        </div>
      ) : placard === null ? (
        <p className="text-xs text-asphalt-600">Add the placard size to the vehicle to check the fit.</p>
      ) : null}
    </div>
  );
}
