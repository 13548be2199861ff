import type { Metadata } from "next";
import { Suspense } from "react";
import { ResetPasswordForm } from "../_components/auth-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default function Page() {
  return (
    <>
      <h1 className="mb-1 text-xl font-bold">Choose a new password</h1>
      <p className="mb-5 text-sm text-asphalt-600"></p>
      <Suspense>
        <ResetPasswordForm />
      </Suspense>
    </>
  );
}
