"use client";
// The coming reminders in date order, each with its reason and a word for
// how pressing it is (never colour alone).
import { CalendarDays } from "lucide-react";
import Link from "next/link";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { useFormat } from "@/components/format/format-provider";
import { logbookPath, whatToDo } from "@/lib/reminders/describe";
import { CAUTION } from "@/lib/tires/result";
import type { ReminderItem } from "@/lib/tires";

function SeverityBadge({ item }: { item: ReminderItem }) {
  if (item.severity === "info") {
    return (
      <span className="inline-flex items-center gap-1.5 rounded border border-asphalt-300 bg-asphalt-50 px-2.5 py-0.5 text-sm font-semibold text-asphalt-700" data-condition="info">
        <CalendarDays aria-hidden className="size-4" />
        Coming up
      </span>
    );
  }
  return <ConditionBadge condition={item.severity} />;
}

export function ReminderList({ items }: { items: ReminderItem[] }) {
  const f = useFormat();
  if (items.length === 0) {
    return (
      <p className="text-asphalt-700">
        Nothing dated yet. Reminders appear once your sets have DOT codes and tread checks —{" "}
        <Link href="/log-purchase">log a tire purchase</Link> to start.
      </p>
    );
  }
  return (
    <ol className="divide-y divide-asphalt-100" aria-label="Coming reminders, in date order">
      {items.map((item) => (
        <li key={item.id} className="flex flex-col gap-2 py-4 sm:flex-row sm:gap-4" data-reminder-id={item.id} data-kind={item.kind}>
          <div className="shrink-0 sm:w-36">
            <time dateTime={item.date} className="block font-mono text-sm font-semibold text-asphalt-900">
              {f.day(item.date)}
            </time>
            {item.overdue ? <span className="text-xs font-semibold text-condition-replace">Date has passed</span> : null}
          </div>
          <div className="min-w-0 flex-1 space-y-1">
            <div className="flex flex-wrap items-center gap-2">
              <p className="font-semibold text-asphalt-950" data-subject>
                {item.subject}
              </p>
              <SeverityBadge item={item} />
            </div>
            <p className="text-sm text-asphalt-700">{item.explanation.replace(CAUTION, "").trim()}</p>
            <p className="text-sm text-asphalt-700">
              <span className="font-semibold">What to do:</span> {whatToDo(item.kind)}
            </p>
            <Link href={logbookPath(item)} className="text-sm font-semibold">
              Open this set
            </Link>
          </div>
        </li>
      ))}
    </ol>
  );
}
