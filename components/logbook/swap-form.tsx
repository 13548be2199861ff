"use client";
// A stored set put on the car (the seasonal swap), from its card on the
// vehicle page; loaded when "Put this set on the car" is pressed (lazy-forms.tsx).
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { FormActions } from "@/components/ui/form-actions";
import type { SetView } from "@/db/queries/logbook";
import { todayIso } from "@/lib/validation/labels";
import { api, ApiError, keys } from "./api";
import { setTitle } from "./format";

export function SwapForm({ set, vehicleId, mounted, startOpen = false }: { set: SetView; vehicleId: string; mounted: SetView | null; startOpen?: boolean }) {
  const queryClient = useQueryClient();
  const [open, setOpen] = useState(startOpen);
  const [storage, setStorage] = useState(set.storageLocation ?? "");
  const [date, setDate] = useState(todayIso());
  const [odometer, setOdometer] = useState("");
  const [confirmLower, setConfirmLower] = useState(false);
  const [storageError, setStorageError] = useState<string | null>(null);
  const swap = useMutation({
    mutationFn: () => api(`/api/vehicles/${vehicleId}/swap`, { body: { setId: set.id, storageLocation: storage, date, odometer, confirmLowerOdometer: confirmLower } }),
    onSuccess: async () => {
      setOpen(false);
      await queryClient.invalidateQueries({ queryKey: keys.vehicle(vehicleId) });
    },
  });
  const err = swap.error instanceof ApiError ? swap.error : null;
  if (!open) {
    return (
      <Button type="button" size="sm" onClick={() => setOpen(true)}>
        Put this set on the car
      </Button>
    );
  }
  return (
    <form
      className="w-full space-y-3 rounded border border-groove-200 bg-groove-50 p-3"
      onSubmit={(e) => {
        e.preventDefault();
        // The set coming off needs a place: said here, before the server is asked.
        if (!storage.trim()) {
          setStorageError(mounted ? `Say where ${setTitle(mounted)} will be kept.` : "Say where the set coming off is kept.");
          return;
        }
        setStorageError(null);
        swap.mutate();
      }}
    >
      <p className="font-semibold">Seasonal swap: {setTitle(set)} goes on the car{mounted ? `, ${setTitle(mounted)} comes off` : ""}.</p>
      {err ? <Alert tone="error">{err.message}</Alert> : null}
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label={mounted ? `Where ${setTitle(mounted)} will be kept` : "Where the set coming off is kept"} error={storageError ?? err?.fields.storageLocation}>
          {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} value={storage} onChange={(e) => setStorage(e.target.value)} />}
        </Field>
        <Field label="Date" error={err?.fields.date}>
          {({ id, describedBy, invalid }) => <Input id={id} type="date" max={todayIso()} aria-describedby={describedBy} aria-invalid={invalid} value={date} onChange={(e) => setDate(e.target.value)} />}
        </Field>
        <Field label="Odometer (optional)" error={err?.fields.odometer}>
          {({ id, describedBy, invalid }) => <Input id={id} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} value={odometer} onChange={(e) => setOdometer(e.target.value)} />}
        </Field>
      </div>
      {err?.code === "conflict" && err.fields.odometer ? (
        <label className="flex min-h-11 items-center gap-2">
          <input type="checkbox" className="size-5" checked={confirmLower} onChange={(e) => setConfirmLower(e.target.checked)} /> The lower reading is right
        </label>
      ) : null}
      <FormActions pending={swap.isPending} submitLabel="Save the swap" pendingLabel="Swapping…" onCancel={() => setOpen(false)} />
    </form>
  );
}
