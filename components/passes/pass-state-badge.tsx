import { Ban, CheckCircle2, Clock3, TimerOff } from "lucide-react";
import { cn } from "@/lib/cn";
import type { PassState } from "@/lib/validation/passes";

// Each state has its own icon and word, so it never rests on colour alone.
const look: Record<PassState, { label: string; className: string; Icon: typeof Ban }> = {
  active: { label: "Active", className: "border-condition-good/30 bg-condition-good-bg text-condition-good", Icon: CheckCircle2 },
  scheduled: { label: "Not started", className: "border-groove-200 bg-groove-50 text-groove-900", Icon: Clock3 },
  expired: { label: "Ended", className: "border-asphalt-300 bg-asphalt-100 text-asphalt-700", Icon: TimerOff },
  revoked: { label: "Withdrawn", className: "border-asphalt-300 bg-asphalt-100 text-asphalt-700", Icon: Ban },
};

export function PassStateBadge({ state, className }: { state: PassState; className?: string }) {
  const { label, className: tone, Icon } = look[state];
  return (
    <span className={cn("inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-semibold", tone, className)} data-state={state}>
      <Icon aria-hidden className="size-4" />
      {label}
    </span>
  );
}
