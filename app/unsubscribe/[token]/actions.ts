"use server";
// No session here on purpose: the signed token is the permission, and it
// can only switch off (or back on) the one kind it names for its account.
import { optBackIn, optOut } from "@/db/queries/reminders";
import { verifyUnsubscribe } from "@/lib/email/unsubscribe";

export type UnsubscribeState = { status: "idle" | "off" | "on" | "invalid" };

export async function changeSubscription(_prev: UnsubscribeState, form: FormData): Promise<UnsubscribeState> {
  const v = verifyUnsubscribe(String(form.get("token") ?? ""));
  if (!v) return { status: "invalid" };
  if (form.get("choice") === "resubscribe") {
    await optBackIn({ userId: v.userId, kind: v.kind });
    return { status: "on" };
  }
  await optOut({ userId: v.userId, kind: v.kind });
  return { status: "off" };
}
