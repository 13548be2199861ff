"use client";
// Export and deletion of everything the account holds.
import { Trash2 } from "lucide-react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardTitle } from "@/components/ui/card";
import { Field, Input } from "@/components/ui/field";
import type { deleteAccountSchema } from "@/lib/validation/account";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { ExportCard, ImportCard } from "./logbook-transfer";

const resolver = lazyZodResolver(() => import("@/lib/validation/account").then((m) => m.deleteAccountSchema));

type DeleteInput = z.infer<typeof deleteAccountSchema>;

export function AccountData() {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const form = useForm<DeleteInput>({ resolver });
  return (
    <div className="grid gap-5 md:grid-cols-2">
      <ExportCard />
      <ImportCard />
      <Card className="border-condition-replace/30">
        <CardTitle>Delete the account</CardTitle>
        <p className="mt-1 text-sm text-asphalt-700">
          Deletes the account and all of its data at once, uploads included. Shops lose every pass you gave them. This cannot be undone.
        </p>
        <form
          noValidate
          className="mt-4 space-y-3"
          onSubmit={form.handleSubmit(async (values) => {
            setServerError(null);
            const res = await fetch("/api/account", {
              method: "DELETE",
              headers: { "content-type": "application/json" },
              body: JSON.stringify(values),
            });
            if (res.ok) {
              router.push("/?account=deleted");
              router.refresh();
              return;
            }
            const body = (await res.json().catch(() => null)) as { error?: { message: string; fields?: Record<string, string[]> } } | null;
            for (const [name, messages] of Object.entries(body?.error?.fields ?? {})) {
              if (name === "password" || name === "confirm") form.setError(name, { message: messages[0] });
            }
            if (!body?.error?.fields) setServerError(body?.error?.message ?? "The account could not be deleted. Nothing was changed.");
          })}
        >
          {serverError ? <Alert tone="error">{serverError}</Alert> : null}
          <Field label="Type DELETE to confirm" error={form.formState.errors.confirm?.message}>
            {({ id, describedBy, invalid }) => (
              <Input id={id} autoComplete="off" aria-describedby={describedBy} aria-invalid={invalid} {...form.register("confirm")} />
            )}
          </Field>
          <Field label="Your password" error={form.formState.errors.password?.message}>
            {({ id, describedBy, invalid }) => (
              <Input id={id} type="password" autoComplete="current-password" aria-describedby={describedBy} aria-invalid={invalid} {...form.register("password")} />
            )}
          </Field>
          <Button type="submit" variant="danger" pending={form.formState.isSubmitting} pendingLabel="Deleting…">
            <Trash2 aria-hidden className="size-4" />
            Delete my account and data
          </Button>
        </form>
      </Card>
    </div>
  );
}
