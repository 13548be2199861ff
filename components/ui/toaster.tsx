"use client";
// The toasts in Fourpatch's own colours (lib/visual/tokens.ts), like the
// Alert component: a teal wash for done, the oxblood tint for failed, white
// for the rest; never the library's green and red. The toast library reads
// these variables from its container (rich colours on, so each kind has its own).
import type { CSSProperties } from "react";
import { Toaster } from "sonner";
import { asphalt, condition, conditionTheme, groove } from "@/lib/visual/tokens";

export const toastColours = {
  "--normal-bg": "#ffffff",
  "--normal-border": asphalt[300],
  "--normal-text": asphalt[900],
  "--success-bg": condition.good.wash,
  "--success-border": groove[300],
  "--success-text": condition.good.ink,
  "--info-bg": groove[50],
  "--info-border": groove[200],
  "--info-text": groove[900],
  "--error-bg": conditionTheme["replace-bg"],
  "--error-border": condition.replace.edge,
  "--error-text": condition.replace.edge,
  "--border-radius": "0.5rem",
} as const;

export function AppToaster() {
  return (
    <Toaster
      position="top-center"
      richColors
      closeButton
      style={toastColours as unknown as CSSProperties}
      toastOptions={{ className: "font-sans text-sm shadow-card", closeButton: true }}
    />
  );
}
