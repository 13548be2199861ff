import type { Metadata } from "next";
import { Suspense } from "react";
import { ForgotPasswordForm } from "../_components/auth-form";

export const metadata: Metadata = { title: "Forgot your password?" };

export default function Page() {
  return (
    <>
      <h1 className="mb-1 text-xl font-bold">Forgot your password?</h1>
      <p className="mb-5 text-sm text-asphalt-600">We will e-mail you a link to choose a new one.</p>
      <Suspense>
        <ForgotPasswordForm />
      </Suspense>
    </>
  );
}
