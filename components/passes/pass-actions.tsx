"use client";
// Extend or withdraw one of the driver's passes.
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { toast } from "@/components/ui/toast";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/field";
import { PASS_PRESETS } from "@/lib/validation/pass-labels";
import { sendJson } from "./api";

export function PassActions({ passId, shopName }: { passId: string; shopName: string }) {
  const router = useRouter();
  const id = useId();
  const [duration, setDuration] = useState("24h");
  const [busy, setBusy] = useState<"extend" | "revoke" | null>(null);
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<{ tone: "error"; text: string } | null>(null);

  async function run(kind: "extend" | "revoke") {
    setBusy(kind);
    setMessage(null);
    const res = await sendJson(`/api/passes/${passId}/${kind}`, { body: kind === "extend" ? { duration } : {} });
    setBusy(null);
    setConfirming(false);
    if (!res.ok) return setMessage({ tone: "error", text: res.message });
    // A toast, not an inline message: a withdrawn pass leaves the list on refresh, and its card with it.
    toast.success(kind === "extend" ? "The pass lasts longer now." : `${shopName} can no longer open the logbook.`);
    router.refresh();
  }

  return (
    <div className="space-y-2">
      {message ? <Alert tone={message.tone}>{message.text}</Alert> : null}
      <div className="flex flex-wrap items-end gap-2">
        <div>
          <label htmlFor={`${id}-d`} className="block text-sm font-semibold text-asphalt-800">
            Extend by
          </label>
          <Select id={`${id}-d`} value={duration} onChange={(e) => setDuration(e.target.value)} className="w-auto">
            {PASS_PRESETS.map((p) => (
              <option key={p.value} value={p.value}>
                {p.label}
              </option>
            ))}
          </Select>
        </div>
        <Button variant="secondary" onClick={() => run("extend")} pending={busy === "extend"} pendingLabel="Extending…">
          Extend
        </Button>
        {confirming ? (
          <>
            <Button variant="danger" onClick={() => run("revoke")} pending={busy === "revoke"} pendingLabel="Ending the pass…">
              Yes, end it now
            </Button>
            <Button variant="ghost" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
          </>
        ) : (
          <Button variant="danger" onClick={() => setConfirming(true)}>
            End the pass now
          </Button>
        )}
      </div>
    </div>
  );
}
