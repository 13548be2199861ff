"use client";
// The set's own name, storage place and limits (overriding the defaults of
// the computation core), or retiring it.
import { FormActions } from "@/components/ui/form-actions";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, type Path, type Resolver } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import type { SetView } from "@/db/queries/logbook";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { api, ApiError, keys } from "./api";

const resolver = lazyZodResolver(() => import("@/lib/validation/logbook").then((m) => m.setUpdateSchema));

type Values = { label: string; seller: string; storageLocation: string; depthLimitMm: string; ageWatchYears: string; ageReplaceYears: string; retire: boolean };

const str = (v: number | string | null | undefined) => (v == null ? "" : String(v));

/** `startOpen`: shown opened (its button was pressed before its code loaded: lazy-forms.tsx). */
export function SetSettings({ set, vehicleId, startOpen = false }: { set: SetView; vehicleId: string; startOpen?: boolean }) {
  const queryClient = useQueryClient();
  const [open, setOpen] = useState(startOpen);
  const form = useForm<Values>({
    resolver: resolver as unknown as Resolver<Values>,
    defaultValues: {
      label: str(set.label),
      seller: str(set.seller),
      storageLocation: str(set.storageLocation),
      depthLimitMm: str(set.depthLimitMm),
      ageWatchYears: str(set.ageWatchYears),
      ageReplaceYears: str(set.ageReplaceYears),
      retire: false,
    },
  });
  const save = useMutation({
    mutationFn: (values: unknown) => api(`/api/sets/${set.id}`, { method: "PATCH", body: values }),
    onSuccess: async () => {
      setOpen(false);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: keys.set(set.id) }),
        queryClient.invalidateQueries({ queryKey: keys.vehicle(vehicleId) }),
      ]);
    },
    onError: (e) => {
      if (e instanceof ApiError) for (const [k, m] of Object.entries(e.fields)) form.setError(k as Path<Values>, { message: m[0] });
    },
  });
  const e = (k: keyof Values) => form.formState.errors[k]?.message;
  if (!open) {
    return (
      <Button type="button" variant="secondary" size="sm" onClick={() => setOpen(true)}>
        Change the set&apos;s name or limits
      </Button>
    );
  }
  const text = (name: keyof Values, label: string, hint?: string) => (
    <Field label={label} hint={hint} error={e(name)}>
      {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} inputMode={name.endsWith("Mm") || name.endsWith("Years") ? "decimal" : undefined} {...form.register(name)} />}
    </Field>
  );
  return (
    <form noValidate className="space-y-3" onSubmit={form.handleSubmit((v) => save.mutate(v))}>
      {save.error ? <Alert tone="error">{save.error.message}</Alert> : null}
      {text("label", "Name of the set")}
      {text("seller", "Bought from")}
      {set.state === "stored" ? text("storageLocation", "Stored where") : null}
      {text("depthLimitMm", "Your own depth limit (mm)", "Empty: the limit where you drive. Never set it below the legal minimum.")}
      <div className="grid grid-cols-2 gap-2">
        {text("ageWatchYears", "Inspect yearly from (years)")}
        {text("ageReplaceYears", "Replace at (years)")}
      </div>
      {set.state !== "retired" ? (
        <label className="flex min-h-11 items-center gap-2 text-sm">
          <input type="checkbox" className="size-5" {...form.register("retire")} /> Retire this set (worn out, sold or thrown away)
        </label>
      ) : null}
      <FormActions pending={save.isPending} submitLabel="Save" pendingLabel="Saving…" onCancel={() => setOpen(false)} />
    </form>
  );
}
