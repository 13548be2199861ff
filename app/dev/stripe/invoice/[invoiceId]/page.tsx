import { headers } from "next/headers";
import Link from "next/link";
import { notFound } from "next/navigation";
import { FakeCardForm } from "@/components/billing/fake/card-form";
import { TestCards } from "@/components/billing/fake/test-cards";
import { getFakeObject } from "@/db/queries/fake-stripe";
import { formatMoney } from "@/lib/billing/config";
import { fakeStripeAllowed } from "@/lib/billing/fake-gate";
import { viewerFormat } from "@/lib/format/server";
import { payInvoiceAction } from "../../actions";

export const dynamic = "force-dynamic";
export const metadata = { title: "Invoice (local payment fake)", robots: { index: false } };

// The local fake's stand-in for Stripe's hosted invoice page: see an invoice,
// or pay an open one with another card (the "fix the payment" path).
export default async function FakeInvoicePage({ params }: { params: Promise<{ invoiceId: string }> }) {
  if (!(await fakeStripeAllowed(await headers()))) notFound();
  const { invoiceId } = await params;
  const row = await getFakeObject({ id: invoiceId, type: "invoice" });
  if (!row) notFound();
  const i = row.data as { number: string; status: string; amount_due: number; amount_paid: number; currency: string; period_start: number; period_end: number };
  const f = await viewerFormat();
  const day = (s: number) => f.dateOf(s * 1000);
  return (
    <main className="mx-auto max-w-md space-y-5 px-4 py-8">
      <p className="rounded bg-asphalt-900 px-3 py-1 text-center text-xs font-semibold uppercase tracking-wide text-white">Local payment fake · test mode · no real money</p>
      <div>
        <h1 className="text-2xl font-bold">Invoice {i.number}</h1>
        <p className="text-asphalt-800">
          Fourpatch Plus, {day(i.period_start)} to {day(i.period_end)}
        </p>
        <p className="text-lg font-semibold">
          {formatMoney(i.status === "paid" ? i.amount_paid : i.amount_due, i.currency)} · {i.status === "paid" ? "Paid" : i.status === "open" ? "Payment due" : i.status}
        </p>
      </div>
      {i.status === "open" ? (
        <>
          <FakeCardForm id={invoiceId} submit={payInvoiceAction} payLabel={`Pay ${formatMoney(i.amount_due, i.currency)}`} paidMessage="Paid. Thank you." />
          <TestCards />
        </>
      ) : null}
      <Link href="/account/billing" className="block text-center">
        Back to billing
      </Link>
    </main>
  );
}
