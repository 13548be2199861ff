"use client";
// A page that failed on the server or in the browser: what happened, that
// nothing half-saved stays behind, and ways forward. Every page loads this
// boundary with the root layout, so it keeps to plain elements: next/link, the
// Button component and their icons here were loaded a second time beside the
// section layouts' own copies (~5 KiB on every page); so were the mark's
// drawing with the colour tokens and cva with cn (another ~4 KiB), hence the
// mark as its built image (public/icons/mark.svg, scripts/make-icons.ts) and the
// button classes as plain strings. Plain links also leave a failed page by a
// full load, which is what a broken page wants.
import { useEffect } from "react";
import { BUTTON_BASE, BUTTON_VARIANT } from "@/components/ui/button-classes";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    document.title = "Something went wrong · Fourpatch";
  }, []);
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-4 px-6 py-10">
      {/* eslint-disable-next-line @next/next/no-html-link-for-pages -- a full load on purpose (see above) */}
      <a href="/" className="flex items-center gap-2 text-lg font-extrabold tracking-tight text-asphalt-950 no-underline">
        {/* eslint-disable-next-line @next/next/no-img-element -- a fixed 28 px icon; next/image would add script */}
        <img src="/icons/mark.svg" alt="" width={28} height={28} className="size-7" data-testid="brand-mark" />
        Fourpatch
      </a>
      <h1 className="text-2xl font-bold">Something went wrong on this page</h1>
      <p className="text-asphalt-700">
        Fourpatch could not show it. Anything you were saving was either saved whole or not at all: check the logbook, then try again.
      </p>
      {error.digest ? <p className="font-mono text-sm text-asphalt-600">Reference: {error.digest}</p> : null}
      <div className="flex flex-wrap gap-3">
        <button type="button" onClick={reset} className={`${BUTTON_BASE} ${BUTTON_VARIANT.primary}`}>
          Try again
        </button>
        {/* eslint-disable-next-line @next/next/no-html-link-for-pages -- a full load on purpose (see above) */}
        <a href="/vehicles" className={`${BUTTON_BASE} ${BUTTON_VARIANT.secondary}`}>
          Back to my vehicles
        </a>
      </div>
    </main>
  );
}
