// Small display helpers shared by the logbook's pages, free of locale
// surprises between server and browser (the same text on both).
import { SET_KIND_LABELS } from "@/lib/validation/logbook";

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

export function formatDate(iso: string | null | undefined): string {
  if (!iso) return "—";
  const [y, m, d] = iso.slice(0, 10).split("-").map(Number);
  return `${d} ${MONTHS[m - 1]} ${y}`;
}

export function formatMoney(cents: number | null | undefined, currency = "EUR"): string {
  if (cents == null) return "—";
  return `${(cents / 100).toFixed(2)} ${currency}`;
}

export function formatAge(age: { years: number; months: number } | null | undefined): string {
  if (!age) return "age unknown";
  const y = age.years === 1 ? "1 year" : `${age.years} years`;
  const m = age.months === 1 ? "1 month" : `${age.months} months`;
  if (age.years === 0) return `${m} old`;
  return age.months ? `${y} ${m} old` : `${y} old`;
}

export function setTitle(s: { label: string | null; kind: keyof typeof SET_KIND_LABELS; size?: string }): string {
  return s.label ?? `${SET_KIND_LABELS[s.kind]} set${s.size ? ` ${s.size}` : ""}`;
}

export function formatBytes(n: number): string {
  if (n < 1024) return `${n} B`;
  if (n < 1024 * 1024) return `${Math.round(n / 1024)} KB`;
  return `${(n / (1024 * 1024)).toFixed(1)} MB`;
}

/** Inline links: underlined and in the brand colour, so they read as links without colour too. */
export const linkClass = "font-semibold text-groove-800 underline decoration-groove-300 underline-offset-2 hover:decoration-groove-800";
