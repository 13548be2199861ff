import { NextResponse } from "next/server";
import { deleteAccount } from "@/db/queries/account";
import { parseJson, route } from "@/lib/api/handler";
import { auth } from "@/lib/auth/server";
import { endSubscriptionsOf } from "@/lib/billing/service";
import { AppError } from "@/lib/errors";
import { removeStoredFile } from "@/lib/uploads";
import { deleteAccountSchema } from "@/lib/validation/account";

export const dynamic = "force-dynamic";

/** DELETE: the account and all of its data, after the password is confirmed. */
export const DELETE = route(async ({ req, session }) => {
  const input = await parseJson(req, deleteAccountSchema);
  const ctx = await auth.$context;
  const accounts = await ctx.internalAdapter.findAccounts(session!.user.id);
  const hash = accounts.find((a) => a.providerId === "credential")?.password;
  const ok = hash ? await ctx.password.verify({ hash, password: input.password }) : false;
  if (!ok) throw new AppError("invalid", "That password is not right.", { password: ["That password is not right."] });
  // A paying driver's subscription ends first; if Stripe cannot be reached, nothing is deleted.
  await endSubscriptionsOf({ userId: session!.user.id });
  const { storedFiles } = await deleteAccount({ userId: session!.user.id });
  await Promise.all(storedFiles.map((name) => removeStoredFile(name)));
  const res = NextResponse.json({ ok: true, deleted: true });
  // The session row is gone with the user; clear the browser's cookie too.
  res.cookies.delete("better-auth.session_token");
  return res;
});
