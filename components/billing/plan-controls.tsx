"use client";
// Cancel at period end (asks first), resume, and the switch between monthly
// and yearly (asks first: it starts a new period and bills it now).
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { cancelPlusAction, resumePlusAction, switchIntervalAction } from "@/app/(driver)/account/billing/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

type Props = {
  cancelAtPeriodEnd: boolean;
  interval: "month" | "year";
  endDate: string;
  otherLabel: string;
};

export function PlanControls({ cancelAtPeriodEnd, interval, endDate, otherLabel }: Props) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [asking, setAsking] = useState<"cancel" | "switch" | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const other = interval === "month" ? "year" : "month";

  function run(kind: "cancel" | "resume" | "switch") {
    setBusy(kind);
    setMessage(null);
    start(async () => {
      const r = kind === "cancel" ? await cancelPlusAction({}) : kind === "resume" ? await resumePlusAction({}) : await switchIntervalAction({ interval: other });
      setBusy(null);
      setAsking(null);
      if (r.status !== "ok") return setMessage({ tone: "error", text: r.message });
      setMessage({
        tone: "success",
        text: kind === "cancel" ? `Plus will end on ${endDate}. You can resume it until then.` : kind === "resume" ? "Plus will renew as before." : `You are now billed ${other === "year" ? "yearly" : "monthly"}.`,
      });
      router.refresh();
    });
  }

  return (
    <div className="space-y-3">
      {message ? <Alert tone={message.tone}>{message.text}</Alert> : null}
      <div className="flex flex-wrap gap-2">
        {cancelAtPeriodEnd ? (
          <Button onClick={() => run("resume")} pending={busy === "resume"} pendingLabel="Resuming…" disabled={pending}>
            Resume Plus
          </Button>
        ) : asking === "cancel" ? (
          <div className="w-full space-y-2 rounded border border-condition-replace/40 p-3">
            <p className="text-sm text-asphalt-800">
              Plus stays on until {endDate}, then this account returns to Free. Your settings are kept. Cancel at the end of the period?
            </p>
            <div className="flex flex-wrap gap-2">
              <Button variant="danger" onClick={() => run("cancel")} pending={busy === "cancel"} pendingLabel="Cancelling…" disabled={pending}>
                Yes, cancel at period end
              </Button>
              <Button variant="ghost" onClick={() => setAsking(null)} disabled={pending}>
                Keep Plus
              </Button>
            </div>
          </div>
        ) : (
          <Button variant="secondary" onClick={() => setAsking("cancel")} disabled={pending}>
            Cancel Plus
          </Button>
        )}
        {!cancelAtPeriodEnd && asking !== "cancel" ? (
          asking === "switch" ? (
            <div className="w-full space-y-2 rounded border border-asphalt-300 p-3">
              <p className="text-sm text-asphalt-800">
                Switching starts a new {other === "year" ? "yearly" : "monthly"} period today at {otherLabel}, less the unused part of the current period. Switch now?
              </p>
              <div className="flex flex-wrap gap-2">
                <Button onClick={() => run("switch")} pending={busy === "switch"} pendingLabel="Switching…" disabled={pending}>
                  Yes, switch to {other === "year" ? "yearly" : "monthly"}
                </Button>
                <Button variant="ghost" onClick={() => setAsking(null)} disabled={pending}>
                  Keep {interval === "year" ? "yearly" : "monthly"}
                </Button>
              </div>
            </div>
          ) : (
            <Button variant="secondary" onClick={() => setAsking("switch")} disabled={pending}>
              Switch to {other === "year" ? "yearly" : "monthly"}
            </Button>
          )
        ) : null}
      </div>
    </div>
  );
}
