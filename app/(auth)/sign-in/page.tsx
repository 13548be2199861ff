import type { Metadata } from "next";
import { Suspense } from "react";
import { SignInForm } from "../_components/auth-form";

export const metadata: Metadata = { title: "Sign in" };

export default function Page() {
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
