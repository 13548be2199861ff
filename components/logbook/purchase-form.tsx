"use client";
// Logging a new tire purchase: one flow for a thumb on a phone. Everything
// typed stays in the form whatever the server answers; the set, its tires,
// the old set's fate and the fitting entry are saved in one request (one
// transaction), then the receipt and photos upload with a progress bar.
import { Paperclip, Trash2 } from "lucide-react";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { useForm, useWatch, type Path, type Resolver } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardTitle } from "@/components/ui/card";
import { Field, Input, Select } from "@/components/ui/field";
import { SafetyNote } from "@/components/ui/safety-note";
import type { SetKind } from "@/lib/tires";
import { depthUnitFor, distanceUnitFor, type UnitSystem } from "@/lib/units";
import {
  ATTACHMENT_MAX_BYTES,
  ATTACHMENT_TYPES,
  POSITION_LABELS,
  SET_KIND_LABELS,
  SET_KIND_VALUES,
  todayIso,
  type PositionValue,
} from "@/lib/validation/labels";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { api, ApiError } from "./api";
import { uploadFile } from "./upload";
import { setTitle } from "./format";
import { useFormat } from "@/components/format/format-provider";
import { DotPreview, SizePreview, preloadLiveDecode } from "./live-decode";

const resolver = lazyZodResolver(() => import("@/lib/validation/logbook").then((m) => m.setPurchaseSchema));

export type VehicleChoice = {
  id: string;
  nickname: string;
  make: string;
  model: string;
  placardFrontSize: string | null;
  odometerUnit: "km" | "mi";
  mountedSet: { id: string; label: string | null; kind: (typeof SET_KIND_VALUES)[number]; size: string } | null;
};

type TireRow = { position: PositionValue; dotCode: string; newDepth: string };
type Values = {
  vehicleId: string;
  newNickname: string;
  newMake: string;
  newModel: string;
  newPlacard: string;
  label: string;
  kind: (typeof SET_KIND_VALUES)[number];
  size: string;
  purchasedOn: string;
  price: string;
  currency: string;
  seller: string;
  depthUnit: "mm" | "32nds";
  commonDepth: string;
  shareCode: boolean;
  withSpare: boolean;
  tires: TireRow[];
  odometer: string;
  odometerUnit: "km" | "mi";
  confirmLowerOdometer: boolean;
  mountNow: "yes" | "no";
  storageLocation: string;
  replacedFate: "" | "stored" | "retired";
  replacedStorage: string;
};

const FOUR: PositionValue[] = ["front_left", "front_right", "rear_left", "rear_right"];
const NEW = "__new__";
const coreKind = (k: Values["kind"]) => k.replace("_", "-") as SetKind;

type Upload = { file: File; kind: "receipt" | "photo"; progress: number; error?: string; done?: boolean };

