import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Suspense } from "react";
import { getSession } from "@/lib/auth/session";
import { appUrl } from "@/lib/env";
import { safeNextPath } from "@/lib/safe-next";
import { SignInForm } from "../_components/auth-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const q = await searchParams;
  // The verification link signs the new account in and lands here: go on.
  if (q.verified === "1" && !q.error && (await getSession())) {
    redirect(safeNextPath(typeof q.next === "string" ? q.next : null, appUrl()));
  }
  return (
    <>
      <h1 className="mb-1 text-xl font-bold">Sign in</h1>
      <p className="mb-5 text-sm text-asphalt-600">Welcome back to your tire logbook.</p>
      <Suspense>
        <SignInForm />
      </Suspense>
    </>
  );
}
