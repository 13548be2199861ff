// Unsubscribe from one kind of e-mail, from a link, without signing in.
// Opening the page changes nothing (link scanners open pages); the button does.
import { Brand } from "@/components/shell/brand";
import { Alert } from "@/components/ui/alert";
import { isOptedOut } from "@/db/queries/reminders";
import { KIND_LABELS, verifyUnsubscribe } from "@/lib/email/unsubscribe";
import { UnsubscribeForm } from "./unsubscribe-form";

export const dynamic = "force-dynamic";
export const metadata = { title: "E-mail choices", robots: { index: false } };

export default async function UnsubscribePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const v = verifyUnsubscribe(decodeURIComponent(token));
  return (
    <div className="flex min-h-dvh flex-col items-center bg-gradient-to-b from-groove-50 to-asphalt-50 px-4 py-10">
      <div className="w-full max-w-md">
        <div className="mb-8 flex justify-center">
          <Brand />
        </div>
        <main className="space-y-4 rounded-xl border border-asphalt-200 bg-white p-6 shadow-card">
          <h1 className="text-xl font-bold text-asphalt-950">E-mail choices</h1>
          {v ? (
            <UnsubscribeForm token={decodeURIComponent(token)} label={KIND_LABELS[v.kind]} alreadyOff={await isOptedOut(v)} />
          ) : (
            <Alert tone="error">This link is not valid. Sign in and change your e-mail choices on the Reminders page.</Alert>
          )}
        </main>
      </div>
    </div>
  );
}
