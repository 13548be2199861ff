"use client";
import { useState } from "react";
import { toast } from "@/components/ui/toast";
import { ConfirmButton } from "@/components/household/confirm-button";
import { setAccountDisabled } from "../actions";

export function DisableToggle({ userId, disabled, name }: { userId: string; disabled: boolean; name: string }) {
  const [error, setError] = useState<string | null>(null);
  return (
    <div>
      <ConfirmButton
        size="sm"
        variant={disabled ? "secondary" : "danger"}
        aria-label={`${disabled ? "Enable" : "Disable"} ${name}`}
        title={disabled ? `Enable ${name} again?` : `Disable ${name}?`}
        description={
          disabled
            ? "They can sign in again; their passes and calendar feed work again while they last."
            : "They are signed out everywhere at once and cannot sign in; the passes they gave stop, and their calendar feed stops. Their data stays. The audit log records this."
        }
        confirmLabel={disabled ? "Enable" : "Disable"}
        onConfirm={async () => {
          setError(null);
          const res = await setAccountDisabled({ userId, disable: disabled ? "false" : "true" });
          if (res.status === "error") setError(res.message);
          else toast.success(`${name} is ${res.data.disabled ? "disabled" : "enabled again"}.`);
        }}
      >
        {disabled ? "Enable" : "Disable"}
      </ConfirmButton>
      {error ? <p role="alert" className="mt-1 text-xs text-condition-replace">{error}</p> : null}
    </div>
  );
}
