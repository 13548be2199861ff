"use server";
import { headers } from "next/headers";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { action } from "@/lib/actions";
import { auth } from "@/lib/auth/server";
import { AppError } from "@/lib/errors";

const accountSchema = z.object({ userId: z.string().min(1), disable: z.enum(["true", "false"]).transform((v) => v === "true") });

/** Disables (or re-enables) an account; its sessions end at once. */
export const setAccountDisabled = action(accountSchema, { role: "admin" }, async ({ userId, disable }, { session }) => {
  if (userId === session.user.id) throw new AppError("conflict", "You cannot disable your own operator account.");
  const h = await headers();
  if (disable) await auth.api.banUser({ headers: h, body: { userId, banReason: "Disabled by an operator" } });
  else await auth.api.unbanUser({ headers: h, body: { userId } });
  revalidatePath("/admin");
  return { userId, disabled: disable };
});
