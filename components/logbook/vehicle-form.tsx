"use client";
// Adding (or changing) a vehicle: the same zod schema as the API.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch, type Path, type Resolver } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field, Input, Select } from "@/components/ui/field";
import { validateVin } from "@/lib/tires/vin";
import type { PressureUnit } from "@/lib/units";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { api, ApiError } from "./api";
import { SizePreview, preloadLiveDecode } from "./live-decode";

const resolver = lazyZodResolver(() => import("@/lib/validation/logbook").then((m) => m.vehicleSchema));

type Values = {
  nickname: string;
  make: string;
  model: string;
  year: string;
  vin: string;
  plate: string;
  placardFrontSize: string;
  placardRearSize: string;
  placardFrontPressure: string;
  placardRearPressure: string;
  pressureUnit: PressureUnit;
  odometerUnit: "km" | "mi";
};

export type VehicleFormValues = Values;

/** With `existing`, the form changes that vehicle (PATCH) instead of adding one. */
export function VehicleForm({
  pressureUnit,
  odometerUnit,
  then,
  existing,
}: {
  pressureUnit: PressureUnit;
  odometerUnit: "km" | "mi";
  then?: "log-purchase";
  existing?: { id: string; values: Partial<Values> };
}) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const form = useForm<Values>({
    resolver: resolver as unknown as Resolver<Values>,
    mode: "onTouched",
    defaultValues: { nickname: "", make: "", model: "", year: "", vin: "", plate: "", placardFrontSize: "", placardRearSize: "", placardFrontPressure: "", placardRearPressure: "", pressureUnit, odometerUnit, ...existing?.values },
  });
  const { register, formState } = form;
  const w = useWatch({ control: form.control });
  const e = (k: keyof Values) => formState.errors[k]?.message;
  const vinCheck = w.vin && w.vin.trim().length === 17 ? validateVin(w.vin) : null;

  const text = (name: keyof Values, label: string, opts: { hint?: string; inputMode?: "numeric" | "decimal"; autoComplete?: string; onFocus?: () => void } = {}) => (
    <Field label={label} hint={opts.hint} error={e(name)}>
      {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} inputMode={opts.inputMode} autoComplete={opts.autoComplete ?? "off"} onFocus={opts.onFocus} {...register(name)} />}
    </Field>
  );

  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async (values) => {
        setError(null);
        try {
          if (existing) {
            await api(`/api/vehicles/${existing.id}`, { method: "PATCH", body: values });
            router.push(`/vehicles/${existing.id}?saved=vehicle`);
            router.refresh();
            return;
          }
          const res = await api<{ vehicle: { id: string } }>("/api/vehicles", { body: values });
          router.push(then === "log-purchase" ? `/log-purchase?vehicle=${res.vehicle.id}` : `/vehicles/${res.vehicle.id}`);
          router.refresh();
        } catch (err) {
          if (err instanceof ApiError) {
            for (const [k, m] of Object.entries(err.fields)) form.setError(k as Path<Values>, { message: m[0] });
            setError(err.message);
          } else setError("Something went wrong. Nothing was saved.");
        }
      })}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
      <Card className="grid gap-3 sm:grid-cols-2">
        {text("nickname", "Name for the vehicle", { hint: "How you call it at home, for example “The blue one”." })}
        {text("make", "Make")}
        {text("model", "Model")}
        {text("year", "Year (optional)", { inputMode: "numeric" })}
        {text("plate", "Plate (optional)")}
        <div>
          {text("vin", "VIN (optional)", { hint: "17 letters and digits, on the registration document." })}
          {vinCheck?.ok && vinCheck.warnings.length ? <p className="mt-1 text-sm text-condition-watch">{vinCheck.warnings.join(" ")}</p> : null}
        </div>
      </Card>
      <Card className="grid gap-3 sm:grid-cols-2">
        <div>
          {text("placardFrontSize", "Placard tire size, front", { hint: "On the sticker in the driver's door frame.", onFocus: preloadLiveDecode })}
          {w.placardFrontSize ? <SizePreview size={w.placardFrontSize} placard={undefined} winter={false} /> : null}
        </div>
        {text("placardRearSize", "Placard tire size, rear (if different)")}
        <Field label="Pressure unit" error={e("pressureUnit")}>
          {({ id }) => (
            <Select id={id} {...register("pressureUnit")}>
              <option value="kpa">kPa</option>
              <option value="psi">psi</option>
              <option value="bar">bar</option>
            </Select>
          )}
        </Field>
        <Field label="Odometer shows" error={e("odometerUnit")}>
          {({ id }) => (
            <Select id={id} {...register("odometerUnit")}>
              <option value="km">kilometres</option>
              <option value="mi">miles</option>
            </Select>
          )}
        </Field>
        {text("placardFrontPressure", "Placard pressure, front", { inputMode: "decimal" })}
        {text("placardRearPressure", "Placard pressure, rear", { inputMode: "decimal" })}
      </Card>
      <Button type="submit" size="lg" className="w-full sm:w-auto" pending={formState.isSubmitting} pendingLabel="Saving the vehicle…">
        {existing ? "Save the changes" : "Save the vehicle"}
      </Button>
    </form>
  );
}
