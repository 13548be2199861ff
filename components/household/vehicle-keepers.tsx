"use client";
// Who keeps the vehicle with its owner, and the way to hand it on: read from
// the server after the page is shown (vehicle-sharing.tsx loads this), since
// neither is in the page's own data.
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { Send, UserPlus } from "lucide-react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { toast } from "@/components/ui/toast";
import { api } from "@/components/logbook/api";
import { sendJson } from "@/components/passes/api";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { buttonVariants } from "@/components/ui/button-variants";
import { Card, CardTitle } from "@/components/ui/card";
import { Field, Input } from "@/components/ui/field";
import type { KeeperRow } from "@/db/queries/keepers";
import { ConfirmButton } from "./confirm-button";

type Keepers = { role: "owner" | "keeper"; owner: { name: string }; keepers: KeeperRow[]; myKeeperId: string | null };

const keepersKey = (vehicleId: string) => ["keepers", vehicleId];

/** One request for both parts below: they share the page's query client. */
function useKeepers(vehicleId: string) {
  return useQuery({ queryKey: keepersKey(vehicleId), queryFn: () => api<Keepers>(`/api/vehicles/${vehicleId}/keepers`) }).data;
}

export function HandOnLink({ vehicleId }: { vehicleId: string }) {
  const data = useKeepers(vehicleId);
  return data?.role === "owner" ? (
    <Link href={`/vehicles/${vehicleId}/hand-on`} className={buttonVariants({ variant: "secondary" })}>
      <Send aria-hidden className="size-4" />
      Hand on to the next owner
    </Link>
  ) : null;
}

export function KeepersPanel({ vehicleId, nickname }: { vehicleId: string; nickname: string }) {
  const qc = useQueryClient();
  const router = useRouter();
  const key = keepersKey(vehicleId);
  const data = useKeepers(vehicleId);
  const [email, setEmail] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  const end = async (id: string, self: boolean) => {
    const res = await sendJson(`/api/keepers/${id}`, { method: "DELETE" });
    if (!res.ok) {
      toast.error(res.message);
      return;
    }
    if (self) {
      toast.success(`You no longer keep ${nickname}.`);
      router.push("/vehicles");
      router.refresh();
      return;
    }
    toast.success("Done.");
    await qc.invalidateQueries({ queryKey: key });
  };

  return (
    <>
      {data?.role === "keeper" ? (
        <Card className="space-y-2">
          <p>
            You keep this logbook with <strong>{data.owner.name}</strong>, its owner. What you add shows your name.
          </p>
          {data.myKeeperId ? (
            <ConfirmButton
              variant="secondary"
              size="sm"
              title={`Stop keeping ${nickname}?`}
              description={`The vehicle leaves your list and its reminders stop for you. What you added stays in ${data.owner.name}'s logbook.`}
              confirmLabel="Stop keeping it"
              onConfirm={() => end(data.myKeeperId!, true)}
            >
              Stop keeping this logbook
            </ConfirmButton>
          ) : null}
        </Card>
      ) : null}
      {data?.role === "owner" ? (
        <Card className="space-y-3">
          <CardTitle>Co-keepers</CardTitle>
          <p className="text-sm text-asphalt-700">
            Someone of your household can keep this logbook with you: see it, record checks and purchases, and get its reminders. Only you delete
            the vehicle, hand it on, give shop passes or change who keeps it.
          </p>
          {data.keepers.length === 0 ? <p className="text-sm text-asphalt-600">Nobody else keeps it yet.</p> : null}
          <ul className="divide-y divide-asphalt-100" data-testid="keeper-list">
            {data.keepers.map((k) => (
              <li key={k.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span className="min-w-0 break-words">
                  <strong>{k.name ?? k.email}</strong>
                  <span className="block text-sm text-asphalt-600">{k.state === "active" ? `Co-keeper · ${k.email}` : `Invited · ${k.email}`}</span>
                </span>
                <ConfirmButton
                  variant="secondary"
                  size="sm"
                  title={k.state === "active" ? `End keeping with ${k.name ?? k.email}?` : `Withdraw the invitation to ${k.email}?`}
                  description={k.state === "active" ? "They lose the logbook at once. What they added stays in it, with their name." : "The link in their e-mail stops working."}
                  confirmLabel={k.state === "active" ? "End it" : "Withdraw"}
                  onConfirm={() => end(k.id, false)}
                >
                  {k.state === "active" ? "End" : "Withdraw"}
                </ConfirmButton>
              </li>
            ))}
          </ul>
          <form
            noValidate
            className="flex flex-wrap items-end gap-2"
            onSubmit={async (e) => {
              e.preventDefault();
              setPending(true);
              setError(null);
              const res = await sendJson<{ emailed: boolean }>(`/api/vehicles/${vehicleId}/keepers`, { body: { email } });
              setPending(false);
              if (!res.ok) {
                setError(res.fields?.email?.[0] ?? res.message);
                return;
              }
              setEmail("");
              toast.success(res.data.emailed ? "Invitation sent." : "Invitation made, but the e-mail could not be sent. Try again later.");
              await qc.invalidateQueries({ queryKey: key });
            }}
          >
            <Field label="Invite by e-mail" error={error ?? undefined} className="min-w-0 flex-1">
              {({ id, describedBy, invalid }) => (
                <Input id={id} type="email" autoComplete="off" value={email} onChange={(e) => setEmail(e.target.value)} aria-describedby={describedBy} aria-invalid={invalid} />
              )}
            </Field>
            <Button type="submit" pending={pending} pendingLabel="Inviting…">
              <UserPlus aria-hidden className="size-4" />
              Invite
            </Button>
          </form>
        </Card>
      ) : null}
      {error && !data ? <Alert tone="error">{error}</Alert> : null}
    </>
  );
}
