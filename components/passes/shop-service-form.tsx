"use client";
// The technician's form: the work done and, with it, a tread check of the
// set on the car. Large targets and the essentials first; when the pass has
// ended the server refuses and the form says so, keeping what was typed.
import { useRouter } from "next/navigation";
import { useId, useRef, useState } from "react";
import { toast } from "@/components/ui/toast";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { POSITION_LABELS, SERVICE_KIND_LABELS, SERVICE_KINDS, type PositionValue } from "@/lib/validation/labels";
import { sendJson } from "./api";

type TireRow = { id: string; position: PositionValue };
type Grooves = { inner: string; centre: string; outer: string; pressure: string };

export type ShopFormContext = {
  passId: string;
  vehicleId: string;
  set: { id: string; label: string; tires: TireRow[] } | null;
  depthUnit: "mm" | "32nds";
  pressureUnit: "kpa" | "psi" | "bar";
  odometerUnit: "km" | "mi";
  today: string;
};

const PRESSURE_LABEL = { kpa: "kPa", psi: "psi", bar: "bar" } as const;
const GROOVE_LABEL = { inner: "Inner", centre: "Centre", outer: "Outer" } as const;

export function ShopServiceForm({ ctx, onEnded }: { ctx: ShopFormContext; onEnded?: (message: string) => void }) {
  const router = useRouter();
  const id = useId();
  const [kind, setKind] = useState<(typeof SERVICE_KINDS)[number]>("inspection");
  const [performedOn, setPerformedOn] = useState(ctx.today);
  const [odometer, setOdometer] = useState("");
  const [cost, setCost] = useState("");
  const [notes, setNotes] = useState("");
  const [withCheck, setWithCheck] = useState(!!ctx.set);
  const [grooves, setGrooves] = useState<Record<string, Grooves>>(() =>
    Object.fromEntries((ctx.set?.tires ?? []).map((t) => [t.id, { inner: "", centre: "", outer: "", pressure: "" }])),
  );
  const [confirmLower, setConfirmLower] = useState(false);
  const [pending, setPending] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [askConfirm, setAskConfirm] = useState(false);
  const [askDepth, setAskDepth] = useState(false);
  const [confirmDepth, setConfirmDepth] = useState(false);
  const messageRef = useRef<HTMLDivElement>(null);
  // On a phone the form is long and the header sticky: the outcome is brought into view, and a toast says it too.
  const show = (m: { tone: "error" | "success"; text: string }) => {
    setMessage(m);
    requestAnimationFrame(() => {
      messageRef.current?.scrollIntoView({ block: "start", behavior: "smooth" });
      messageRef.current?.focus({ preventScroll: true });
    });
  };

  const depthLabel = ctx.depthUnit === "32nds" ? "32nds" : "mm";
  const setGroove = (tireId: string, key: keyof Grooves, value: string) => setGrooves((g) => ({ ...g, [tireId]: { ...g[tireId], [key]: value } }));
  const fe = (key: string) => fields[key]?.[0];

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setPending(true);
    setMessage(null);
    setFields({});
    const readings = (ctx.set?.tires ?? [])
      .map((t) => ({ tireId: t.id, ...grooves[t.id] }))
      .filter((r) => r.inner || r.centre || r.outer || r.pressure);
    const body = {
      kind,
      performedOn,
      odometer,
      odometerUnit: ctx.odometerUnit,
      cost,
      notes,
      confirmLowerOdometer: confirmLower,
      setId: ctx.set?.id ?? "",
      checks: withCheck && ctx.set && readings.length > 0 ? [{ setId: ctx.set.id, method: "gauge", depthUnit: ctx.depthUnit, pressureUnit: ctx.pressureUnit, readings, confirmUnusualDepth: confirmDepth }] : [],
    };
    const res = await sendJson(`/api/passes/${ctx.passId}/vehicles/${ctx.vehicleId}/service`, { body });
    setPending(false);
    if (!res.ok) {
      if (res.code === "pass_ended") onEnded?.(res.message);
      show({ tone: "error", text: res.message });
      setFields(res.fields ?? {});
      if (res.status === 409 && res.fields?.odometer) setAskConfirm(true);
      if (res.status === 409 && res.fields?.confirmUnusualDepth) setAskDepth(true);
      return;
    }
    const text = `${SERVICE_KIND_LABELS[kind]} saved to the driver's logbook${body.checks.length ? ", with the tread check" : ""}. The driver got an e-mail.`;
    show({ tone: "success", text });
    toast.success(text);
    setConfirmDepth(false);
    setAskDepth(false);
    setNotes("");
    setCost("");
    setConfirmLower(false);
    setAskConfirm(false);
    setGrooves(Object.fromEntries((ctx.set?.tires ?? []).map((t) => [t.id, { inner: "", centre: "", outer: "", pressure: "" }])));
    router.refresh();
  }

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-labelledby={`${id}-title`}>
      <h2 id={`${id}-title`} className="text-xl font-bold">
        Record work
      </h2>
      <div ref={messageRef} tabIndex={-1} className="scroll-mt-24 outline-none" data-testid="work-outcome">
        {message ? <Alert tone={message.tone}>{message.text}</Alert> : null}
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Work done" error={fe("kind")}>
          {({ id: fid, describedBy, invalid }) => (
            <Select id={fid} aria-describedby={describedBy} aria-invalid={invalid} value={kind} onChange={(e) => setKind(e.target.value as typeof kind)} className="min-h-12 text-lg">
              {SERVICE_KINDS.map((k) => (
                <option key={k} value={k}>
                  {SERVICE_KIND_LABELS[k]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Date" error={fe("performedOn")}>
          {({ id: fid, describedBy, invalid }) => (
            <Input id={fid} type="date" max={ctx.today} aria-describedby={describedBy} aria-invalid={invalid} value={performedOn} onChange={(e) => setPerformedOn(e.target.value)} className="min-h-12 text-lg" />
          )}
        </Field>
        <Field label={`Odometer (${ctx.odometerUnit})`} error={fe("odometer")}>
          {({ id: fid, describedBy, invalid }) => (
            <Input id={fid} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} value={odometer} onChange={(e) => setOdometer(e.target.value)} className="min-h-12 text-lg" />
          )}
        </Field>
        <Field label="Cost (optional)" error={fe("cost")}>
          {({ id: fid, describedBy, invalid }) => (
            <Input id={fid} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} value={cost} onChange={(e) => setCost(e.target.value)} className="min-h-12 text-lg" />
          )}
        </Field>
      </div>
      {askDepth ? (
        <label className="flex min-h-12 items-center gap-3 rounded border border-condition-watch/40 bg-condition-watch-bg px-3 text-condition-watch">
          <input type="checkbox" className="size-5" checked={confirmDepth} onChange={(e) => setConfirmDepth(e.target.checked)} />
          The depths marked below are right (deeper than new or than the last reading)
        </label>
      ) : null}
      {askConfirm ? (
        <label className="flex min-h-12 items-center gap-3 rounded border border-condition-watch/40 bg-condition-watch-bg px-3 text-condition-watch">
          <input type="checkbox" className="size-5" checked={confirmLower} onChange={(e) => setConfirmLower(e.target.checked)} />
          The odometer reading is right (the instrument was replaced, or the earlier reading was wrong)
        </label>
      ) : null}

      {ctx.set ? (
        <fieldset className="space-y-3">
          <legend className="sr-only">Tread check</legend>
          <label className="flex min-h-12 items-center gap-3 text-lg font-semibold">
            <input type="checkbox" className="size-6 accent-groove-700" checked={withCheck} onChange={(e) => setWithCheck(e.target.checked)} />
            Tread check of {ctx.set.label}
          </label>
          {withCheck ? (
            <p className="text-sm text-asphalt-600">
              Depth of each groove in {depthLabel === "mm" ? "mm" : "32nds of an inch"}, pressure in {PRESSURE_LABEL[ctx.pressureUnit]}. Leave a tire empty to skip it.
            </p>
          ) : null}
          {withCheck ? (
            <div className="grid gap-3 md:grid-cols-2">
              {ctx.set.tires.map((t, i) => (
                <fieldset key={t.id} id={`check-${t.position}`} className="scroll-mt-28 rounded-lg border border-asphalt-200 bg-asphalt-50 p-3" data-testid={`check-${t.position}`}>
                  <legend className="px-1 text-base font-bold">{POSITION_LABELS[t.position]}</legend>
                  <div className="grid grid-cols-4 items-end gap-2">
                    {(["inner", "centre", "outer"] as const).map((g) => (
                      <div key={g}>
                        <label htmlFor={`${id}-${t.id}-${g}`} className="block text-sm font-semibold">
                          {GROOVE_LABEL[g]}
                        </label>
                        <Input
                          id={`${id}-${t.id}-${g}`}
                          inputMode="decimal"
                          aria-label={`${POSITION_LABELS[t.position]} ${g} depth in ${depthLabel}`}
                          aria-invalid={!!fe(`checks.0.readings.${i}.${g}`)}
                          value={grooves[t.id]?.[g] ?? ""}
                          onChange={(e) => setGroove(t.id, g, e.target.value)}
                          className="min-h-12 px-2 text-center text-lg tabular-nums"
                        />
                      </div>
                    ))}
                    <div>
                      <label htmlFor={`${id}-${t.id}-p`} className="block text-sm font-semibold">
                        {PRESSURE_LABEL[ctx.pressureUnit]}
                      </label>
                      <Input
                        id={`${id}-${t.id}-p`}
                        inputMode="decimal"
                        aria-label={`${POSITION_LABELS[t.position]} pressure in ${PRESSURE_LABEL[ctx.pressureUnit]}`}
                        value={grooves[t.id]?.pressure ?? ""}
                        onChange={(e) => setGroove(t.id, "pressure", e.target.value)}
                        className="min-h-12 px-2 text-center text-lg tabular-nums"
                      />
                    </div>
                  </div>
                  {(["inner", "centre", "outer", "pressure"] as const).map((g) =>
                    fe(`checks.0.readings.${i}.${g}`) ? (
                      <p key={g} className="mt-1 text-sm font-semibold text-condition-replace">
                        {fe(`checks.0.readings.${i}.${g}`)}
                      </p>
                    ) : null,
                  )}
                </fieldset>
              ))}
            </div>
          ) : null}
        </fieldset>
      ) : (
        <p className="text-asphalt-600">No set is on the car in the logbook, so there is no tread check to record.</p>
      )}

      <Field label="Notes for the driver (optional)" error={fe("notes")}>
        {({ id: fid, describedBy, invalid }) => <Textarea id={fid} aria-describedby={describedBy} aria-invalid={invalid} value={notes} onChange={(e) => setNotes(e.target.value)} maxLength={1000} />}
      </Field>
      <Button type="submit" size="lg" className="w-full sm:w-auto" pending={pending} pendingLabel="Saving to the logbook…">
        Save to the driver&apos;s logbook
      </Button>
    </form>
  );
}
