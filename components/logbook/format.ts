// Small display helpers shared by the logbook's pages; dates, numbers and
// units are formatted by lib/format in the viewer's locale and time zone.
import { SET_KIND_LABELS } from "@/lib/validation/labels";

export function setTitle(s: { label: string | null; kind: keyof typeof SET_KIND_LABELS; size?: string }): string {
  return s.label ?? `${SET_KIND_LABELS[s.kind]} set${s.size ? ` ${s.size}` : ""}`;
}

/** Inline links: underlined and in the brand colour, so they read as links without colour too. */
export const linkClass = "font-semibold text-groove-800 underline decoration-groove-300 underline-offset-2 hover:decoration-groove-800";
