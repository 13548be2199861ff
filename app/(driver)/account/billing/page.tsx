import Link from "next/link";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { AwaitingConfirmation } from "@/components/billing/awaiting-confirmation";
import { BuyPlus } from "@/components/billing/buy-plus";
import { PlanControls } from "@/components/billing/plan-controls";
import { Alert } from "@/components/ui/alert";
import { Card, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { currentSubscription, planOf } from "@/db/queries/billing";
import { reminderProfile } from "@/db/queries/reminders";
import { getSession } from "@/lib/auth/session";
import { formatMoney } from "@/lib/billing/config";
import { invoicesOf, plusPrices, type InvoiceLine, type PlusPrice } from "@/lib/billing/service";
import { stripe } from "@/lib/billing/stripe";
import { PLUS_ADDS } from "@/lib/plan";

export const dynamic = "force-dynamic";
export const metadata = { title: "Billing" };

function localeFrom(acceptLanguage: string | null): string {
  const first = (acceptLanguage ?? "").split(",")[0]?.split(";")[0]?.trim();
  try {
    return first ? Intl.getCanonicalLocales(first)[0] ?? "en-GB" : "en-GB";
  } catch {
    return "en-GB";
  }
}

const STATUS_WORDS: Record<string, string> = { paid: "Paid", open: "Payment due", void: "Void", uncollectible: "Not collected", draft: "Draft" };

export default async function BillingPage({ searchParams }: { searchParams: Promise<{ checkout?: string }> }) {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/account/billing");
  const userId = session.user.id;
  const { checkout } = await searchParams;
  const [profile, sub, plan, h] = await Promise.all([reminderProfile({ userId }), currentSubscription({ userId }), planOf({ userId }), headers()]);
  const timeZone = profile?.timezone ?? "UTC";
  const locale = localeFrom(h.get("accept-language"));
  const day = (d: Date) => new Intl.DateTimeFormat(locale, { day: "numeric", month: "long", year: "numeric", timeZone }).format(d);
  const money = (amount: number, currency: string) => formatMoney(amount, currency, locale);

  let prices: Record<"month" | "year", PlusPrice> | null = null;
  let invoices: InvoiceLine[] = [];
  let serviceError: string | null = null;
  try {
    [prices, invoices] = await Promise.all([plusPrices(), invoicesOf({ userId })]);
  } catch (err) {
    serviceError = err instanceof Error ? err.message : "The payment service did not answer.";
  }
  const openInvoice = invoices.find((i) => i.status === "open");
  let fixUrl = openInvoice?.url ?? null;
  if (sub?.status === "past_due" && !fixUrl) {
    // The subscription's latest invoice carries the payment page.
    const live = await stripe().subscriptions.retrieve(sub.stripeSubscriptionId, { expand: ["latest_invoice"] }).catch(() => null);
    const inv = live?.latest_invoice;
    fixUrl = inv && typeof inv === "object" ? (inv.hosted_invoice_url ?? null) : null;
  }

  const plus = plan === "plus";
  const interval = sub?.interval === "year" ? "year" : "month";
  const end = sub?.currentPeriodEnd ? day(sub.currentPeriodEnd) : null;
  const waiting = checkout === "done" && !plus;

  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <PageHeader title="Billing" description="Your plan, what it costs, and your invoices." />
      <p className="text-sm">
        <Link href="/account">← Account</Link>
      </p>
      {waiting ? <AwaitingConfirmation /> : null}
      {checkout === "done" && plus ? <Alert tone="success">Plus is on. Thank you!</Alert> : null}
      {checkout === "cancelled" ? <Alert tone="info">Checkout was cancelled; nothing was charged.</Alert> : null}
      {serviceError ? <Alert tone="error">{serviceError}</Alert> : null}

      <Card className="space-y-3">
        <CardTitle>Your plan: {plus ? "Plus" : "Free"}</CardTitle>
        {plus && sub ? (
          <dl className="grid gap-x-4 gap-y-1 text-asphalt-800 sm:grid-cols-[max-content_1fr]">
            <dt className="font-semibold">Price</dt>
            <dd data-testid="plan-price">
              {sub.amount != null && sub.currency ? money(sub.amount, sub.currency) : "—"} per {interval === "year" ? "year" : "month"}
            </dd>
            <dt className="font-semibold">{sub.cancelAtPeriodEnd ? "Ends on" : "Renews on"}</dt>
            <dd data-testid="plan-date">{end}</dd>
          </dl>
        ) : (
          <p className="text-asphalt-700">
            Free keeps the whole logbook, shop passes and the calendar feed with age and depth dates.
            {sub?.status === "canceled" && sub.endedAt ? ` Your Plus ended on ${day(sub.endedAt)}; your settings are kept for when you come back.` : ""}
          </p>
        )}

        {plus && sub?.status === "past_due" ? (
          <Alert tone="error" title="Your last payment failed">
            <p>Plus stays on while the payment is tried again. Pay the open invoice with another card to keep it.</p>
            {fixUrl ? (
              <a href={fixUrl} className="mt-2 inline-block font-semibold">
                Fix the payment
              </a>
            ) : null}
          </Alert>
        ) : null}
        {plus && sub?.cancelAtPeriodEnd ? <Alert tone="warning">Plus is cancelled and ends on {end}. Resume it to keep it renewing.</Alert> : null}

        {plus && sub && prices ? (
          <PlanControls
            cancelAtPeriodEnd={sub.cancelAtPeriodEnd}
            interval={interval}
            endDate={end ?? ""}
            otherLabel={`${money(prices[interval === "month" ? "year" : "month"].amount, prices.month.currency)} per ${interval === "month" ? "year" : "month"}`}
          />
        ) : null}

        {!plus && prices && !waiting ? (
          <div className="space-y-3">
            <p className="font-semibold text-asphalt-900">Plus adds:</p>
            <ul className="list-disc space-y-1 pl-5 text-asphalt-800">
              {PLUS_ADDS.map((f) => (
                <li key={f}>{f}</li>
              ))}
            </ul>
            <BuyPlus
              options={[
                { interval: "month", label: `Buy Plus monthly, ${money(prices.month.amount, prices.month.currency)}` },
                { interval: "year", label: `Buy Plus yearly, ${money(prices.year.amount, prices.year.currency)}` },
              ]}
            />
          </div>
        ) : null}
      </Card>

      <Card>
        <CardTitle>Invoices</CardTitle>
        {invoices.length === 0 ? (
          <p className="mt-2 text-asphalt-600">No invoices yet.</p>
        ) : (
          <ul className="mt-3 divide-y divide-asphalt-100" aria-label="Invoices">
            {invoices.map((i) => (
              <li key={i.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 py-2">
                <span className="min-w-0">
                  <span className="block font-semibold text-asphalt-900">{day(i.created)}</span>
                  <span className="block text-sm text-asphalt-600">
                    {i.number ?? i.id}
                    {i.periodStart && i.periodEnd ? ` · ${day(i.periodStart)} – ${day(i.periodEnd)}` : ""}
                  </span>
                </span>
                <span className="sm:text-right">
                  <span className="block font-semibold">{money(i.amount, i.currency)}</span>
                  <span className={i.status === "open" ? "block text-sm font-semibold text-condition-replace" : "block text-sm text-asphalt-600"}>
                    {STATUS_WORDS[i.status ?? ""] ?? i.status}
                    {i.url ? (
                      <>
                        {" · "}
                        <a href={i.url}>{i.status === "open" ? "Pay" : "View"}</a>
                      </>
                    ) : null}
                  </span>
                </span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
