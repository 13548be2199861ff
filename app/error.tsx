"use client";
// A page that failed on the server or in the browser: what happened, that
// nothing half-saved stays behind, and ways forward.
import Link from "next/link";
import { useEffect } from "react";
import { Brand } from "@/components/shell/brand";
import { Button } from "@/components/ui/button";
import { buttonVariants } from "@/components/ui/button-variants";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    document.title = "Something went wrong · Fourpatch";
  }, []);
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-4 px-6 py-10">
      <Brand />
      <h1 className="text-2xl font-bold">Something went wrong on this page</h1>
      <p className="text-asphalt-700">
        Fourpatch could not show it. Anything you were saving was either saved whole or not at all: check the logbook, then try again.
      </p>
      {error.digest ? <p className="font-mono text-sm text-asphalt-600">Reference: {error.digest}</p> : null}
      <div className="flex flex-wrap gap-3">
        <Button type="button" onClick={reset}>
          Try again
        </Button>
        <Link href="/vehicles" className={buttonVariants({ variant: "secondary" })}>
          Back to my vehicles
        </Link>
      </div>
    </main>
  );
}
