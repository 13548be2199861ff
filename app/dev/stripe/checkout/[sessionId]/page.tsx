import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { FakeCardForm } from "@/components/billing/fake/card-form";
import { TestCards } from "@/components/billing/fake/test-cards";
import { getFakeObject } from "@/db/queries/fake-stripe";
import { formatMoney } from "@/lib/billing/config";
import { fakeStripeAllowed } from "@/lib/billing/fake-gate";
import { payCheckoutAction } from "../../actions";

export const dynamic = "force-dynamic";
export const metadata = { title: "Checkout (local payment fake)", robots: { index: false } };

// The local fake's stand-in for Stripe's hosted checkout page. It exists only
// while no real Stripe key is set, on a loopback address.
export default async function FakeCheckoutPage({ params }: { params: Promise<{ sessionId: string }> }) {
  if (!(await fakeStripeAllowed(await headers()))) notFound();
  const { sessionId } = await params;
  const row = await getFakeObject({ id: sessionId, type: "checkout.session" });
  if (!row) notFound();
  const s = row.data as { status: string; amount_total: number; currency: string; success_url: string; cancel_url: string | null; id: string };
  const price = row.fakeFlags.priceId ? await getFakeObject({ id: String(row.fakeFlags.priceId), type: "price" }) : null;
  const interval = (price?.data.recurring as { interval?: string } | undefined)?.interval === "year" ? "year" : "month";
  return (
    <main className="mx-auto max-w-md space-y-5 px-4 py-8">
      <p className="rounded bg-asphalt-900 px-3 py-1 text-center text-xs font-semibold uppercase tracking-wide text-white">Local payment fake · test mode · no real money</p>
      <div>
        <h1 className="text-2xl font-bold">Fourpatch Plus</h1>
        <p className="text-lg text-asphalt-800">
          {formatMoney(s.amount_total, s.currency)} per {interval}
        </p>
      </div>
      {s.status !== "open" ? (
        <div className="space-y-3">
          <p>This checkout is already {s.status === "complete" ? "paid" : s.status}.</p>
          <a href={s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id)} className="font-semibold">
            Back to Fourpatch
          </a>
        </div>
      ) : (
        <>
          <FakeCardForm id={sessionId} submit={payCheckoutAction} payLabel={`Pay ${formatMoney(s.amount_total, s.currency)} and subscribe`} />
          <TestCards />
          {s.cancel_url ? (
            <a href={s.cancel_url} className="block text-center">
              Cancel and go back
            </a>
          ) : null}
        </>
      )}
    </main>
  );
}
