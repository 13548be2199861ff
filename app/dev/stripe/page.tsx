import { headers } from "next/headers";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Brand } from "@/components/shell/brand";
import { listFakeObjects } from "@/db/queries/fake-stripe";
import { formatMoney } from "@/lib/billing/config";
import { fakeStripeAllowed } from "@/lib/billing/fake-gate";
import { fakeWebhookUrl } from "@/lib/billing/fake/engine";
import { viewerFormat } from "@/lib/format/server";
import { advanceAction, failNextAction, redeliverAction } from "./actions";

export const dynamic = "force-dynamic";
export const metadata = { title: "Payments fake (developer page)", robots: { index: false } };

type Sub = { id: string; customer: string; status: string; cancel_at_period_end: boolean; items: { data: { price: { unit_amount: number; currency: string; recurring: { interval: string } }; current_period_end: number }[] } };

// Development only, like the outbox: the local Stripe fake's customers,
// subscriptions and events, and the buttons that move a subscription through
// its life (renewal, failed renewal, the end of a cancelled period).
export default async function FakeStripePage() {
  if (!(await fakeStripeAllowed(await headers()))) notFound();
  // Moments in the viewer's own zone (lib/format), like every other page.
  const f = await viewerFormat();
  const when = (s: number) => f.dateTime(s * 1000);
  const [customers, subs, events] = await Promise.all([
    listFakeObjects({ type: "customer", limit: 100 }),
    listFakeObjects({ type: "subscription", limit: 100 }),
    listFakeObjects({ type: "event", limit: 60 }),
  ]);
  const emailOf = new Map(customers.map((c) => [c.id, String(c.data.email ?? c.id)]));
  return (
    <main className="mx-auto max-w-5xl space-y-8 px-4 py-8">
      <div>
        <Brand />
        <h1 className="mt-6 text-2xl font-bold">Payments fake</h1>
        <p className="text-asphalt-600">
          The local stand-in for Stripe, used while no STRIPE_SECRET_KEY is set. Webhooks go to <code className="break-all">{fakeWebhookUrl()}</code>. E-mails land in the{" "}
          <Link href="/dev/outbox">outbox</Link>.
        </p>
      </div>

      <section aria-labelledby="subs">
        <h2 id="subs" className="text-xl font-bold">
          Subscriptions
        </h2>
        {subs.length === 0 ? <p className="mt-2 text-asphalt-600">None yet. Buy Plus from the pricing page.</p> : null}
        <ul className="mt-3 space-y-3">
          {subs.map((row) => {
            const s = row.data as unknown as Sub;
            const item = s.items.data[0]!;
            return (
              <li key={row.id} className="space-y-2 rounded-lg border border-asphalt-200 bg-white p-4" data-testid="fake-subscription">
                <p className="font-semibold break-all">
                  {emailOf.get(s.customer) ?? s.customer} · <span className="font-mono text-sm">{s.id}</span>
                </p>
                <p className="text-sm text-asphalt-700">
                  {s.status}
                  {s.cancel_at_period_end ? " · cancels at period end" : ""} · {formatMoney(item.price.unit_amount, item.price.currency)} per {item.price.recurring.interval} · period ends {when(item.current_period_end)}
                </p>
                {s.status !== "canceled" ? (
                  <div className="flex flex-wrap items-center gap-3">
                    <form action={advanceAction}>
                      <input type="hidden" name="id" value={s.id} />
                      <button className="min-h-11 rounded bg-groove-700 px-4 font-semibold text-white">{s.cancel_at_period_end ? "Reach the period end" : "Advance to renewal"}</button>
                    </form>
                    <form action={failNextAction} className="flex items-center gap-2">
                      <input type="hidden" name="id" value={s.id} />
                      <input type="hidden" name="fail" value={row.fakeFlags.failNextRenewal === true ? "off" : "on"} />
                      <button className="min-h-11 rounded border border-asphalt-300 px-4 font-semibold">
                        {row.fakeFlags.failNextRenewal === true ? "Let the next renewal pay" : "Make the next renewal fail"}
                      </button>
                      {row.fakeFlags.failNextRenewal === true ? <span className="text-sm font-semibold text-condition-replace">next renewal will fail</span> : null}
                    </form>
                  </div>
                ) : null}
              </li>
            );
          })}
        </ul>
      </section>

      <section aria-labelledby="customers">
        <h2 id="customers" className="text-xl font-bold">
          Customers
        </h2>
        <ul className="mt-2 divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white">
          {customers.length === 0 ? <li className="p-3 text-asphalt-600">None yet.</li> : null}
          {customers.map((c) => (
            <li key={c.id} className="p-3 text-sm break-all">
              <span className="font-semibold">{String(c.data.email ?? "")}</span> · <span className="font-mono">{c.id}</span>
              {c.fakeFlags.cardLast4 ? ` · card ending ${String(c.fakeFlags.cardLast4)}` : ""}
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="events">
        <h2 id="events" className="text-xl font-bold">
          Events (newest first)
        </h2>
        <ul className="mt-2 divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white">
          {events.length === 0 ? <li className="p-3 text-asphalt-600">None yet.</li> : null}
          {events.map((e) => (
            <li key={e.id} className="flex flex-wrap items-center justify-between gap-2 p-3 text-sm">
              <span className="min-w-0 break-all">
                <span className="font-semibold">{String(e.data.type)}</span> · <span className="font-mono">{e.id}</span> · {when(Number(e.data.created))} · delivery:{" "}
                {String(e.fakeFlags.delivery ?? "—")}
              </span>
              <form action={redeliverAction}>
                <input type="hidden" name="id" value={e.id} />
                <button className="min-h-11 rounded border border-asphalt-300 px-3 font-semibold">Send again</button>
              </form>
            </li>
          ))}
        </ul>
      </section>
    </main>
  );
}
