"use client";
import { useState, useTransition } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { setAccountDisabled } from "../actions";

export function DisableToggle({ userId, disabled, name }: { userId: string; disabled: boolean; name: string }) {
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <div>
      <Button
        size="sm"
        variant={disabled ? "secondary" : "danger"}
        pending={pending}
        pendingLabel={disabled ? "Enabling…" : "Disabling…"}
        aria-label={`${disabled ? "Enable" : "Disable"} ${name}`}
        onClick={() =>
          start(async () => {
            setError(null);
            const res = await setAccountDisabled({ userId, disable: disabled ? "false" : "true" });
            if (res.status === "error") setError(res.message);
            else toast.success(`${name} is ${res.data.disabled ? "disabled" : "enabled again"}.`);
          })
        }
      >
        {disabled ? "Enable" : "Disable"}
      </Button>
      {error ? <p role="alert" className="mt-1 text-xs text-condition-replace">{error}</p> : null}
    </div>
  );
}
