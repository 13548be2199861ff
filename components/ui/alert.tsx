import type { ReactNode } from "react";
import { cn } from "@/lib/cn";

const tones = {
  info: "border-groove-200 bg-groove-50 text-groove-900",
  error: "border-condition-replace/40 bg-condition-replace-bg text-condition-replace",
  success: "border-condition-good/40 bg-condition-good-bg text-condition-good",
  warning: "border-condition-watch/40 bg-condition-watch-bg text-condition-watch",
};

export function Alert({ tone = "info", title, children, className }: { tone?: keyof typeof tones; title?: string; children?: ReactNode; className?: string }) {
  return (
    <div role={tone === "error" ? "alert" : "status"} className={cn("rounded border p-3 text-sm", tones[tone], className)}>
      {title ? <p className="font-bold">{title}</p> : null}
      {children}
    </div>
  );
}
