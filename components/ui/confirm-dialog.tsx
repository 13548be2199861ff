"use client";
// The one confirmation before anything is removed or broken
// (./confirm-dialog-modal.tsx: a modal alert dialog, focus kept inside,
// Escape cancels, the safe choice focused first). Until its trigger is first
// pressed only the trigger is drawn: the dialog library loads then (or as the
// pointer or focus reaches the trigger) and the dialog opens, so it is not on
// the first load of every page with a delete button.
import { cloneElement, isValidElement, useState, type ComponentType, type MouseEvent, type ReactElement } from "react";
import type { ConfirmDialogProps } from "./confirm-dialog-modal";

type Modal = ComponentType<ConfirmDialogProps & { initiallyOpen?: boolean }>;
const load = () => import("./confirm-dialog-modal").then((m) => m.ConfirmDialogModal as Modal);

export function ConfirmDialog(props: ConfirmDialogProps) {
  const [Loaded, setLoaded] = useState<Modal | null>(null);
  if (Loaded) return <Loaded {...props} initiallyOpen />;
  const trigger = props.trigger;
  if (!isValidElement(trigger)) return <>{trigger}</>;
  const own = (trigger as ReactElement<{ onClick?: (e: MouseEvent<HTMLElement>) => void }>).props;
  const preload = () => void load().catch(() => undefined);
  return cloneElement(trigger as ReactElement<Record<string, unknown>>, {
    "aria-haspopup": "dialog",
    onPointerEnter: preload,
    onFocus: preload,
    onClick: (e: MouseEvent<HTMLElement>) => {
      own.onClick?.(e);
      if (e.defaultPrevented) return;
      void load().then((m) => setLoaded(() => m), () => undefined);
    },
  });
}
