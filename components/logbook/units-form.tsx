"use client";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { ActionResult } from "@/lib/actions";
import type { UnitsInput } from "@/lib/validation/logbook";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";

const resolver = lazyZodResolver(() => import("@/lib/validation/logbook").then((m) => m.unitsSchema));

export function UnitsForm({ initial, save }: { initial: UnitsInput; save: (v: UnitsInput) => Promise<ActionResult<UnitsInput>> }) {
  const [result, setResult] = useState<ActionResult<UnitsInput> | null>(null);
  const form = useForm<UnitsInput>({ resolver: resolver as unknown as Resolver<UnitsInput>, defaultValues: initial });
  const { register, formState } = form;
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async (v) => {
        const r = await save(v);
        setResult(r);
      })}
    >
      {result?.status === "ok" ? <Alert tone="success">Saved. Depths, distances and pressures now show in these units.</Alert> : null}
      {result?.status === "error" ? <Alert tone="error">{result.message}</Alert> : null}
      <fieldset>
        <legend className="mb-1 text-sm font-semibold">Depths and distances</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
            <input type="radio" value="metric" className="size-4 accent-groove-700" {...register("units")} /> Metric: mm and km
          </label>
          <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
            <input type="radio" value="imperial" className="size-4 accent-groove-700" {...register("units")} /> Imperial: 32nds of an inch and miles
          </label>
        </div>
        {formState.errors.units ? <p className="text-sm font-semibold text-condition-replace">{formState.errors.units.message}</p> : null}
      </fieldset>
      <fieldset>
        <legend className="mb-1 text-sm font-semibold">Tire pressure</legend>
        <div className="grid grid-cols-3 gap-2">
          {(["kpa", "psi", "bar"] as const).map((u) => (
            <label key={u} className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
              <input type="radio" value={u} className="size-4 accent-groove-700" {...register("pressureUnit")} /> {u === "kpa" ? "kPa" : u}
            </label>
          ))}
        </div>
      </fieldset>
      <Button type="submit" pending={formState.isSubmitting} pendingLabel="Saving…">
        Save the units
      </Button>
    </form>
  );
}
