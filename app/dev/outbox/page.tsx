import Link from "next/link";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { Brand } from "@/components/shell/brand";
import { listFakeEmails } from "@/db/queries/outbox";
import { checkDevFakeRequest } from "@/lib/dev-fakes";
import { usingFakeEmail } from "@/lib/env";
import { viewerFormat } from "@/lib/format/server";

export const dynamic = "force-dynamic";
export const metadata = { title: "Outbox (local e-mail fake)" };

// Development and tests only: with a real e-mail key this page does not exist.
export default async function OutboxPage({ searchParams }: { searchParams: Promise<{ to?: string }> }) {
  // Only with development fakes on, and only for a loopback client or an operator (lib/dev-fakes.ts).
  if (!usingFakeEmail() || !(await checkDevFakeRequest(await headers())).ok) notFound();
  const { to } = await searchParams;
  const [messages, f] = await Promise.all([listFakeEmails({ to }), viewerFormat()]);
  return (
    <main className="mx-auto max-w-4xl px-4 py-8">
      <Brand />
      <h1 className="mt-6 text-2xl font-bold">Outbox</h1>
      <p className="text-asphalt-600">
        Every message the app sent through the local e-mail fake{to ? ` to ${to}` : ""}. Newest first.
      </p>
      <form className="mt-4 flex gap-2">
        <label htmlFor="to" className="sr-only">Recipient</label>
        <input id="to" name="to" defaultValue={to} placeholder="Filter by recipient" className="min-h-11 flex-1 rounded border border-asphalt-300 px-3" />
        <button className="rounded bg-groove-700 px-4 font-semibold text-white">Filter</button>
      </form>
      <ul className="mt-4 divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white">
        {messages.length === 0 ? <li className="p-4 text-asphalt-600">No messages yet.</li> : null}
        {messages.map((m) => (
          <li key={m.id}>
            <Link href={`/dev/outbox/${m.id}`} className="block p-4 no-underline hover:bg-asphalt-50">
              <span className="block font-semibold text-asphalt-900">{m.subject}</span>
              <span className="block text-sm text-asphalt-600">
                to {m.toAddresses.join(", ")} · {f.dateTime(m.createdAt)}
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </main>
  );
}
