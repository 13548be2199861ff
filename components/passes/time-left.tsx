"use client";
// The time a pass has left, kept current while the page is open. The offset
// between the server's clock and the browser's is taken once, so a wrong
// device clock does not show a wrong time.
import { Clock } from "lucide-react";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { cn } from "@/lib/cn";
import { formatTimeLeft } from "@/lib/time-left";

export function TimeLeft({ endsAt, serverNow, className, refreshOnEnd = true, onDark = false }: { endsAt: string; serverNow: string; className?: string; refreshOnEnd?: boolean; onDark?: boolean }) {
  const router = useRouter();
  const offset = useRef<number | null>(null);
  const [left, setLeft] = useState(() => new Date(endsAt).getTime() - new Date(serverNow).getTime());
  useEffect(() => {
    offset.current ??= new Date(serverNow).getTime() - Date.now();
    const tick = () => setLeft(new Date(endsAt).getTime() - (Date.now() + (offset.current ?? 0)));
    tick();
    const t = setInterval(tick, 15_000);
    return () => clearInterval(t);
  }, [endsAt, serverNow]);
  const ended = left <= 0;
  useEffect(() => {
    if (ended && refreshOnEnd) router.refresh();
  }, [ended, refreshOnEnd, router]);
  const soon = !ended && left < 60 * 60 * 1000;
  return (
    <span className={cn("inline-flex items-center gap-1.5 font-semibold", onDark && "text-white", soon && (onDark ? "text-condition-plan-bg" : "text-condition-plan"), ended && (onDark ? "text-condition-replace-bg" : "text-condition-replace"), className)} data-testid="time-left">
      <Clock aria-hidden className="size-4 shrink-0" />
      {ended ? "Pass ended" : `${formatTimeLeft(left)} left`}
    </span>
  );
}
