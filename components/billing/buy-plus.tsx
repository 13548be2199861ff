"use client";
// The two buy buttons (pricing page and billing page). The server starts a
// checkout through the SDK and answers with the hosted page's address; a
// second click while the first is on its way gets the same session.
import { useState, useTransition } from "react";
import { buyPlusAction } from "@/app/(driver)/account/billing/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export type BuyOption = { interval: "month" | "year"; label: string };

export function BuyPlus({ options }: { options: BuyOption[] }) {
  const [pending, start] = useTransition();
  const [which, setWhich] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  function buy(interval: "month" | "year") {
    setWhich(interval);
    setError(null);
    start(async () => {
      const r = await buyPlusAction({ interval });
      if (r.status === "ok") window.location.assign(r.data.url);
      else {
        setError(r.message);
        setWhich(null);
      }
    });
  }

  return (
    <div className="space-y-2">
      <div className="flex flex-col gap-2 sm:flex-row">
        {options.map((o, i) => (
          <Button
            key={o.interval}
            type="button"
            variant={i === 0 ? "primary" : "secondary"}
            onClick={() => buy(o.interval)}
            pending={pending && which === o.interval}
            disabled={pending}
            pendingLabel="Opening checkout…"
          >
            {o.label}
          </Button>
        ))}
      </div>
      {error ? <Alert tone="error">{error}</Alert> : null}
    </div>
  );
}
