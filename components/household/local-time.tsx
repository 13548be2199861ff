"use client";
// A moment shown in the reader's own time zone and locale: the formatter the
// server hands down (components/format), so the server's HTML and the
// browser's first render agree.
import { useFormat } from "@/components/format/format-provider";

export function LocalTime({ iso, dateOnly }: { iso: string; dateOnly?: boolean }) {
  const f = useFormat();
  return <time dateTime={iso}>{dateOnly ? f.dateOf(iso) : f.dateTime(iso)}</time>;
}
