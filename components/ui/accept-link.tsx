"use client";
// The one button behind a one-time link: a shop invitation, a co-keeper
// invitation, a hand-on. It posts (with the link's token, when it has one) and
// goes on, or shows the refusal and lets the person try again.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/components/passes/api";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export function AcceptLink({ url, token, label, pendingLabel, goTo }: { url: string; token?: string; label: string; pendingLabel: string; goTo: string }) {
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
          const res = await sendJson(url, { body: token === undefined ? undefined : { token } });
          if (!res.ok) {
            setPending(false);
            setError(res.message);
            return;
          }
          router.push(goTo);
          router.refresh();
        }}
      >
        {label}
      </Button>
    </div>
  );
}
