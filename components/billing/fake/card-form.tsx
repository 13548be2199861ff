"use client";
// The card form of the local Stripe fake's hosted pages. Only test cards
// exist here; the three documented ones are listed beside the form.
import { useState, useTransition } from "react";
import type { CardFormResult } from "@/app/dev/stripe/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";

type Submit = (input: { id: string; number: string; expiry: string; cvc: string }) => Promise<CardFormResult>;

export function FakeCardForm({ id, submit, payLabel, paidMessage }: { id: string; submit: Submit; payLabel: string; paidMessage?: string }) {
  const [pending, start] = useTransition();
  const [result, setResult] = useState<CardFormResult | null>(null);

  function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    start(async () => {
      const r = await submit({ id, number: String(f.get("number") ?? ""), expiry: String(f.get("expiry") ?? ""), cvc: String(f.get("cvc") ?? "") });
      setResult(r);
      if (r.ok && r.redirectTo) window.location.assign(r.redirectTo);
    });
  }

  const error = result && !result.ok ? result : null;
  return (
    <form onSubmit={onSubmit} className="space-y-4" aria-label="Card details" noValidate>
      <Field label="Card number" error={error?.field === "number" ? error.message : undefined}>
        {({ id: fid, describedBy, invalid }) => (
          <Input id={fid} name="number" inputMode="numeric" autoComplete="cc-number" placeholder="4242 4242 4242 4242" aria-describedby={describedBy} aria-invalid={invalid} />
        )}
      </Field>
      <div className="grid grid-cols-2 gap-3">
        <Field label="Expiry (MM / YY)" error={error?.field === "expiry" ? error.message : undefined}>
          {({ id: fid, describedBy, invalid }) => <Input id={fid} name="expiry" autoComplete="cc-exp" placeholder="12 / 34" aria-describedby={describedBy} aria-invalid={invalid} />}
        </Field>
        <Field label="CVC" error={error?.field === "cvc" ? error.message : undefined}>
          {({ id: fid, describedBy, invalid }) => <Input id={fid} name="cvc" inputMode="numeric" autoComplete="cc-csc" placeholder="123" aria-describedby={describedBy} aria-invalid={invalid} />}
        </Field>
      </div>
      {error && !error.field ? <Alert tone="error">{error.message}</Alert> : null}
      {result?.ok && !result.redirectTo && paidMessage ? <Alert tone="success">{paidMessage}</Alert> : null}
      <Button type="submit" pending={pending} pendingLabel="Paying…" className="w-full" disabled={!!(result?.ok)}>
        {payLabel}
      </Button>
    </form>
  );
}
