"use client";
// Reminder settings: the same zod schema checks the form here and the
// server action there. Plus-only choices stay visible but switched off on Free.
import Link from "next/link";
import { useState, useTransition } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { saveReminderSettingsAction } from "@/app/(driver)/reminders/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import type { Plan } from "@/lib/plan";
import { JURISDICTIONS } from "@/lib/tires/depth";
import { JURISDICTION_LABELS, REMINDER_KIND_LABELS, REMINDER_KINDS } from "@/lib/validation/reminder-labels";
import type { reminderSettingsFormSchema } from "@/lib/validation/reminders";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";

const resolver = lazyZodResolver(() => import("@/lib/validation/reminders").then((m) => m.reminderSettingsFormSchema));

type In = z.input<typeof reminderSettingsFormSchema>;
type Out = z.output<typeof reminderSettingsFormSchema>;

const PLUS_KINDS = new Set(["seasonal-swap", "rotation-due"]);

export function SettingsForm({ defaults, plan, timeZones }: { defaults: Out; plan: Plan; timeZones: string[] }) {
  const plus = plan === "plus";
  const [pending, start] = useTransition();
  const [result, setResult] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const form = useForm<In, unknown, Out>({
    resolver,
    defaultValues: {
      ...defaults,
      kinds: plus ? defaults.kinds : defaults.kinds.filter((k) => !PLUS_KINDS.has(k)),
      alarmLeadDays: [0, 1, 2].map((i) => (defaults.alarmLeadDays[i] === undefined ? "" : String(defaults.alarmLeadDays[i]))),
      customDepthMm: defaults.customDepthMm ?? "",
    },
  });
  const { register, handleSubmit, formState, setError, control } = form;
  const errors = formState.errors as Record<string, { message?: string } | undefined> & { alarmLeadDays?: { message?: string } & Record<number, { message?: string }> };
  const jurisdiction = useWatch({ control, name: "jurisdiction" });

  const onSubmit = handleSubmit((values) => {
    start(async () => {
      // On Free the Plus kinds are not in the form; keep what was stored for them.
      const kinds = plus ? values.kinds : [...values.kinds, ...defaults.kinds.filter((k) => PLUS_KINDS.has(k))];
      const r = await saveReminderSettingsAction({ ...values, kinds } as never);
      if (r.status === "ok") {
        setResult({
          tone: "success",
          text: r.data.emailActive ? "Saved. E-mail reminders are on." : "Saved. Your feed and this page use the new settings from now on.",
        });
      } else {
        for (const [key, messages] of Object.entries(r.fields ?? {})) setError(key as keyof In, { message: messages[0] });
        setResult({ tone: "error", text: r.message });
      }
    });
  });

  const alarmError = errors.alarmLeadDays?.message ?? [0, 1, 2].map((i) => errors.alarmLeadDays?.[i]?.message).find(Boolean);

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Reminder settings">
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold text-asphalt-800">Remind me about</legend>
        {REMINDER_KINDS.map((kind) => {
          const locked = PLUS_KINDS.has(kind) && !plus;
          if (locked) {
            // Not part of the form on Free: an upgrade prompt instead of a dead box, while the stored choice waits for Plus.
            return (
              <div key={kind} className="flex min-h-11 items-center gap-3 rounded border border-dashed border-asphalt-300 px-3 py-2">
                <span className="flex-1 text-asphalt-700">{REMINDER_KIND_LABELS[kind]}</span>
                <Link href="/account/billing" className="text-sm font-semibold">
                  Upgrade to Plus
                </Link>
              </div>
            );
          }
          return (
            <label key={kind} className="flex min-h-11 items-center gap-3 rounded border border-asphalt-200 px-3 py-2">
              <input type="checkbox" value={kind} defaultChecked={defaults.kinds.includes(kind)} {...register("kinds")} className="size-5 accent-groove-700" />
              <span className="flex-1 text-asphalt-900">{REMINDER_KIND_LABELS[kind]}</span>
              {PLUS_KINDS.has(kind) ? <span className="rounded-full bg-groove-50 px-2 py-0.5 text-xs font-semibold text-groove-800">Plus</span> : null}
            </label>
          );
        })}
        {plus ? null : (
          <p id="plus-kinds-note" className="text-xs text-asphalt-600">
            Seasonal swap and rotation reminders come with Plus.
          </p>
        )}
      </fieldset>

      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Depth limits of" error={errors.jurisdiction?.message} hint="Picks the legal or advised minimum tread depth. Local law decides.">
          {({ id, describedBy, invalid }) => (
            <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} defaultValue={defaults.jurisdiction} {...register("jurisdiction")}>
              {JURISDICTIONS.map((j) => (
                <option key={j} value={j}>
                  {JURISDICTION_LABELS[j]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        {jurisdiction === "custom" ? (
          <Field label="My depth limit (mm)" error={errors.customDepthMm?.message}>
            {({ id, describedBy, invalid }) => (
              <Input id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} defaultValue={defaults.customDepthMm ?? ""} {...register("customDepthMm")} />
            )}
          </Field>
        ) : null}
        <Field label="Time zone" error={errors.timezone?.message} hint="Reminder days follow your own calendar date.">
          {({ id, describedBy, invalid }) => (
            <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} defaultValue={defaults.timezone} {...register("timezone")}>
              {timeZones.map((tz) => (
                <option key={tz} value={tz}>
                  {tz.replaceAll("_", " ")}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>

      {plus ? (
        <>
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold text-asphalt-800">
          Calendar alarms, days before each date
        </legend>
        <div className="flex gap-2">
          {[0, 1, 2].map((i) => (
            <div key={i} className="w-24">
              <label htmlFor={`alarm-${i}`} className="sr-only">
                Alarm {i + 1}, days before
              </label>
              <Input id={`alarm-${i}`} inputMode="numeric" placeholder="—" aria-invalid={!!alarmError} aria-describedby="alarm-hint" defaultValue={defaults.alarmLeadDays[i] ?? ""} {...register(`alarmLeadDays.${i}` as "alarmLeadDays")} />
            </div>
          ))}
        </div>
        <p id="alarm-hint" className="text-xs text-asphalt-600">
          Up to three; leave a box empty for fewer. 0 means on the day.
        </p>
        {alarmError ? <p className="text-sm font-semibold text-condition-replace">{alarmError}</p> : null}
      </fieldset>

        </>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Fit winter tires on (month-day)" error={errors.autumnSwap?.message} hint="For example 10-15">
          {({ id, describedBy, invalid }) => <Input id={id} placeholder="10-15" aria-describedby={describedBy} aria-invalid={invalid} defaultValue={defaults.autumnSwap} {...register("autumnSwap")} />}
        </Field>
        <Field label="Take winter tires off on (month-day)" error={errors.springSwap?.message} hint="For example 04-15">
          {({ id, describedBy, invalid }) => <Input id={id} placeholder="04-15" aria-describedby={describedBy} aria-invalid={invalid} defaultValue={defaults.springSwap} {...register("springSwap")} />}
        </Field>
        <Field label="Rotate every (km)" error={errors.rotationIntervalKm?.message} hint="Commonly 8,000–13,000 km, or as your manual says">
          {({ id, describedBy, invalid }) => (
            <Input id={id} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} defaultValue={defaults.rotationIntervalKm} {...register("rotationIntervalKm")} />
          )}
        </Field>
      </div>

      {plus ? (
        <>
      <fieldset className="space-y-3 rounded border border-asphalt-200 p-3">
        <legend className="px-1 text-sm font-semibold text-asphalt-800">
          E-mail reminders
        </legend>
        <label className="flex min-h-11 items-center gap-3">
          <input type="checkbox" defaultChecked={defaults.emailReminders} {...register("emailReminders")} className="size-5 accent-groove-700" />
          <span className="text-asphalt-900">Send me an e-mail before each date</span>
        </label>
        <Field label="Days before the date" error={errors.emailLeadDays?.message} className="max-w-48">
          {({ id, describedBy, invalid }) => (
            <Input id={id} inputMode="numeric" aria-describedby={describedBy} aria-invalid={invalid} defaultValue={defaults.emailLeadDays} {...register("emailLeadDays")} />
          )}
        </Field>
      </fieldset>

        </>
      ) : (
        <p className="rounded border border-groove-200 bg-groove-50 p-3 text-sm text-groove-900">
          Calendar alarms and e-mail reminders come with Plus. Your choices here keep working for the feed on Free.{" "}
          <Link href="/account/billing" className="font-semibold">
            Upgrade to Plus
          </Link>
        </p>
      )}
      {result ? <Alert tone={result.tone}>{result.text}</Alert> : null}
      <Button type="submit" pending={pending} pendingLabel="Saving…">
        Save reminder settings
      </Button>
    </form>
  );
}
