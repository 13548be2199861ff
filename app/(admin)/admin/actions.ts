"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { setAccountDisabled as setDisabled } from "@/db/queries/admin";
import { action } from "@/lib/actions";

const accountSchema = z.object({ userId: z.string().min(1).max(100), disable: z.enum(["true", "false"]).transform((v) => v === "true") });

/** Disables (or re-enables) an account; its sessions end at once; the audit log records it. */
export const setAccountDisabled = action(accountSchema, { role: "admin" }, async ({ userId, disable }, { session }) => {
  const result = await setDisabled({ actor: session, userId, disable });
  revalidatePath("/admin");
  revalidatePath("/admin/audit");
  return result;
});
