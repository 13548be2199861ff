import Link from "next/link";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { getFakeEmail } from "@/db/queries/outbox";
import { checkDevFakeRequest } from "@/lib/dev-fakes";
import { usingFakeEmail } from "@/lib/env";

export const dynamic = "force-dynamic";

export default async function OutboxMessagePage({ params }: { params: Promise<{ id: string }> }) {
  // Only with development fakes on, and only for a loopback client or an operator (lib/dev-fakes.ts).
  if (!usingFakeEmail() || !(await checkDevFakeRequest(await headers())).ok) notFound();
  const { id } = await params;
  if (!/^[0-9a-f-]{36}$/.test(id)) notFound();
  const message = await getFakeEmail({ id });
  if (!message) notFound();
  return (
    <main className="mx-auto max-w-4xl px-4 py-8">
      <Link href="/dev/outbox" className="text-groove-800">← Outbox</Link>
      <h1 className="mt-4 text-2xl font-bold">{message.subject}</h1>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
        <dt className="font-semibold">From</dt>
        <dd>{message.fromAddress}</dd>
        <dt className="font-semibold">To</dt>
        <dd>{message.toAddresses.join(", ")}</dd>
        {Object.entries(message.headers ?? {}).map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="font-semibold">{k}</dt>
            <dd className="break-all">{v}</dd>
          </div>
        ))}
      </dl>
      {/* The message's own HTML, isolated in a sandboxed frame with no scripts. */}
      <iframe title="Message" sandbox="allow-popups allow-top-navigation-by-user-activation" srcDoc={message.html ?? ""} className="mt-4 h-[32rem] w-full rounded border border-asphalt-200 bg-white" />
      <details className="mt-4">
        <summary className="cursor-pointer font-semibold">Plain-text part</summary>
        <pre className="mt-2 whitespace-pre-wrap rounded bg-asphalt-100 p-3 text-sm" data-testid="plain-text">{message.text}</pre>
      </details>
    </main>
  );
}
