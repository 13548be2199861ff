"use client";
import { Button } from "./button";

/** The submit and cancel pair at the foot of a small inline form. */
export function FormActions({
  pending,
  submitLabel,
  pendingLabel = "Saving…",
  onCancel,
}: {
  pending: boolean;
  submitLabel: string;
  pendingLabel?: string;
  onCancel: () => void;
}) {
  return (
    <div className="flex gap-2">
      <Button type="submit" size="sm" pending={pending} pendingLabel={pendingLabel}>
        {submitLabel}
      </Button>
      <Button type="button" size="sm" variant="ghost" onClick={onCancel}>
        Cancel
      </Button>
    </div>
  );
}
