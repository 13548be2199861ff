"use client";
// A set's tires: position, DOT week, age, depth and condition, as a list
// that reads on a phone and as a grid on a desktop.
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useId, useState } from "react";
import { toast } from "@/components/ui/toast";
import { Alert } from "@/components/ui/alert";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Button } from "@/components/ui/button";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { TireTreadProfile } from "@/components/visual/tread-profile";
import { Field, Input, Select } from "@/components/ui/field";
import { FormActions } from "@/components/ui/form-actions";
import type { SetKind } from "@/lib/tires";
import type { TireView } from "@/db/queries/logbook-view";
import type { DepthUnit } from "@/lib/units";
import { POSITION_LABELS, POSITIONS, type PositionValue } from "@/lib/validation/labels";
import { api, ApiError, keys } from "./api";
import { DotPreview } from "./live-decode";
import { useFormat } from "@/components/format/format-provider";

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

function TireEditor({ tire, edit }: { tire: TireView; edit: { vehicleId: string; setId: string; kind: SetKind } }) {
  const queryClient = useQueryClient();
  const f = useFormat();
  const id = useId();
  const [open, setOpen] = useState(false);
  const [code, setCode] = useState(tire.dotCode ?? "");
  const [position, setPosition] = useState<PositionValue>(tire.position);
  const save = useMutation({
    mutationFn: () => api(`/api/tires/${tire.id}`, { method: "PATCH", body: { dotCode: code, position } }),
    onSuccess: async () => {
      setOpen(false);
      toast.success(`${POSITION_LABELS[position]}: saved.`);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: keys.vehicle(edit.vehicleId) }),
        queryClient.invalidateQueries({ queryKey: keys.set(edit.setId) }),
        queryClient.invalidateQueries({ queryKey: keys.overview }),
      ]);
    },
  });
  const err = save.error instanceof ApiError ? save.error : null;
  if (!open) {
    return (
      <Button type="button" size="sm" variant="secondary" className="mt-2" onClick={() => setOpen(true)}>
        {tire.dotCode ? "Correct the DOT code or position" : "Add the DOT code"}
        <span className="sr-only"> of the {POSITION_LABELS[tire.position].toLowerCase()} tire</span>
      </Button>
    );
  }
  return (
    <form
      className="mt-2 space-y-2 rounded border border-groove-200 bg-groove-50 p-2"
      aria-label={`Edit the ${POSITION_LABELS[tire.position].toLowerCase()} tire`}
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
      }}
    >
      {err && !Object.keys(err.fields).length ? <Alert tone="error">{err.message}</Alert> : null}
      <Field label="DOT code" error={err?.fields.dotCode}>
        {({ id: inputId, describedBy, invalid }) => (
          <Input id={inputId} aria-describedby={`${describedBy ?? ""} ${id}-dot`.trim()} aria-invalid={invalid} value={code} onChange={(e) => setCode(e.target.value)} autoComplete="off" className="font-mono" />
        )}
      </Field>
      <DotPreview id={`${id}-dot`} code={code} kind={edit.kind} />
      <Field label="Position" hint="A position another tire holds swaps the two." error={err?.fields.position}>
        {({ id: inputId, describedBy }) => (
          <Select id={inputId} aria-describedby={describedBy} value={position} onChange={(e) => setPosition(e.target.value as PositionValue)}>
            {POSITIONS.map((p) => (
              <option key={p} value={p}>
                {POSITION_LABELS[p]}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <FormActions pending={save.isPending} submitLabel="Save the tire" onCancel={() => setOpen(false)} />
      <div className="border-t border-groove-200 pt-2">
        <ConfirmDialog
          trigger={
            <Button type="button" size="sm" variant="ghost">
              Delete this tire<span className="sr-only"> ({POSITION_LABELS[tire.position].toLowerCase()})</span>
            </Button>
          }
          title={`Delete the ${POSITION_LABELS[tire.position].toLowerCase()} tire?`}
          description={
            <>
              <p>
                The tire{tire.dotCode ? ` ${tire.dotCode}` : ""} leaves the set, and its{" "}
                {f.count(tire.series.length, { one: "tread reading goes", other: "tread readings go" })} with it, out of the wear chart and the
                projections. A tread check that measured only this tire is deleted too.
              </p>
              <p className="mt-2">The set&apos;s other tires, their readings and the service history stay. This cannot be undone.</p>
            </>
          }
          confirmLabel="Delete the tire and its readings"
          onConfirm={async () => {
            await api(`/api/tires/${tire.id}`, { method: "DELETE" });
            toast.success(`The ${POSITION_LABELS[tire.position].toLowerCase()} tire is deleted.`);
            await Promise.all([
              queryClient.invalidateQueries({ queryKey: keys.vehicle(edit.vehicleId) }),
              queryClient.invalidateQueries({ queryKey: keys.set(edit.setId) }),
              queryClient.invalidateQueries({ queryKey: keys.overview }),
            ]);
          }}
        />
      </div>
    </form>
  );
}
