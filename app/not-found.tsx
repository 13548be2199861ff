import type { Metadata } from "next";
import Link from "next/link";
import { Brand } from "@/components/shell/brand";
import { buttonVariants } from "@/components/ui/button-variants";

export const metadata: Metadata = { title: "Page not found" };

/** Any address that leads nowhere, and any logbook item that is not the viewer's. */
export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-4 px-6 py-10">
      <Brand />
      <p className="font-mono text-sm font-semibold text-asphalt-600">404</p>
      <h1 className="text-2xl font-bold">This page is not here</h1>
      <p className="text-asphalt-700">
        The address may be mistyped, or what it pointed to was deleted or belongs to another account. Nothing in your logbook changed.
      </p>
      <div className="flex flex-wrap gap-3">
        <Link href="/vehicles" className={buttonVariants()}>
          Back to my vehicles
        </Link>
        <Link href="/" className={buttonVariants({ variant: "secondary" })}>
          Fourpatch home
        </Link>
      </div>
    </main>
  );
}
