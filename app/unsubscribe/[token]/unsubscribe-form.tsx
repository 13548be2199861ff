"use client";
import { useActionState } from "react";
import { Alert } from "@/components/ui/alert";
import { SubmitButton } from "@/components/ui/button";
import { changeSubscription, type UnsubscribeState } from "./actions";

export function UnsubscribeForm({ token, label, alreadyOff }: { token: string; label: string; alreadyOff: boolean }) {
  const [state, act] = useActionState<UnsubscribeState, FormData>(changeSubscription, { status: alreadyOff ? "off" : "idle" });
  if (state.status === "invalid") return <Alert tone="error">This link is not valid any more. Sign in and change your e-mail choices on the Reminders page.</Alert>;
  const off = state.status === "off";
  return (
    <form action={act} className="space-y-4">
      <input type="hidden" name="token" value={token} />
      {off ? (
        <>
          <Alert tone="success" title="Done">
            You will get no more {label}. Your calendar feed and your logbook stay as they are.
          </Alert>
          <SubmitButton name="choice" value="resubscribe" variant="secondary" pendingLabel="Switching back on…">
            Send them again
          </SubmitButton>
        </>
      ) : (
        <>
          {state.status === "on" ? <Alert tone="success">They are back on: you will get {label} again.</Alert> : null}
          <p className="text-asphalt-700">Stop {label} for this account? Other messages, such as password resets, still arrive.</p>
          <SubmitButton name="choice" value="unsubscribe" pendingLabel="Stopping…">
            Stop {label}
          </SubmitButton>
        </>
      )}
    </form>
  );
}
