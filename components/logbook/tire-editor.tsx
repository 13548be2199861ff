"use client";
// Correcting one tire's DOT code and position in place, or deleting the tire:
// opened from the tire list, its code loaded on opening (lazy-forms.tsx).
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useId, useState } from "react";
import { toast } from "@/components/ui/toast";
import { Alert } from "@/components/ui/alert";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { FormActions } from "@/components/ui/form-actions";
import type { SetKind } from "@/lib/tires";
import type { TireView } from "@/db/queries/logbook-view";
import { POSITION_LABELS, POSITIONS, type PositionValue } from "@/lib/validation/labels";
import { api, ApiError, keys } from "./api";
import { DotPreview } from "./live-decode";
import { useFormat } from "@/components/format/format-provider";

/** `startOpen`: shown opened (its button was pressed before its code loaded). */
export function TireEditor({ tire, edit, startOpen = false }: { tire: TireView; edit: { vehicleId: string; setId: string; kind: SetKind }; startOpen?: boolean }) {
  const queryClient = useQueryClient();
  const f = useFormat();
  const id = useId();
  const [open, setOpen] = useState(startOpen);
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
            ]);
          }}
        />
      </div>
    </form>
  );
}
