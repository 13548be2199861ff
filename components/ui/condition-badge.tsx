import { AlertOctagon, CalendarClock, CheckCircle2, Eye, ScanSearch } from "lucide-react";
import { cn } from "@/lib/cn";

// "unknown": a tire whose age cannot be read (no DOT code). Never shown as good.
export type Condition = "good" | "unknown" | "watch" | "plan" | "replace";

// Each condition has a colour, an icon of its own shape and a word, so that
// it reads without colour too.
const look: Record<Condition, { label: string; className: string; Icon: typeof Eye }> = {
  good: { label: "Good", className: "bg-condition-good-bg text-condition-good border-condition-good/30", Icon: CheckCircle2 },
  unknown: { label: "Age unknown — read the code", className: "border-dashed bg-asphalt-100 text-asphalt-800 border-asphalt-500", Icon: ScanSearch },
  watch: { label: "Watch", className: "bg-condition-watch-bg text-condition-watch border-condition-watch/30", Icon: Eye },
  plan: { label: "Plan to replace", className: "bg-condition-plan-bg text-condition-plan border-condition-plan/30", Icon: CalendarClock },
  replace: { label: "Replace now", className: "bg-condition-replace-bg text-condition-replace border-condition-replace/30", Icon: AlertOctagon },
};

export function conditionLabel(c: Condition) {
  return look[c].label;
}

export function ConditionBadge({ condition, className, detail }: { condition: Condition; className?: string; detail?: string }) {
  const { label, className: tone, Icon } = look[condition];
  return (
    <span
      className={cn("inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-semibold", tone, className)}
      data-condition={condition}
    >
      <Icon aria-hidden className="size-4" />
      <span>{label}</span>
      {detail ? <span className="font-normal">· {detail}</span> : null}
    </span>
  );
}
