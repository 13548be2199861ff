"use client";
// A set the shop fitted: size, kind and each tire's DOT code, decoded as it
// is typed (lib/tires), saved with a fitting entry in one transaction.
import { useFormat } from "@/components/format/format-provider";
import { useRouter } from "next/navigation";
import { useId, useMemo, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { decodeDotCode } from "@/lib/tires/dot";
import { tireAge } from "@/lib/tires/age";
import { POSITION_LABELS, SET_KIND_LABELS, SET_KIND_VALUES, type PositionValue } from "@/lib/validation/labels";
import { sendJson } from "./api";

const FOUR: PositionValue[] = ["front_left", "front_right", "rear_left", "rear_right"];

function DotHint({ code, today }: { code: string; today: string }) {
  const d = useMemo(() => (code.trim() ? decodeDotCode(code, { today }) : null), [code, today]);
  if (!d) return <span className="text-asphalt-600">The last four digits are the week and year.</span>;
  if (!d.ok) return <span className="font-semibold text-condition-replace">{d.error}</span>;
  const age = tireAge(d.weekStart, { today });
  return <DotHintText week={d.week} year={d.year} age={age.ok ? age : null} />;
}

function DotHintText({ week, year, age }: { week: number; year: number; age: { years: number; months: number } | null }) {
  const f = useFormat();
  return (
    <span className="text-asphalt-700">
      Made in week {week} of {year}
      {age ? ` · ${f.age(age)}` : ""}
    </span>
  );
}

export function ShopFittedSetForm({ passId, vehicleId, today, hasMountedSet, depthUnit, odometerUnit }: { passId: string; vehicleId: string; today: string; hasMountedSet: boolean; depthUnit: "mm" | "32nds"; odometerUnit: "km" | "mi" }) {
  const router = useRouter();
  const id = useId();
  const [size, setSize] = useState("");
  const [kind, setKind] = useState<(typeof SET_KIND_VALUES)[number]>("summer");
  const [odometer, setOdometer] = useState("");
  const [codes, setCodes] = useState<Record<PositionValue, string>>({ front_left: "", front_right: "", rear_left: "", rear_right: "", spare: "" });
  const [newDepth, setNewDepth] = useState("");
  const [fate, setFate] = useState<"stored" | "retired">("stored");
  const [storage, setStorage] = useState("");
  const [pending, setPending] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const fe = (k: string) => fields[k]?.[0];

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setPending(true);
    setMessage(null);
    setFields({});
    const res = await sendJson(`/api/passes/${passId}/vehicles/${vehicleId}/sets`, {
      body: {
        kind,
        size,
        purchasedOn: today,
        depthUnit,
        odometer,
        odometerUnit,
        mountNow: true,
        replacedFate: hasMountedSet ? fate : "",
        replacedStorage: hasMountedSet && fate === "stored" ? storage : "",
        tires: FOUR.map((position) => ({ position, dotCode: codes[position], newDepth })),
      },
    });
    setPending(false);
    if (!res.ok) {
      setMessage({ tone: "error", text: res.message });
      setFields(res.fields ?? {});
      return;
    }
    setMessage({ tone: "success", text: "The set is in the driver's logbook, with a fitting entry by the shop." });
    router.refresh();
  }

  return (
    <form noValidate onSubmit={submit} className="space-y-4">
      {message ? <Alert tone={message.tone}>{message.text}</Alert> : null}
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Size" hint="For example 205/55 R16 91V" error={fe("size")}>
          {({ id: fid, describedBy, invalid }) => <Input id={fid} aria-describedby={describedBy} aria-invalid={invalid} value={size} onChange={(e) => setSize(e.target.value)} className="min-h-12 text-lg" />}
        </Field>
        <Field label="Kind" error={fe("kind")}>
          {({ id: fid, describedBy, invalid }) => (
            <Select id={fid} aria-describedby={describedBy} aria-invalid={invalid} value={kind} onChange={(e) => setKind(e.target.value as typeof kind)} className="min-h-12 text-lg">
              {SET_KIND_VALUES.map((k) => (
                <option key={k} value={k}>
                  {SET_KIND_LABELS[k]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label={`Odometer (${odometerUnit})`} error={fe("odometer")}>
          {({ id: fid, describedBy, invalid }) => <Input id={fid} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} value={odometer} onChange={(e) => setOdometer(e.target.value)} className="min-h-12 text-lg" />}
        </Field>
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        {FOUR.map((p, i) => (
          <div key={p} className="space-y-1">
            <label htmlFor={`${id}-${p}`} className="block text-sm font-semibold">
              DOT code · {POSITION_LABELS[p]}
            </label>
            <Input
              id={`${id}-${p}`}
              className="min-h-12 font-mono text-lg uppercase"
              autoCapitalize="characters"
              value={codes[p]}
              aria-invalid={!!fe(`tires.${i}.dotCode`)}
              aria-describedby={`${id}-${p}-hint`}
              onChange={(e) => setCodes((c) => ({ ...c, [p]: e.target.value }))}
            />
            <p id={`${id}-${p}-hint`} className="text-sm" aria-live="polite">
              {fe(`tires.${i}.dotCode`) ? <span className="font-semibold text-condition-replace">{fe(`tires.${i}.dotCode`)}</span> : <DotHint code={codes[p]} today={today} />}
            </p>
          </div>
        ))}
      </div>
      <div className="flex flex-wrap items-end gap-4">
        <Button type="button" variant="secondary" onClick={() => setCodes((c) => ({ ...c, front_right: c.front_left, rear_left: c.front_left, rear_right: c.front_left }))}>
          Same code on all four
        </Button>
        <Field label={`Depth when new (${depthUnit === "mm" ? "mm" : "32nds"})`} error={fe("tires.0.newDepth")}>
          {({ id: fid, describedBy, invalid }) => <Input id={fid} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} value={newDepth} onChange={(e) => setNewDepth(e.target.value)} className="w-32" />}
        </Field>
      </div>
      {hasMountedSet ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="The set coming off is" error={fe("replacedFate")}>
            {({ id: fid, describedBy, invalid }) => (
              <Select id={fid} aria-describedby={describedBy} aria-invalid={invalid} value={fate} onChange={(e) => setFate(e.target.value as typeof fate)}>
                <option value="stored">Stored</option>
                <option value="retired">Retired</option>
              </Select>
            )}
          </Field>
          {fate === "stored" ? (
            <Field label="Stored where" error={fe("replacedStorage")}>
              {({ id: fid, describedBy, invalid }) => <Input id={fid} aria-describedby={describedBy} aria-invalid={invalid} value={storage} onChange={(e) => setStorage(e.target.value)} />}
            </Field>
          ) : null}
        </div>
      ) : null}
      <Button type="submit" size="lg" pending={pending} pendingLabel="Saving the set…">
        Save the fitted set
      </Button>
    </form>
  );
}
