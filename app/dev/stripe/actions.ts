"use server";
// Actions of the local Stripe fake's pages (hosted checkout, hosted invoice,
// developer page). Each checks the fake's gate again: a server action is a
// public endpoint of its own.
import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { fakeStripeAllowed } from "@/lib/billing/fake-gate";
import { advanceToRenewal, FakeStripeError, payCheckoutSession, payInvoice, redeliverEvent, setFailNextRenewal } from "@/lib/billing/fake/engine";

const cardSchema = z.object({
  id: z.string().min(1).max(100),
  number: z.string().max(40),
  expiry: z.string().max(10),
  cvc: z.string().max(6),
});

export type CardFormResult = { ok: true; redirectTo?: string } | { ok: false; message: string; field?: string };

async function gate() {
  if (!(await fakeStripeAllowed(await headers()))) throw new AppError("not_found", "Not found.");
}

export async function payCheckoutAction(input: z.input<typeof cardSchema>): Promise<CardFormResult> {
  await gate();
  const p = cardSchema.safeParse(input);
  if (!p.success) return { ok: false, message: "Your card details are incomplete." };
  try {
    const r = await payCheckoutSession(p.data.id, p.data);
    return r.ok ? { ok: true, redirectTo: r.successUrl } : r;
  } catch (e) {
    if (e instanceof FakeStripeError) return { ok: false, message: e.message };
    throw e;
  }
}

export async function payInvoiceAction(input: z.input<typeof cardSchema>): Promise<CardFormResult> {
  await gate();
  const p = cardSchema.safeParse(input);
  if (!p.success) return { ok: false, message: "Your card details are incomplete." };
  try {
    // No revalidation here: the page keeps the form's "Paid" message; the billing page is dynamic anyway.
    const r = await payInvoice(p.data.id, p.data);
    return r.ok ? { ok: true } : r;
  } catch (e) {
    if (e instanceof FakeStripeError) return { ok: false, message: e.message };
    throw e;
  }
}

const subAction = z.object({ id: z.string().min(1).max(100) });

/** A developer page's button: an unknown id changes nothing (the page shows the state as it is); a malformed one is a 422. */
async function onObject(form: FormData, fn: (id: string) => Promise<unknown>, path: string) {
  await gate();
  const p = subAction.safeParse({ id: form.get("id") });
  if (!p.success) throw new AppError("invalid", "That id is not valid.", { id: ["Not a valid id."] });
  await fn(p.data.id).catch((e) => {
    if (!(e instanceof FakeStripeError)) throw e;
  });
  revalidatePath(path, path === "/" ? "layout" : undefined);
}

export async function advanceAction(form: FormData) {
  await onObject(form, advanceToRenewal, "/");
}

export async function failNextAction(form: FormData) {
  await onObject(form, (id) => setFailNextRenewal(id, form.get("fail") === "on"), "/dev/stripe");
}

export async function redeliverAction(form: FormData) {
  await onObject(form, redeliverEvent, "/dev/stripe");
}
