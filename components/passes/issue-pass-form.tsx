"use client";
// The driver gives a shop a pass: which vehicles, which shop (from the
// directory), what the shop may do, for how long, and a note.
import { Search } from "lucide-react";
import { useRouter } from "next/navigation";
import { useEffect, useId, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { cn } from "@/lib/cn";
import { MAX_PASS_DAYS, PASS_PRESETS, SCOPE_LABEL } from "@/lib/validation/pass-labels";
import type { issuePassSchema } from "@/lib/validation/passes";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { sendJson } from "./api";

const resolver = lazyZodResolver(() => import("@/lib/validation/passes").then((m) => m.issuePassSchema));

type Vehicle = { id: string; nickname: string; make: string; model: string; year: number | null };
type Shop = { id: string; name: string; town: string; address: string | null };

type FormIn = z.input<typeof issuePassSchema>;
type FormOut = z.output<typeof issuePassSchema>;

export function IssuePassForm({ vehicles }: { vehicles: Vehicle[] }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver,
    defaultValues: { vehicleIds: vehicles.length === 1 ? [vehicles[0].id] : [], scope: "view_add", duration: "8h", shopId: "", note: "" },
  });
  const errors = form.formState.errors;
  const duration = useWatch({ control: form.control, name: "duration" });
  const shopId = useWatch({ control: form.control, name: "shopId" });
  const groupId = useId();

  return (
    <form
      noValidate
      className="space-y-5"
      onSubmit={form.handleSubmit(async (values) => {
        setError(null);
        setDone(null);
        const res = await sendJson<{ pass: { id: string } }>("/api/passes", { body: values });
        if (!res.ok) {
          setError(res.message);
          for (const [k, v] of Object.entries(res.fields ?? {})) form.setError(k as keyof FormIn, { message: v[0] });
          return;
        }
        setDone("The pass is on its way: the shop's staff got an e-mail, and the pass ends by itself.");
        form.reset({ ...values, note: "" });
        router.refresh();
      })}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
      {done ? <Alert tone="success">{done}</Alert> : null}

      <fieldset className="space-y-2" aria-describedby={errors.vehicleIds ? `${groupId}-v` : undefined}>
        <legend className="text-sm font-semibold text-asphalt-800">Vehicles the shop may open</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {vehicles.map((v) => (
            <label key={v.id} className="flex min-h-12 cursor-pointer items-center gap-3 rounded border border-asphalt-300 bg-white px-3 py-2 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
              <input type="checkbox" value={v.id} className="size-5 accent-groove-700" {...form.register("vehicleIds")} />
              <span>
                <span className="block font-semibold">{v.nickname}</span>
                <span className="block text-sm text-asphalt-600">
                  {[v.year, v.make, v.model].filter(Boolean).join(" ")}
                </span>
              </span>
            </label>
          ))}
        </div>
        {errors.vehicleIds ? (
          <p id={`${groupId}-v`} className="text-sm font-semibold text-condition-replace">
            {errors.vehicleIds.message ?? errors.vehicleIds.root?.message ?? "Choose at least one vehicle."}
          </p>
        ) : null}
      </fieldset>

      <ShopPicker value={shopId} onChange={(id) => form.setValue("shopId", id, { shouldValidate: form.formState.isSubmitted })} error={errors.shopId?.message} />

      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold text-asphalt-800">What the shop may do</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {(["view", "view_add"] as const).map((s) => (
            <label key={s} className="flex min-h-12 cursor-pointer items-start gap-3 rounded border border-asphalt-300 bg-white px-3 py-2 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
              <input type="radio" value={s} className="mt-1 size-5 accent-groove-700" {...form.register("scope")} />
              <span>
                <span className="block font-semibold">{SCOPE_LABEL[s]}</span>
                <span className="block text-sm text-asphalt-600">
                  {s === "view" ? "Sees sets, DOT codes, checks and history." : "Also records tread checks, work done and sets it fits."}
                </span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>

      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="How long" error={errors.duration?.message}>
          {({ id, describedBy, invalid }) => (
            <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} {...form.register("duration")}>
              {PASS_PRESETS.map((p) => (
                <option key={p.value} value={p.value}>
                  {p.label}
                </option>
              ))}
              <option value="custom">Custom, up to {MAX_PASS_DAYS} days</option>
            </Select>
          )}
        </Field>
        {duration === "custom" ? (
          <Field label="Days" hint={`1 to ${MAX_PASS_DAYS}`} error={errors.customDays?.message}>
            {({ id, describedBy, invalid }) => (
              <Input id={id} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} {...form.register("customDays")} />
            )}
          </Field>
        ) : null}
      </div>

      <Field label="Note for the shop (optional)" hint="For example what you noticed, or that the winter set is in their storage." error={errors.note?.message}>
        {({ id, describedBy, invalid }) => <Textarea id={id} aria-describedby={describedBy} aria-invalid={invalid} maxLength={500} {...form.register("note")} />}
      </Field>

      <Button type="submit" size="lg" className="w-full sm:w-auto" pending={form.formState.isSubmitting} pendingLabel="Giving the pass…">
        Give the pass
      </Button>
    </form>
  );
}

/** The directory: type a name or a town, pick one shop. */
function ShopPicker({ value, onChange, error }: { value: string; onChange: (id: string) => void; error?: string }) {
  const [q, setQ] = useState("");
  const [shops, setShops] = useState<Shop[] | null>(null);
  const [failed, setFailed] = useState(false);
  const id = useId();
  useEffect(() => {
    const ctrl = new AbortController();
    const t = setTimeout(async () => {
      try {
        const res = await fetch(`/api/shops?q=${encodeURIComponent(q)}`, { signal: ctrl.signal });
        const json = (await res.json()) as { shops: Shop[] };
        setShops(json.shops ?? []);
        setFailed(false);
      } catch (e) {
        if ((e as Error).name !== "AbortError") setFailed(true);
      }
    }, 200);
    return () => {
      clearTimeout(t);
      ctrl.abort();
    };
  }, [q]);
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold text-asphalt-800">Shop</legend>
      <div className="relative">
        <Search aria-hidden className="pointer-events-none absolute left-3 top-3.5 size-4 text-asphalt-500" />
        <label htmlFor={`${id}-q`} className="sr-only">
          Find a shop by name or town
        </label>
        <Input id={`${id}-q`} type="search" placeholder="Find a shop by name or town" className="pl-9" value={q} onChange={(e) => setQ(e.target.value)} />
      </div>
      {failed ? <p className="text-sm text-condition-replace">The directory could not be loaded. Try again.</p> : null}
      {shops && shops.length === 0 ? <p className="text-sm text-asphalt-600">No shop matches “{q}”.</p> : null}
      <div className="grid gap-2 sm:grid-cols-2" role="radiogroup" aria-label="Shops found">
        {(shops ?? []).map((s) => (
          <label
            key={s.id}
            className={cn(
              "flex min-h-12 cursor-pointer items-start gap-3 rounded border bg-white px-3 py-2",
              value === s.id ? "border-groove-700 bg-groove-50" : "border-asphalt-300",
            )}
          >
            <input type="radio" name={`${id}-shop`} value={s.id} checked={value === s.id} onChange={() => onChange(s.id)} className="mt-1 size-5 accent-groove-700" />
            <span>
              <span className="block font-semibold">{s.name}</span>
              <span className="block text-sm text-asphalt-600">{s.address ?? s.town}</span>
            </span>
          </label>
        ))}
      </div>
      {error ? <p className="text-sm font-semibold text-condition-replace">{error}</p> : null}
    </fieldset>
  );
}