export function PurchaseForm({ vehicles, units, preselect }: { vehicles: VehicleChoice[]; units: UnitSystem; preselect?: string }) {
  const f = useFormat();
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [uploads, setUploads] = useState<Upload[]>([]);
  const [phase, setPhase] = useState<"editing" | "saving" | "uploading">("editing");
  // A vehicle created inline is kept, so a retry after a failed save does not add it twice.
  const [createdVehicle, setCreatedVehicle] = useState<VehicleChoice | null>(null);
  const [savedSetId, setSavedSetId] = useState<string | null>(null);
  // Tires saved without a DOT code have no known age: the driver is told before saving, once.
  const [missingCodes, setMissingCodes] = useState<"unasked" | "asking" | "accepted">("unasked");
  // Each time the question is asked it takes the focus (and so comes into view), once drawn:
  // the form's check is asynchronous (its schema loads on the first one), so a frame's wait is not enough.
  const [asked, setAsked] = useState(0);
  useEffect(() => {
    if (asked) document.getElementById("missing-codes")?.focus();
  }, [asked]);
  const codesAccepted = useRef(false);

  const allVehicles = createdVehicle ? [...vehicles, createdVehicle] : vehicles;
  const initialVehicle = preselect && vehicles.some((v) => v.id === preselect) ? preselect : (vehicles[0]?.id ?? NEW);
  const depthUnit = depthUnitFor(units);
  const form = useForm<Values>({
    resolver: resolver as unknown as Resolver<Values>,
    mode: "onTouched",
    defaultValues: {
      vehicleId: initialVehicle,
      newNickname: "",
      newMake: "",
      newModel: "",
      newPlacard: "",
      label: "",
      kind: "summer",
      size: vehicles.find((v) => v.id === initialVehicle)?.placardFrontSize ?? "",
      purchasedOn: todayIso(),
      price: "",
      currency: "EUR",
      seller: "",
      depthUnit,
      commonDepth: depthUnit === "mm" ? "8" : "10",
      shareCode: false,
      withSpare: false,
      tires: FOUR.map((position) => ({ position, dotCode: "", newDepth: depthUnit === "mm" ? "8" : "10" })),
      odometer: "",
      odometerUnit: distanceUnitFor(units),
      confirmLowerOdometer: false,
      mountNow: "yes",
      storageLocation: "",
      replacedFate: "",
      replacedStorage: "",
    },
  });
  const { register, control, setValue, getValues, formState } = form;
  const w = useWatch({ control });
  const vehicleId = w.vehicleId ?? initialVehicle;
  const chosen = allVehicles.find((v) => v.id === vehicleId) ?? null;
  const isNew = vehicleId === NEW;
  const tires = w.tires ?? [];
  const kind = (w.kind ?? "summer") as Values["kind"];
  const replacing = !isNew && w.mountNow === "yes" ? chosen?.mountedSet : null;
  const err = (name: string) => {
    const parts = name.split(".");
    let e: unknown = formState.errors;
    for (const p of parts) e = (e as Record<string, unknown> | undefined)?.[p];
    return (e as { message?: string } | undefined)?.message;
  };

  const setShare = (share: boolean) => {
    setValue("shareCode", share);
    if (share) {
      const first = getValues("tires.0.dotCode");
      getValues("tires").forEach((_, i) => i > 0 && setValue(`tires.${i}.dotCode`, first, { shouldValidate: !!first }));
    }
  };
  const setSpare = (spare: boolean) => {
    setValue("withSpare", spare);
    const current = getValues("tires");
    if (spare && current.length === 4) {
      setValue("tires", [...current, { position: "spare", dotCode: getValues("shareCode") ? current[0].dotCode : "", newDepth: getValues("commonDepth") }]);
    } else if (!spare && current.length === 5) setValue("tires", current.slice(0, 4));
  };
  const setCommonDepth = (v: string) => {
    setValue("commonDepth", v);
    getValues("tires").forEach((_, i) => setValue(`tires.${i}.newDepth`, v));
  };

  const addFiles = (list: FileList | null, kindOf: "receipt" | "photo") => {
    if (!list) return;
    const next: Upload[] = [...list].map((file) => ({
      file,
      kind: kindOf,
      progress: 0,
      // Checked here for a quick answer; the server checks the content again.
      error:
        file.size === 0
          ? "This file is empty."
          : file.size > ATTACHMENT_MAX_BYTES
            ? "Larger than 10 MB: choose a smaller photo."
            : file.type && !(ATTACHMENT_TYPES as readonly string[]).includes(file.type)
              ? "Only JPEG, PNG, WebP or PDF."
              : undefined,
    }));
    setUploads((u) => [...u, ...next]);
  };

  async function ensureVehicle(): Promise<string | null> {
    if (!isNew) return vehicleId;
    if (createdVehicle) return createdVehicle.id;
    const body = { nickname: getValues("newNickname"), make: getValues("newMake"), model: getValues("newModel"), placardFrontSize: getValues("newPlacard"), odometerUnit: getValues("odometerUnit") };
    const { vehicleSchema } = await import("@/lib/validation/logbook");
    const parsed = vehicleSchema.safeParse(body);
    if (!parsed.success) {
      const map: Record<string, Path<Values>> = { nickname: "newNickname", make: "newMake", model: "newModel", placardFrontSize: "newPlacard" };
      for (const issue of parsed.error.issues) {
        const f = map[String(issue.path[0])];
        if (f) form.setError(f, { message: issue.message });
      }
      setFormError("Tell us about the vehicle first.");
      return null;
    }
    const res = await api<{ vehicle: { id: string; nickname: string; make: string; model: string; placardFrontSize: string | null; odometerUnit: "km" | "mi" } }>("/api/vehicles", { body });
    const v: VehicleChoice = { ...res.vehicle, mountedSet: null };
    setCreatedVehicle(v);
    setValue("vehicleId", v.id);
    return v.id;
  }

  async function uploadAll(vid: string, setId: string) {
    setPhase("uploading");
    let failed = false;
    for (let i = 0; i < uploads.length; i++) {
      const u = uploads[i];
      if (u.done || u.error) {
        if (u.error) failed = true;
        continue;
      }
      try {
        await uploadFile(`/api/vehicles/${vid}/attachments`, u.file, { kind: u.kind, setId }, (p) =>
          setUploads((all) => all.map((x, j) => (j === i ? { ...x, progress: p } : x))),
        );
        setUploads((all) => all.map((x, j) => (j === i ? { ...x, done: true, progress: 1 } : x)));
      } catch (e) {
        failed = true;
        setUploads((all) => all.map((x, j) => (j === i ? { ...x, error: e instanceof Error ? e.message : "Upload failed." } : x)));
      }
    }
    return !failed;
  }

  const onSubmit = form.handleSubmit(
    async (parsed) => {
      setFormError(null);
      // Which set comes off, and what becomes of it, is known here already: asked before any request.
      if (replacing && !parsed.replacedFate) {
        form.setError("replacedFate", { message: "Choose whether the set coming off is stored or retired." });
        setFormError("Some fields need attention: they are marked below.");
        return;
      }
      const withoutCode = parsed.tires.filter((t) => !t.dotCode).length;
      if (withoutCode > 0 && !codesAccepted.current && !savedSetId) {
        setMissingCodes("asking");
        setAsked((n) => n + 1);
        return;
      }
      setPhase("saving");
      try {
        const vid = await ensureVehicle();
        if (!vid) return setPhase("editing");
        let setId = savedSetId;
        if (!setId) {
          const res = await api<{ setId: string }>(`/api/vehicles/${vid}/sets`, { body: parsed });
          setId = res.setId;
          setSavedSetId(setId);
        }
        const ok = await uploadAll(vid, setId);
        if (!ok) {
          setFormError("The set is saved. Some files could not be uploaded: remove them or choose them again, then press the button once more.");
          return setPhase("editing");
        }
        router.push(`/vehicles/${vid}?saved=set`);
        router.refresh();
      } catch (e) {
        setPhase("editing");
        if (e instanceof ApiError) {
          for (const [k, msgs] of Object.entries(e.fields)) form.setError(k as Path<Values>, { message: msgs[0] });
          setFormError(`${e.message} Nothing was saved; everything you typed is still here.`);
        } else setFormError("Something went wrong. Nothing was saved; everything you typed is still here.");
      }
    },
    () => setFormError("Some fields need attention: they are marked below."),
  );

  const busy = phase !== "editing";
  const depthLabel = depthUnit === "mm" ? "mm" : "32nds of an inch";

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-4" aria-describedby={formError ? "purchase-error" : undefined}>
      {formError ? (
        <div id="purchase-error">
          <Alert tone="error">{formError}</Alert>
        </div>
      ) : null}

      <Card className="space-y-3">
        <CardTitle>1. Which vehicle</CardTitle>
        <Field label="Vehicle" error={err("vehicleId")}>
          {({ id, describedBy, invalid }) => (
            <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} disabled={!!savedSetId} {...register("vehicleId")}>
              {allVehicles.map((v) => (
                <option key={v.id} value={v.id}>
                  {v.nickname} — {v.make} {v.model}
                </option>
              ))}
              {!createdVehicle ? <option value={NEW}>A vehicle not in Fourpatch yet…</option> : null}
            </Select>
          )}
        </Field>
        {isNew ? (
          <div className="grid gap-3 sm:grid-cols-2">
            <Field label="Name for the vehicle" error={err("newNickname")}>
              {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} autoComplete="off" {...register("newNickname")} />}
            </Field>
            <Field label="Make" error={err("newMake")}>
              {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} autoComplete="off" {...register("newMake")} />}
            </Field>
            <Field label="Model" error={err("newModel")}>
              {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} autoComplete="off" {...register("newModel")} />}
            </Field>
            <Field label="Placard tire size" hint="On the sticker in the driver's door frame; used for the fit check." error={err("newPlacard")}>
              {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} autoComplete="off" {...register("newPlacard")} />}
            </Field>
          </div>
        ) : null}
      </Card>

      <Card className="space-y-3">
        <CardTitle>2. The tires</CardTitle>
        <fieldset>
          <legend className="mb-1 text-sm font-semibold text-asphalt-800">Kind of set</legend>
          <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
            {SET_KIND_VALUES.map((k) => (
              <label key={k} className="flex min-h-11 cursor-pointer items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50 has-[:focus-visible]:outline-2">
                <input type="radio" value={k} className="size-4 accent-groove-700" {...register("kind")} />
                {SET_KIND_LABELS[k]}
              </label>
            ))}
          </div>
        </fieldset>
        <Field label="Tire size" error={err("size")}>
          {({ id, describedBy, invalid }) => (
            <>
              <Input id={id} aria-describedby={`${describedBy ?? ""} size-preview`.trim()} aria-invalid={invalid} autoCapitalize="characters" autoComplete="off" spellCheck={false} placeholder="205/55 R16 91V" onFocus={preloadLiveDecode} {...register("size")} />
              <SizePreview id="size-preview" size={w.size} placard={isNew ? w.newPlacard || null : chosen?.placardFrontSize} winter={kind === "winter"} />
            </>
          )}
        </Field>
        <Field label="Name for the set (optional)" hint="For example “Summer tires” — shown on your vehicles and in your calendar.">
          {({ id, describedBy }) => <Input id={id} aria-describedby={describedBy} autoComplete="off" {...register("label")} />}
        </Field>
      </Card>

      <Card className="space-y-3">
        <CardTitle>3. The purchase</CardTitle>
        <div className="grid gap-3 sm:grid-cols-3">
          <Field label="Date of purchase" error={err("purchasedOn")}>
            {({ id, describedBy, invalid }) => <Input id={id} type="date" max={todayIso()} aria-describedby={describedBy} aria-invalid={invalid} {...register("purchasedOn")} />}
          </Field>
          <div className="flex gap-2">
            <Field label="Price, all tires" className="flex-1" error={err("price")}>
              {({ id, describedBy, invalid }) => <Input id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} {...register("price")} />}
            </Field>
            <Field label="Currency" className="w-24" error={err("currency")}>
              {({ id, describedBy, invalid }) => <Input id={id} maxLength={3} autoCapitalize="characters" aria-describedby={describedBy} aria-invalid={invalid} {...register("currency")} />}
            </Field>
          </div>
          <Field label="Bought from" error={err("seller")}>
            {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} autoComplete="organization" {...register("seller")} />}
          </Field>
        </div>
      </Card>

      <Card className="space-y-3">
        <CardTitle>4. Each tire&apos;s DOT code</CardTitle>
        <p className="text-sm text-asphalt-600">On the sidewall after “DOT”; the last four digits are the week and year it was made.</p>
        <div className="flex flex-col gap-2 sm:flex-row sm:gap-6">
          <label className="flex min-h-11 items-center gap-2">
            <input type="checkbox" className="size-5 accent-groove-700" checked={!!w.shareCode} onChange={(e) => setShare(e.target.checked)} />
            All tires share this code
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input type="checkbox" className="size-5 accent-groove-700" checked={!!w.withSpare} onChange={(e) => setSpare(e.target.checked)} />
            Add the spare
          </label>
        </div>
        <ol className="space-y-3">
          {tires.map((t, i) => {
            const shared = !!w.shareCode && i > 0;
            return (
              <li key={t.position ?? i} className="rounded border border-asphalt-200 p-3">
                <Field label={`${POSITION_LABELS[(t.position ?? "front_left") as PositionValue]} — DOT code`} error={err(`tires.${i}.dotCode`)}>
                  {({ id, describedBy, invalid }) => (
                    <>
                      <Input
                        id={id}
                        aria-describedby={`${describedBy ?? ""} dot-${i}`.trim()}
                        aria-invalid={invalid}
                        onFocus={preloadLiveDecode}
                        autoCapitalize="characters"
                        autoComplete="off"
                        spellCheck={false}
                        placeholder="DOT 3QXY ABC 1225"
                        readOnly={shared}
                        className={shared ? "bg-asphalt-100" : undefined}
                        {...register(`tires.${i}.dotCode`, {
                          onChange: (e: { target: { value: string } }) => {
                            if (i === 0 && getValues("shareCode")) getValues("tires").forEach((_, j) => j > 0 && setValue(`tires.${j}.dotCode`, e.target.value));
                          },
                        })}
                      />
                      <DotPreview id={`dot-${i}`} code={t.dotCode} kind={coreKind(kind)} />
                    </>
                  )}
                </Field>
                {err(`tires.${i}.newDepth`) ? <p className="mt-1 text-sm font-semibold text-condition-replace">{err(`tires.${i}.newDepth`)}</p> : null}
              </li>
            );
          })}
        </ol>
        <Field label={`Tread depth when new (${depthLabel})`} hint="Printed on the invoice or the maker's sheet; about 8 mm (10/32 in) for most car tires." error={err("tires.0.newDepth")}>
          {({ id, describedBy, invalid }) => (
            <Input id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} value={w.commonDepth ?? ""} onChange={(e) => setCommonDepth(e.target.value)} />
          )}
        </Field>
      </Card>

      <Card className="space-y-3">
        <CardTitle>5. Fitting</CardTitle>
        <fieldset>
          <legend className="mb-1 text-sm font-semibold text-asphalt-800">Where the new set goes</legend>
          <div className="grid gap-2 sm:grid-cols-2">
            <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
              <input type="radio" value="yes" className="size-4 accent-groove-700" {...register("mountNow")} /> On the car now
            </label>
            <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
              <input type="radio" value="no" className="size-4 accent-groove-700" {...register("mountNow")} /> Into storage for now
            </label>
          </div>
        </fieldset>
        {w.mountNow === "no" ? (
          <Field label="Stored where" error={err("storageLocation")}>
            {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} {...register("storageLocation")} />}
          </Field>
        ) : null}
        {replacing ? (
          <fieldset className="space-y-2" aria-describedby={err("replacedFate") ? "fate-error" : undefined}>
            <legend className="text-sm font-semibold text-asphalt-800">What becomes of the {setTitle(replacing)} coming off?</legend>
            <div className="grid gap-2 sm:grid-cols-2">
              <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
                <input type="radio" value="stored" className="size-4 accent-groove-700" {...register("replacedFate")} /> Stored, to use again
              </label>
              <label className="flex min-h-11 items-center gap-2 rounded border border-asphalt-300 px-3 has-[:checked]:border-groove-700 has-[:checked]:bg-groove-50">
                <input type="radio" value="retired" className="size-4 accent-groove-700" {...register("replacedFate")} /> Retired (worn out or sold)
              </label>
            </div>
            {err("replacedFate") ? (
              <p id="fate-error" className="text-sm font-semibold text-condition-replace">
                {err("replacedFate")}
              </p>
            ) : null}
            {w.replacedFate === "stored" ? (
              <Field label="Old set stored where" error={err("replacedStorage")}>
                {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} {...register("replacedStorage")} />}
              </Field>
            ) : null}
          </fieldset>
        ) : null}
        <Field label={`Odometer at fitting (${w.odometerUnit ?? "km"})`} hint="Optional; it lets Fourpatch project the wear." error={err("odometer")}>
          {({ id, describedBy, invalid }) => <Input id={id} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} {...register("odometer")} />}
        </Field>
        {err("odometer") ? (
          <label className="flex min-h-11 items-center gap-2 rounded border border-condition-watch/40 bg-condition-watch-bg p-2 text-sm">
            <input type="checkbox" className="size-5" {...register("confirmLowerOdometer")} />
            The lower reading is right (the odometer was replaced, or the earlier reading was wrong).
          </label>
        ) : null}
      </Card>

      <Card className="space-y-3">
        <CardTitle>6. Receipt and photos</CardTitle>
        <p className="text-sm text-asphalt-600">JPEG, PNG, WebP or PDF, up to 10 MB each. They upload after the set is saved.</p>
        <div className="flex flex-col gap-2 sm:flex-row">
          <label className="inline-flex min-h-11 cursor-pointer items-center justify-center gap-2 rounded border border-asphalt-300 bg-white px-4 font-semibold focus-within:outline-2">
            <Paperclip aria-hidden className="size-4" /> Add the receipt
            <input type="file" className="sr-only" accept="image/jpeg,image/png,image/webp,application/pdf" onChange={(e) => { addFiles(e.target.files, "receipt"); e.target.value = ""; }} />
          </label>
          <label className="inline-flex min-h-11 cursor-pointer items-center justify-center gap-2 rounded border border-asphalt-300 bg-white px-4 font-semibold focus-within:outline-2">
            <Paperclip aria-hidden className="size-4" /> Add photos
            <input type="file" multiple className="sr-only" accept="image/jpeg,image/png,image/webp" capture="environment" onChange={(e) => { addFiles(e.target.files, "photo"); e.target.value = ""; }} />
          </label>
        </div>
        {uploads.length ? (
          <ul className="space-y-2" aria-label="Files to upload">
            {uploads.map((u, i) => (
              <li key={`${u.file.name}-${i}`} className="rounded border border-asphalt-200 p-2 text-sm">
                <div className="flex items-center justify-between gap-2">
                  <span className="min-w-0 truncate">
                    {u.kind === "receipt" ? "Receipt" : "Photo"}: {u.file.name} ({f.bytes(u.file.size)})
                  </span>
                  {!u.done ? (
                    <button type="button" className="inline-flex min-h-11 min-w-11 items-center justify-center rounded text-asphalt-700 hover:bg-asphalt-100" aria-label={`Remove ${u.file.name}`} onClick={() => setUploads((all) => all.filter((_, j) => j !== i))}>
                      <Trash2 aria-hidden className="size-4" />
                    </button>
                  ) : (
                    <span className="font-semibold text-condition-good">Uploaded</span>
                  )}
                </div>
                <progress className="mt-1 h-2 w-full accent-groove-700" max={1} value={u.progress} aria-label={`Upload of ${u.file.name}`}>
                  {Math.round(u.progress * 100)} %
                </progress>
                {u.error ? <p className="text-sm font-semibold text-condition-replace">{u.error}</p> : null}
              </li>
            ))}
          </ul>
        ) : null}
      </Card>

      <SafetyNote compact />
      {missingCodes === "asking" ? (
        <div id="missing-codes" tabIndex={-1} role="alert" className="space-y-3 rounded border border-condition-watch/40 bg-condition-watch-bg p-3 text-asphalt-900 outline-none focus-visible:ring-2 focus-visible:ring-groove-700">
          <p className="font-semibold">
            {f.count(tires.filter((t) => !t.dotCode?.trim()).length, { one: "tire has", other: "tires have" })} no DOT code.
          </p>
          <p className="text-sm">
            Without the code Fourpatch cannot tell how old a tire is, so it shows &ldquo;Age unknown — read the code&rdquo; instead of a condition, and no
            age reminders. You can add each code later from the vehicle page.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button
              type="button"
              size="sm"
              variant="secondary"
              onClick={() => {
                setMissingCodes("unasked");
                const i = tires.findIndex((t) => !t.dotCode?.trim());
                form.setFocus(`tires.${Math.max(0, i)}.dotCode`);
              }}
            >
              Add the codes now
            </Button>
            <Button
              type="button"
              size="sm"
              onClick={() => {
                codesAccepted.current = true;
                setMissingCodes("accepted");
                void onSubmit();
              }}
            >
              Save without the codes
            </Button>
          </div>
        </div>
      ) : null}
      <div className="sticky bottom-0 -mx-4 border-t border-asphalt-200 bg-white/95 px-4 py-3 backdrop-blur sm:static sm:mx-0 sm:border-0 sm:bg-transparent sm:p-0">
        <Button type="submit" size="lg" className="w-full sm:w-auto" pending={busy} pendingLabel={phase === "uploading" ? "Uploading files…" : "Saving the purchase…"}>
          {savedSetId ? "Retry the uploads" : "Save the purchase"}
        </Button>
      </div>
    </form>
  );
}
