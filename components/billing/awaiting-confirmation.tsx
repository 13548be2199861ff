"use client";
// After the checkout's success redirect: the plan changes only when Stripe's
// webhook arrives, so the page looks again every two seconds for a minute.
import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { Alert } from "@/components/ui/alert";

export function AwaitingConfirmation() {
  const router = useRouter();
  const [tries, setTries] = useState(0);
  useEffect(() => {
    if (tries >= 30) return;
    const t = setTimeout(() => {
      setTries((n) => n + 1);
      router.refresh();
    }, 2000);
    return () => clearTimeout(t);
  }, [tries, router]);
  return (
    <Alert tone="info" title="Waiting for confirmation">
      {tries >= 30
        ? "The payment service has not confirmed the payment yet. This page will show Plus as soon as it does; reload it in a minute."
        : "Thank you. Plus switches on as soon as the payment service confirms the payment; this takes a few seconds."}
    </Alert>
  );
}
