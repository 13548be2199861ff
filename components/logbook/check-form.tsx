"use client";
// Recording a tread check: inner / centre / outer per tire in mm or 32nds,
// or what a coin showed (saved as an approximate depth), with pressure and
// odometer. A depth outside 0–20 mm is refused; a lower odometer asks first.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch, type Path, type Resolver } from "react-hook-form";
import { toast } from "@/components/ui/toast";
import { Alert } from "@/components/ui/alert";
import { FormActions } from "@/components/ui/form-actions";
import { Button } from "@/components/ui/button";
import { Card, CardTitle } from "@/components/ui/card";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { SafetyNote } from "@/components/ui/safety-note";
import { COIN_RESULTS, coinLabel } from "@/lib/tires/coin";
import type { CoinResult } from "@/lib/tires";
import { distanceToKm, type DepthUnit, type PressureUnit } from "@/lib/units";
import { POSITION_LABELS, todayIso, type PositionValue } from "@/lib/validation/labels";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { api, ApiError, keys } from "./api";
import { useInvalidate } from "./use-invalidate";
import { setTitle } from "./format";
import { useFormat } from "@/components/format/format-provider";

const resolver = lazyZodResolver(() => import("@/lib/validation/logbook").then((m) => m.treadCheckSchema));

export type CheckSetChoice = {
  id: string;
  label: string | null;
  kind: "summer" | "all_season" | "all_weather" | "winter";
  size: string;
  state: "mounted" | "stored" | "retired";
  tires: { id: string; position: PositionValue }[];
};

type Reading = { tireId: string; inner: string; centre: string; outer: string; coin: "" | CoinResult; pressure: string };
export type CheckFormValues = Values;
type Values = {
  setId: string;
  checkedOn: string;
  odometer: string;
  odometerUnit: "km" | "mi";
  confirmLowerOdometer: boolean;
  confirmUnusualDepth: boolean;
  method: "gauge" | "coin";
  depthUnit: DepthUnit;
  pressureUnit: PressureUnit;
  notes: string;
  readings: Reading[];
};

const blankReadings = (set: CheckSetChoice | undefined): Reading[] =>
  (set?.tires ?? []).map((t) => ({ tireId: t.id, inner: "", centre: "", outer: "", coin: "", pressure: "" }));

