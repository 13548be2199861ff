import { Info } from "lucide-react";
import { cn } from "@/lib/cn";

/** The caution shown wherever Fourpatch judges a tire. */
export function SafetyNote({ className, compact }: { className?: string; compact?: boolean }) {
  return (
    <p className={cn("flex gap-2 rounded border border-asphalt-200 bg-asphalt-100 p-3 text-sm text-asphalt-700", className)}>
      <Info aria-hidden className="mt-0.5 size-4 shrink-0" />
      <span>
        {compact
          ? "Guidance only: local law and a qualified tire technician decide."
          : "These dates and conditions are guidance computed from what you logged. Local law sets the legal minimum, and a qualified tire technician decides whether a tire is safe to use."}
      </span>
    </p>
  );
}
