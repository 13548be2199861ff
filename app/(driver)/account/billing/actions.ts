"use server";
// The billing page's actions. Each goes to Stripe through the SDK; the plan
// itself changes only from what Stripe reports (webhooks, or its answer here).
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { action } from "@/lib/actions";
import { setCancelAtPeriodEnd, startCheckout, switchInterval } from "@/lib/billing/service";

const intervalSchema = z.object({ interval: z.enum(["month", "year"]) });

export const buyPlusAction = action(intervalSchema, {}, async ({ interval }, { session }) => {
  const { url } = await startCheckout({ userId: session.user.id, interval });
  return { url };
});

export const cancelPlusAction = action(z.object({}), {}, async (_input, { session }) => {
  await setCancelAtPeriodEnd({ userId: session.user.id, cancel: true });
  revalidatePath("/", "layout");
});

export const resumePlusAction = action(z.object({}), {}, async (_input, { session }) => {
  await setCancelAtPeriodEnd({ userId: session.user.id, cancel: false });
  revalidatePath("/", "layout");
});

export const switchIntervalAction = action(intervalSchema, {}, async ({ interval }, { session }) => {
  await switchInterval({ userId: session.user.id, interval });
  revalidatePath("/", "layout");
});
