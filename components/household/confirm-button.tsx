"use client";
// A button that asks before it does something that cannot be taken back
// (./confirm-button-modal.tsx). Until first pressed only the button is
// drawn; the dialog library loads then (or when the pointer or focus reaches
// it) and the question opens, so it is not on the page's first load.
import { useState, type ComponentType } from "react";
import { Button } from "@/components/ui/button";
import type { ConfirmButtonProps } from "./confirm-button-modal";

type Modal = ComponentType<ConfirmButtonProps & { initiallyOpen?: boolean }>;
const load = () => import("./confirm-button-modal").then((m) => m.ConfirmButtonModal as Modal);

export function ConfirmButton(props: ConfirmButtonProps) {
  const [Loaded, setLoaded] = useState<Modal | null>(null);
  if (Loaded) return <Loaded {...props} initiallyOpen />;
  const { title: _title, description: _description, confirmLabel: _confirmLabel, onConfirm: _onConfirm, children, ...buttonProps } = props;
  const preload = () => void load().catch(() => undefined);
  return (
    <Button
      {...buttonProps}
      aria-haspopup="dialog"
      onPointerEnter={preload}
      onFocus={preload}
      onClick={() => void load().then((m) => setLoaded(() => m), () => undefined)}
    >
      {children}
    </Button>
  );
}
