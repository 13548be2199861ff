"use client";
// A button that asks before it does something that cannot be taken back.
// Loaded when first pressed (./confirm-button.tsx), then shown opened.
import { AlertDialog } from "radix-ui";
import { useState, type ReactNode } from "react";
import { Button, type ButtonProps } from "@/components/ui/button";
import { buttonVariants } from "@/components/ui/button-variants";

export type ConfirmButtonProps = Omit<ButtonProps, "onClick"> & { title: string; description: ReactNode; confirmLabel: string; onConfirm: () => Promise<void> | void };

export function ConfirmButtonModal({
  title,
  description,
  confirmLabel,
  onConfirm,
  children,
  initiallyOpen = false,
  ...buttonProps
}: ConfirmButtonProps & { initiallyOpen?: boolean }) {
  const [open, setOpen] = useState(initiallyOpen);
  const [busy, setBusy] = useState(false);
  return (
    <AlertDialog.Root open={open} onOpenChange={setOpen}>
      <AlertDialog.Trigger asChild>
        <Button {...buttonProps} pending={busy || buttonProps.pending}>
          {children}
        </Button>
      </AlertDialog.Trigger>
      <AlertDialog.Portal>
        <AlertDialog.Overlay className="fixed inset-0 z-40 bg-asphalt-900/40" />
        <AlertDialog.Content className="fixed left-1/2 top-1/2 z-50 w-[min(92vw,28rem)] -translate-x-1/2 -translate-y-1/2 space-y-3 rounded-lg bg-white p-5 shadow-lg">
          <AlertDialog.Title className="text-lg font-bold">{title}</AlertDialog.Title>
          <AlertDialog.Description className="text-sm text-asphalt-700">{description}</AlertDialog.Description>
          <div className="flex flex-wrap justify-end gap-2">
            <AlertDialog.Cancel className={buttonVariants({ variant: "secondary" })}>Keep it</AlertDialog.Cancel>
            <AlertDialog.Action
              className={buttonVariants({ variant: "danger" })}
              onClick={async () => {
                setBusy(true);
                try {
                  await onConfirm();
                } finally {
                  setBusy(false);
                }
              }}
            >
              {confirmLabel}
            </AlertDialog.Action>
          </div>
        </AlertDialog.Content>
      </AlertDialog.Portal>
    </AlertDialog.Root>
  );
}
