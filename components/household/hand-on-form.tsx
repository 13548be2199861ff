"use client";
// The seller makes a one-time link for the next owner (or sends it), sees
// it once, and can withdraw it.
import { Copy } from "lucide-react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { toast } from "@/components/ui/toast";
import { useFormat } from "@/components/format/format-provider";
import { sendJson } from "@/components/passes/api";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardTitle } from "@/components/ui/card";
import { Field, Input } from "@/components/ui/field";
import { ConfirmButton } from "./confirm-button";

type Open = { id: string; toEmail: string | null; expiresAt: string } | null;

export function HandOnForm({ vehicleId, nickname, open }: { vehicleId: string; nickname: string; open: Open }) {
  const router = useRouter();
  const [email, setEmail] = useState("");
  const f = useFormat();
  const [includeReceipts, setIncludeReceipts] = useState(false);
  const [keepSnapshot, setKeepSnapshot] = useState(true);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [made, setMade] = useState<{ url: string; emailed: boolean; to: string | null } | null>(null);
  return (
    <div className="space-y-4">
      {open && !made ? (
        <Card className="space-y-2">
          <CardTitle>A link is open</CardTitle>
          <p className="text-sm">
            {open.toEmail ? `Sent to ${open.toEmail}` : "A link you passed on yourself"}, until {f.dateTime(open.expiresAt)}. Making a new one withdraws it.
          </p>
          <ConfirmButton
            variant="secondary"
            size="sm"
            title="Withdraw the link?"
            description="Whoever has it can no longer take on the vehicle."
            confirmLabel="Withdraw"
            onConfirm={async () => {
              const res = await sendJson(`/api/hand-ons/${open.id}`, { method: "DELETE" });
              if (!res.ok) toast.error(res.message);
              else toast.success("The link no longer works.");
              router.refresh();
            }}
          >
            Withdraw the link
          </ConfirmButton>
        </Card>
      ) : null}
      {made ? (
        <Alert tone="success" title={made.to ? (made.emailed ? `Sent to ${made.to}` : "Link made; the e-mail could not be sent") : "Your one-time link"}>
          <span className="block break-all font-mono text-sm" data-testid="hand-on-url">{made.url}</span>
          <Button
            size="sm"
            variant="secondary"
            className="mt-2"
            onClick={async () => {
              await navigator.clipboard?.writeText(made.url).catch(() => undefined);
              toast.success("Copied.");
            }}
          >
            <Copy aria-hidden className="size-4" />
            Copy the link
          </Button>
          <span className="mt-2 block text-sm">It is shown only now. It works once, for 14 days.</span>
        </Alert>
      ) : null}
      <Card>
        <form
          noValidate
          className="space-y-3"
          onSubmit={async (e) => {
            e.preventDefault();
            setError(null);
            setPending(true);
            const res = await sendJson<{ url: string; emailed: boolean }>(`/api/vehicles/${vehicleId}/hand-on`, { body: { email, includeReceipts, keepSnapshot } });
            setPending(false);
            if (!res.ok) {
              setError(res.fields?.email?.[0] ?? res.message);
              return;
            }
            setMade({ url: res.data.url, emailed: res.data.emailed, to: email || null });
            router.refresh();
          }}
        >
          <Field label="Send it to (optional)" hint="Leave empty to get a link you pass on yourself." error={error ?? undefined}>
            {({ id, describedBy, invalid }) => (
              <Input id={id} type="email" autoComplete="off" value={email} onChange={(e) => setEmail(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />
            )}
          </Field>
          <label className="flex items-start gap-2">
            <input type="checkbox" className="mt-1" checked={includeReceipts} onChange={(e) => setIncludeReceipts(e.target.checked)} />
            <span>Hand on the receipts too (prices and files). Otherwise they stay with you and are removed from the vehicle.</span>
          </label>
          <label className="flex items-start gap-2">
            <input type="checkbox" className="mt-1" checked={keepSnapshot} onChange={(e) => setKeepSnapshot(e.target.checked)} />
            <span>Keep a read-only copy of {nickname}&apos;s tire history as it is on the day.</span>
          </label>
          <Button type="submit" pending={pending} pendingLabel="Making the link…">
            Make the link
          </Button>
        </form>
      </Card>
    </div>
  );
}
