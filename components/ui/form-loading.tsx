import { Loader2 } from "lucide-react";

/** Where a form whose code is loaded on opening (next/dynamic) appears while it arrives. */
export function FormLoading() {
  return (
    <p role="status" className="flex min-h-11 items-center gap-2 text-sm text-asphalt-600">
      <Loader2 aria-hidden className="size-4 animate-spin" /> Opening the form…
    </p>
  );
}
