"use client";
// A service entry (rotation, balancing, repair…): a driver's new one on the
// vehicle page, or a saved one changed (by the driver, or by a shop under the
// pass that recorded it) through `edit`.
import { FormActions } from "@/components/ui/form-actions";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, type Path, type Resolver } from "react-hook-form";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { toast } from "@/components/ui/toast";
import { useFormat } from "@/components/format/format-provider";
import { SERVICE_KIND_LABELS, SERVICE_KINDS, todayIso } from "@/lib/validation/labels";
import { api, ApiError, keys } from "./api";

export type ServiceFormValues = Values;
const newResolver = lazyZodResolver(() => import("@/lib/validation/logbook").then((m) => m.serviceEntrySchema));
const updateResolver = lazyZodResolver(() => import("@/lib/validation/logbook").then((m) => m.serviceEntryUpdateSchema));
type Values = { kind: (typeof SERVICE_KINDS)[number]; setId: string; performedOn: string; odometer: string; odometerUnit: "km" | "mi"; confirmLowerOdometer: boolean; cost: string; notes: string };

export function ServiceEntryForm({
  vehicleId,
  sets,
  odometerUnit,
  edit,
  startOpen = false,
}: {
  vehicleId: string;
  sets: { id: string; name: string }[];
  odometerUnit: "km" | "mi";
  /** Changing a saved entry: its values, the address it is PATCHed to, and what happens after. */
  edit?: { url: string; values: Values; onDone: () => void; onCancel: () => void };
  /** Shown opened (its button was pressed before its code loaded: lazy-forms.tsx). */
  startOpen?: boolean;
}) {
  const queryClient = useQueryClient();
  const f = useFormat();
  const [open, setOpen] = useState(!!edit || startOpen);
  const form = useForm<Values>({
    resolver: (edit ? updateResolver : newResolver) as unknown as Resolver<Values>,
    defaultValues: edit?.values ?? { kind: "rotation", setId: sets[0]?.id ?? "", performedOn: todayIso(), odometer: "", odometerUnit, confirmLowerOdometer: false, cost: "", notes: "" },
  });
  const save = useMutation({
    mutationFn: (v: unknown) => api(edit?.url ?? `/api/vehicles/${vehicleId}/service-entries`, { method: edit ? "PATCH" : "POST", body: v }),
    onSuccess: async (_data, v) => {
      await queryClient.invalidateQueries({ queryKey: keys.vehicle(vehicleId) });
      if (edit) {
        const values = v as Values;
        toast.success(`${SERVICE_KIND_LABELS[values.kind]} of ${f.date(values.performedOn || edit.values.performedOn)} is changed.`);
        edit.onDone();
        return;
      }
      setOpen(false);
      form.reset();
    },
    onError: (e) => {
      if (e instanceof ApiError) for (const [k, m] of Object.entries(e.fields)) form.setError(k as Path<Values>, { message: m[0] });
    },
  });
  const err = save.error instanceof ApiError ? save.error : null;
  const e = (k: keyof Values) => form.formState.errors[k]?.message;
  if (!open) {
    return (
      <Button type="button" variant="secondary" size="sm" onClick={() => setOpen(true)}>
        Add a service entry
      </Button>
    );
  }
  return (
    <form noValidate className="space-y-3 rounded border border-asphalt-200 bg-white p-3" onSubmit={form.handleSubmit((v) => save.mutate(v))}>
      {err ? <Alert tone="error">{err.message}</Alert> : null}
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Work done" error={e("kind")}>
          {({ id }) => (
            <Select id={id} {...form.register("kind")}>
              {SERVICE_KINDS.map((k) => (
                <option key={k} value={k}>
                  {SERVICE_KIND_LABELS[k]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Set" error={e("setId")}>
          {({ id }) => (
            <Select id={id} {...form.register("setId")}>
              <option value="">No particular set</option>
              {sets.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Date" error={e("performedOn")}>
          {({ id, describedBy, invalid }) => <Input id={id} type="date" max={todayIso()} aria-describedby={describedBy} aria-invalid={invalid} {...form.register("performedOn")} />}
        </Field>
        <Field label={`Odometer (${odometerUnit}, optional)`} error={e("odometer")}>
          {({ id, describedBy, invalid }) => <Input id={id} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} {...form.register("odometer")} />}
        </Field>
        <Field label="Cost (optional)" error={e("cost")}>
          {({ id, describedBy, invalid }) => <Input id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} {...form.register("cost")} />}
        </Field>
      </div>
      {err?.code === "conflict" ? (
        <label className="flex min-h-11 items-center gap-2 text-sm">
          <input type="checkbox" className="size-5" {...form.register("confirmLowerOdometer")} /> The lower odometer reading is right
        </label>
      ) : null}
      <Field label="Notes (optional)" error={e("notes")}>
        {({ id, describedBy }) => <Textarea id={id} aria-describedby={describedBy} {...form.register("notes")} />}
      </Field>
      <FormActions pending={save.isPending} submitLabel={edit ? "Save the changes" : "Save the entry"} pendingLabel="Saving…" onCancel={edit ? edit.onCancel : () => setOpen(false)} />
    </form>
  );
}
