"use client";
// The owner's staff list: invite technicians by e-mail, withdraw an
// invitation, take someone off the staff. The server checks the owner role.
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { sendJson } from "@/components/passes/api";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";

type Staff = { memberId: string; name: string; email: string; role: "owner" | "technician" };
type Invite = { id: string; email: string; expired: boolean; expiresAt: string };

export function StaffManager({ shopId, staff, invitations }: { shopId: string; staff: Staff[]; invitations: Invite[] }) {
  const router = useRouter();
  const id = useId();
  const [email, setEmail] = useState("");
  const [fieldError, setFieldError] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState<string | null>(null);

  async function call(key: string, url: string, method: string, body?: unknown, ok?: string) {
    setBusy(key);
    setMessage(null);
    setFieldError(null);
    const res = await sendJson(url, { method, body });
    setBusy(null);
    if (!res.ok) {
      setMessage({ tone: "error", text: res.message });
      if (res.fields?.email) setFieldError(res.fields.email[0]);
      return false;
    }
    if (ok) setMessage({ tone: "success", text: ok });
    router.refresh();
    return true;
  }

  return (
    <div className="space-y-5">
      {message ? <Alert tone={message.tone}>{message.text}</Alert> : null}
      <ul className="divide-y divide-asphalt-100 rounded border border-asphalt-200">
        {staff.map((m) => (
          <li key={m.memberId} className="flex flex-wrap items-center justify-between gap-2 px-3 py-2">
            <span>
              <span className="font-semibold">{m.name}</span> <span className="text-sm text-asphalt-600">{m.email}</span>
              <span className="ml-2 rounded-full bg-asphalt-100 px-2 py-0.5 text-xs font-semibold text-asphalt-700">{m.role === "owner" ? "Owner" : "Technician"}</span>
            </span>
            {m.role === "technician" ? (
              <ConfirmDialog
                trigger={
                  <Button variant="ghost" size="sm" pending={busy === m.memberId} pendingLabel="Removing…">
                    Remove {m.name.split(" ")[0]}
                  </Button>
                }
                title={`Remove ${m.name} from the staff?`}
                description={<p>{m.name} can no longer open the shop&apos;s passes or record work. Their own logbook stays theirs. You can invite them again later.</p>}
                confirmLabel={`Remove ${m.name.split(" ")[0]}`}
                onConfirm={() => call(m.memberId, `/api/shops/${shopId}/staff/${m.memberId}`, "DELETE", undefined, `${m.name} is no longer on the staff.`)}
              />
            ) : null}
          </li>
        ))}
      </ul>

      {invitations.length > 0 ? (
        <div>
          <h3 className="mb-2 font-semibold">Invitations sent</h3>
          <ul className="divide-y divide-asphalt-100 rounded border border-asphalt-200">
            {invitations.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 px-3 py-2">
                <span>
                  {i.email} <span className="text-sm text-asphalt-600">{i.expired ? "· expired" : "· waiting to be accepted"}</span>
                </span>
                <Button variant="ghost" size="sm" pending={busy === i.id} pendingLabel="Withdrawing…" onClick={() => call(i.id, `/api/shops/${shopId}/invitations/${i.id}`, "DELETE")}>
                  Withdraw
                </Button>
              </li>
            ))}
          </ul>
        </div>
      ) : null}

      <form
        noValidate
        className="space-y-2"
        onSubmit={async (e) => {
          e.preventDefault();
          if (await call("invite", `/api/shops/${shopId}/invitations`, "POST", { email }, `An invitation went to ${email}. The link works once, for three days.`)) setEmail("");
        }}
      >
        <label htmlFor={`${id}-e`} className="block text-sm font-semibold text-asphalt-800">
          Invite a technician by e-mail
        </label>
        <div className="flex flex-wrap gap-2">
          <Input
            id={`${id}-e`}
            type="email"
            autoComplete="off"
            className="max-w-sm"
            value={email}
            onChange={(e) => setEmail(e.target.value)}
            aria-invalid={!!fieldError}
            aria-describedby={fieldError ? `${id}-err` : undefined}
          />
          <Button type="submit" pending={busy === "invite"} pendingLabel="Sending…">
            Send the invitation
          </Button>
        </div>
        {fieldError ? (
          <p id={`${id}-err`} className="text-sm font-semibold text-condition-replace">
            {fieldError}
          </p>
        ) : null}
      </form>
    </div>
  );
}