export function CheckForm({
  vehicle,
  sets,
  lastOdometer,
  depthUnit,
  pressureUnit,
  preselect,
  edit,
}: {
  vehicle: { id: string; nickname: string; odometerUnit: "km" | "mi" };
  sets: CheckSetChoice[];
  lastOdometer: { odometerKm: number; date: string } | null;
  depthUnit: DepthUnit;
  pressureUnit: PressureUnit;
  preselect?: string;
  /**
   * Changing a saved check (components/logbook/edit-entry.tsx): its values,
   * the address it is PATCHed to (the driver's, or a pass route), and what
   * happens after. The server asks about a lower odometer or unusual depth
   * as it does for a new check.
   */
  edit?: { url: string; values: Values; onDone: () => void; onCancel: () => void };
}) {
  const f = useFormat();
  const router = useRouter();
  const invalidate = useInvalidate();
  const [error, setError] = useState<string | null>(null);
  const first = sets.find((s) => s.id === preselect) ?? sets.find((s) => s.state === "mounted") ?? sets[0];
  const form = useForm<Values>({
    resolver: resolver as unknown as Resolver<Values>,
    mode: "onTouched",
    defaultValues: edit?.values ?? {
      setId: first?.id ?? "",
      checkedOn: todayIso(),
      odometer: "",
      odometerUnit: vehicle.odometerUnit,
      confirmLowerOdometer: false,
      confirmUnusualDepth: false,
      method: "gauge",
      depthUnit,
      pressureUnit,
      notes: "",
      readings: blankReadings(first),
    },
  });
  const { register, control, formState, setValue } = form;
  const w = useWatch({ control });
  const set = sets.find((s) => s.id === w.setId);
  const err = (name: string) => {
    let e: unknown = formState.errors;
    for (const p of name.split(".")) e = (e as Record<string, unknown> | undefined)?.[p];
    return (e as { message?: string } | undefined)?.message;
  };
  const odoKm = w.odometer && Number.isFinite(Number(w.odometer)) ? distanceToKm(Number(w.odometer), vehicle.odometerUnit) : null;
  const lower = odoKm !== null && lastOdometer !== null && odoKm < lastOdometer.odometerKm - 0.5;
  const unitText = w.depthUnit === "32nds" ? "32nds" : "mm";

  if (sets.length === 0) {
    return <Alert tone="info">This vehicle has no tire set yet. Log a purchase first, then record checks.</Alert>;
  }

  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(
        async (values) => {
          setError(null);
          try {
            await api(edit?.url ?? `/api/vehicles/${vehicle.id}/checks`, { method: edit ? "PATCH" : "POST", body: values });
            await invalidate(keys.vehicle(vehicle.id), keys.set(values.setId), ...(edit ? [keys.set(edit.values.setId)] : []));
            if (edit) {
              toast.success(`The tread check of ${f.date(values.checkedOn)} is changed.`);
              edit.onDone();
              return;
            }
            router.push(`/sets/${values.setId}?saved=check`);
            router.refresh();
          } catch (e) {
            if (e instanceof ApiError) {
              for (const [k, m] of Object.entries(e.fields)) form.setError(k as Path<Values>, { message: m[0] });
              setError(`${e.message}${e.code === "conflict" ? "" : " Nothing was saved."}`);
            } else setError("Something went wrong. Nothing was saved.");
          }
        },
        () => setError("Some readings need attention: they are marked below."),
      )}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
      <Card className="space-y-3">
        <CardTitle>When and which set</CardTitle>
        <div className="grid gap-3 sm:grid-cols-2">
          <Field label="Set" className="sm:col-span-2" error={err("setId")}>
            {({ id, describedBy, invalid }) => (
              <Select
                id={id}
                aria-describedby={describedBy}
                aria-invalid={invalid}
                {...register("setId", { onChange: (e: { target: { value: string } }) => setValue("readings", blankReadings(sets.find((s) => s.id === e.target.value))) })}
              >
                {sets.map((s) => (
                  <option key={s.id} value={s.id}>
                    {setTitle(s)} ({s.state === "mounted" ? "on the car" : s.state === "retired" ? "retired" : "stored"})
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Field label="Date" error={err("checkedOn")}>
            {({ id, describedBy, invalid }) => <Input id={id} type="date" max={todayIso()} aria-describedby={describedBy} aria-invalid={invalid} {...register("checkedOn")} />}
          </Field>
          <Field
            label={`Odometer (${vehicle.odometerUnit})`}
            hint={lastOdometer ? `Last: ${f.distance(lastOdometer.odometerKm, vehicle.odometerUnit)}` : undefined}
            error={err("odometer")}
          >
            {({ id, describedBy, invalid }) => <Input id={id} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} {...register("odometer")} />}
          </Field>
        </div>
        {lower || err("odometer") ? (
          <label className="flex min-h-11 items-center gap-2 rounded border border-condition-watch/40 bg-condition-watch-bg p-2 text-sm">
            <input type="checkbox" className="size-5" {...register("confirmLowerOdometer")} />
            This is lower than the last reading. Save it anyway (the odometer was replaced, or the earlier reading was wrong).
          </label>
        ) : null}
        <fieldset>
          <legend className="mb-1 text-sm font-semibold text-asphalt-800">How you measured</legend>
          <div className="grid grid-cols-2 gap-2">
            <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
              <input type="radio" value="gauge" className="size-4 accent-groove-700" {...register("method")} /> Depth gauge
            </label>
            <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
              <input type="radio" value="coin" className="size-4 accent-groove-700" {...register("method")} /> A coin
            </label>
          </div>
        </fieldset>
        {w.method === "gauge" ? (
          <div className="grid grid-cols-2 gap-3">
            <Field label="Depth in">
              {({ id }) => (
                <Select id={id} {...register("depthUnit")}>
                  <option value="mm">millimetres</option>
                  <option value="32nds">32nds of an inch</option>
                </Select>
              )}
            </Field>
            <Field label="Pressure in">
              {({ id }) => (
                <Select id={id} {...register("pressureUnit")}>
                  <option value="kpa">kPa</option>
                  <option value="psi">psi</option>
                  <option value="bar">bar</option>
                </Select>
              )}
            </Field>
          </div>
        ) : (
          <p className="text-sm text-asphalt-700">
            Push a coin head first into the main groove. A coin only tells a range, so the logbook keeps the lower edge of it and marks the reading as approximate.
          </p>
        )}
      </Card>

      <ol className="space-y-3">
        {(w.readings ?? []).map((r, i) => {
          const tire = set?.tires.find((t) => t.id === r.tireId);
          const name = tire ? POSITION_LABELS[tire.position] : `Tire ${i + 1}`;
          return (
            <li key={r.tireId}>
              <Card className="space-y-2">
                <fieldset>
                  <legend className="text-base font-bold">{name}</legend>
                  {w.method === "coin" ? (
                    <div className="mt-2 space-y-2">
                      {COIN_RESULTS.map((c) => (
                        <label key={c} className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 text-sm has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
                          <input type="radio" value={c} className="size-4 accent-groove-700" {...register(`readings.${i}.coin`)} /> {coinLabel(c)}
                        </label>
                      ))}
                      {err(`readings.${i}.coin`) ? <p className="text-sm font-semibold text-condition-replace">{err(`readings.${i}.coin`)}</p> : null}
                    </div>
                  ) : (
                    <div className="mt-2 grid grid-cols-3 gap-2">
                      {(["inner", "centre", "outer"] as const).map((g) => (
                        <Field key={g} label={`${g === "inner" ? "Inner" : g === "centre" ? "Centre" : "Outer"} (${unitText})`} error={err(`readings.${i}.${g}`)}>
                          {({ id, describedBy, invalid }) => <Input id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} {...register(`readings.${i}.${g}`)} />}
                        </Field>
                      ))}
                    </div>
                  )}
                  <Field label={`Pressure (${w.pressureUnit === "psi" ? "psi" : w.pressureUnit === "bar" ? "bar" : "kPa"}, optional)`} className="mt-2 sm:w-1/3" error={err(`readings.${i}.pressure`)}>
                    {({ id, describedBy, invalid }) => <Input id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} {...register(`readings.${i}.pressure`)} />}
                  </Field>
                </fieldset>
              </Card>
            </li>
          );
        })}
      </ol>
      <Field label="Notes (optional)" error={err("notes")}>
        {({ id, describedBy }) => <Textarea id={id} aria-describedby={describedBy} {...register("notes")} />}
      </Field>
      <SafetyNote compact />
      {err("confirmUnusualDepth") || w.confirmUnusualDepth ? (
        <label className="flex min-h-11 items-center gap-2 rounded border border-condition-watch/40 bg-condition-watch-bg p-2 text-sm">
          <input type="checkbox" className="size-5" {...register("confirmUnusualDepth")} />
          The readings marked above are right. Save them anyway.
        </label>
      ) : null}
      {edit ? (
        <FormActions pending={formState.isSubmitting} submitLabel="Save the changes" pendingLabel="Saving the changes…" onCancel={edit.onCancel} />
      ) : (
        <div className="sticky bottom-0 -mx-4 border-t border-asphalt-200 bg-white/95 px-4 py-3 backdrop-blur sm:static sm:mx-0 sm:border-0 sm:bg-transparent sm:p-0">
          <Button type="submit" size="lg" className="w-full sm:w-auto" pending={formState.isSubmitting} pendingLabel="Saving the check…">
            Save the check
          </Button>
        </div>
      )}
    </form>
  );
}
