import type { Metadata } from "next";
import { Suspense } from "react";
import { SignUpForm } from "../_components/auth-form";

export const metadata: Metadata = { title: "Create your logbook" };

export default function Page() {
  return (
    <>
      <h1 className="mb-1 text-xl font-bold">Create your logbook</h1>
      <p className="mb-5 text-sm text-asphalt-600">Free for your vehicles, your tires and your shop passes.</p>
      <Suspense>
        <SignUpForm />
      </Suspense>
    </>
  );
}
