"use client";
// The one button behind a one-time link (co-keeper invitation, hand-on).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/components/passes/api";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export function AcceptLink({ url, token, label, pendingLabel, goTo }: { url: string; token: string; label: string; pendingLabel: string; goTo: string | ((data: { vehicleId: string }) => string) }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <div className="space-y-3">
      {error ? <Alert tone="error">{error}</Alert> : null}
      <Button
        size="lg"
        className="w-full"
        pending={pending}
        pendingLabel={pendingLabel}
        onClick={async () => {
          setPending(true);
          setError(null);
          const res = await sendJson<{ vehicleId: string }>(url, { body: { token } });
          if (!res.ok) {
            setPending(false);
            setError(res.message);
            return;
          }
          router.push(typeof goTo === "string" ? goTo : goTo(res.data));
          router.refresh();
        }}
      >
        {label}
      </Button>
    </div>
  );
}
