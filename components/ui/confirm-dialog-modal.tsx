"use client";
// The one confirmation before anything is removed or broken: a modal alert
// dialog (focus kept inside, Escape cancels, the safe choice focused first)
// that says what happens and names the thing. Loaded when its trigger is
// first pressed (./confirm-dialog.tsx), then shown opened.
import { AlertDialog } from "radix-ui";
import { useState, type ReactNode } from "react";
import { Button } from "./button";

export type ConfirmDialogProps = {
  /** The control that opens the dialog (a Button). */
  trigger: ReactNode;
  title: string;
  description: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  /** Runs on confirm; the dialog stays open with a pending button until it settles. */
  onConfirm: () => Promise<unknown> | void;
  tone?: "danger" | "primary";
};

export function ConfirmDialogModal({
  trigger,
  title,
  description,
  confirmLabel,
  cancelLabel = "Keep it",
  onConfirm,
  tone = "danger",
  initiallyOpen = false,
}: ConfirmDialogProps & { initiallyOpen?: boolean }) {
  const [open, setOpen] = useState(initiallyOpen);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <AlertDialog.Root
      open={open}
      onOpenChange={(o) => {
        if (!pending) setOpen(o);
        if (o) setError(null);
      }}
    >
      <AlertDialog.Trigger asChild>{trigger}</AlertDialog.Trigger>
      <AlertDialog.Portal>
        <AlertDialog.Overlay className="fixed inset-0 z-40 bg-asphalt-950/50" />
        <AlertDialog.Content className="fixed left-1/2 top-1/2 z-50 w-[calc(100vw-2rem)] max-w-md -translate-x-1/2 -translate-y-1/2 space-y-4 rounded-lg bg-white p-5 shadow-xl">
          <AlertDialog.Title className="text-lg font-bold text-asphalt-950">{title}</AlertDialog.Title>
          <AlertDialog.Description asChild>
            <div className="text-asphalt-800">{description}</div>
          </AlertDialog.Description>
          {error ? (
            <p role="alert" className="text-sm font-semibold text-condition-replace">
              {error}
            </p>
          ) : null}
          <div className="flex flex-wrap justify-end gap-2">
            <AlertDialog.Cancel asChild>
              <Button type="button" variant="secondary" disabled={pending}>
                {cancelLabel}
              </Button>
            </AlertDialog.Cancel>
            <Button
              type="button"
              variant={tone}
              pending={pending}
              onClick={async () => {
                setPending(true);
                try {
                  await onConfirm();
                  setOpen(false);
                } catch (e) {
                  setError(e instanceof Error ? e.message : "That did not work. Try again.");
                } finally {
                  setPending(false);
                }
              }}
            >
              {confirmLabel}
            </Button>
          </div>
        </AlertDialog.Content>
      </AlertDialog.Portal>
    </AlertDialog.Root>
  );
}
