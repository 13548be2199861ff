"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/components/passes/api";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export function AcceptInvitation({ invitationId, shopName }: { invitationId: string; shopName: string }) {
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
        pendingLabel="Joining…"
        onClick={async () => {
          setPending(true);
          setError(null);
          const res = await sendJson(`/api/shops/join/${invitationId}`);
          if (!res.ok) {
            setPending(false);
            setError(res.message);
            return;
          }
          router.push("/shop");
          router.refresh();
        }}
      >
        Join {shopName}
      </Button>
    </div>
  );
}
