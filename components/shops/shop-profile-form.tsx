"use client";
// The shop's public profile: name, town and contact. The same form opens a
// shop and, for its owner, edits it.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Path } from "react-hook-form";
import type { z } from "zod";
import { sendJson } from "@/components/passes/api";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input, Textarea } from "@/components/ui/field";
import type { shopProfileSchema } from "@/lib/validation/shops";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";

const resolver = lazyZodResolver(() => import("@/lib/validation/shops").then((m) => m.shopProfileSchema));

type In = z.input<typeof shopProfileSchema>;
type Out = z.output<typeof shopProfileSchema>;

const FIELDS: { name: Path<In>; label: string; hint?: string; autoComplete?: string; type?: string; area?: boolean }[] = [
  { name: "name", label: "Shop name", autoComplete: "organization" },
  { name: "town", label: "Town", hint: "Drivers search the directory by name and town.", autoComplete: "address-level2" },
  { name: "address", label: "Street address (optional)", autoComplete: "street-address" },
  { name: "phone", label: "Phone (optional)", type: "tel", autoComplete: "tel" },
  { name: "email", label: "Contact e-mail (optional)", type: "email", autoComplete: "email" },
  { name: "about", label: "About the shop (optional)", area: true },
];

function ProfileFields({ form }: { form: ReturnType<typeof useForm<In, unknown, Out>> }) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      {FIELDS.map((f) => (
        <Field key={f.name} label={f.label} hint={f.hint} error={form.formState.errors[f.name]?.message as string | undefined} className={f.area ? "sm:col-span-2" : undefined}>
          {({ id, describedBy, invalid }) =>
            f.area ? (
              <Textarea id={id} aria-describedby={describedBy} aria-invalid={invalid} {...form.register(f.name)} />
            ) : (
              <Input id={id} type={f.type ?? "text"} autoComplete={f.autoComplete} aria-describedby={describedBy} aria-invalid={invalid} {...form.register(f.name)} />
            )
          }
        </Field>
      ))}
    </div>
  );
}

function useProfileForm(defaults: Partial<In>) {
  return useForm<In, unknown, Out>({ resolver, defaultValues: { name: "", town: "", ...defaults } });
}

export function CreateShopForm() {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const form = useProfileForm({});
  return (
    <form
      noValidate
      className="space-y-5"
      onSubmit={form.handleSubmit(async (values) => {
        setError(null);
        const res = await sendJson("/api/shops", { body: values });
        if (!res.ok) {
          setError(res.message);
          for (const [k, v] of Object.entries(res.fields ?? {})) form.setError(k as Path<In>, { message: v[0] });
          return;
        }
        router.push("/shop/profile");
        router.refresh();
      })}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
      <ProfileFields form={form} />
      <Button type="submit" size="lg" pending={form.formState.isSubmitting} pendingLabel="Opening the shop…">
        Open the shop
      </Button>
    </form>
  );
}

export function EditShopForm({ shopId, defaults }: { shopId: string; defaults: Partial<In> }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const form = useProfileForm(defaults);
  return (
    <form
      noValidate
      className="space-y-5"
      onSubmit={form.handleSubmit(async (values) => {
        setMessage(null);
        const res = await sendJson(`/api/shops/${shopId}`, { method: "PATCH", body: values });
        if (!res.ok) {
          setMessage({ tone: "error", text: res.message });
          for (const [k, v] of Object.entries(res.fields ?? {})) form.setError(k as Path<In>, { message: v[0] });
          return;
        }
        setMessage({ tone: "success", text: "The profile is saved." });
        router.refresh();
      })}
    >
      {message ? <Alert tone={message.tone}>{message.text}</Alert> : null}
      <ProfileFields form={form} />
      <Button type="submit" pending={form.formState.isSubmitting} pendingLabel="Saving…">
        Save the profile
      </Button>
    </form>
  );
}
