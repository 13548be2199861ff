import Link from "next/link";
import { AcceptLink } from "@/components/ui/accept-link";
import { HandOnSummaryView } from "@/components/household/hand-on-summary";
import { Brand } from "@/components/shell/brand";
import { Alert } from "@/components/ui/alert";
import { buttonVariants } from "@/components/ui/button-variants";
import { handOnView } from "@/db/queries/hand-on";
import { getSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

// The link a seller gives the next owner: the summary for whoever holds the
// link, and the one button that takes the vehicle on.
export default async function TakeOnPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const [session, view] = await Promise.all([getSession(), handOnView({ token })]);
  const here = `/take-on/${token}`;
  let body;
  if (view.state === "unknown") body = <Alert tone="error" title="This link does not work">Check that the whole link was copied, or ask the seller for a new one.</Alert>;
  else if (view.state === "used") body = <Alert tone="info" title="This link was already used">{view.vehicle} has been taken on by its new owner. A link works once.</Alert>;
  else if (view.state === "expired") body = <Alert tone="warning" title="This link has expired">Ask {view.fromName} for a new one.</Alert>;
  else if (view.state === "cancelled") body = <Alert tone="warning" title="This link was withdrawn">Ask {view.fromName} whether the vehicle is still to be handed on.</Alert>;
  else if (view.state === "open") {
    const s = view.summary;
    const wrongAccount = session && s.toEmail && session.user.email.toLowerCase() !== s.toEmail;
    body = (
      <div className="space-y-5">
        <p>
          {s.fromName} hands on <strong>{s.history.title}</strong> with its tire history. Accepting moves the vehicle and its logbook into your account;
          the seller&apos;s shop passes and co-keepers for it end.
        </p>
        {!session ? (
          <div className="space-y-2">
            {s.toEmail ? <p>The link was sent to <strong>{s.toEmail}</strong>; sign in or make an account with that address.</p> : null}
            <Link href={`/sign-in?next=${encodeURIComponent(here)}`} className={buttonVariants({ size: "lg", className: "w-full" })}>
              Sign in to take it on
            </Link>
            <Link href={`/sign-up?next=${encodeURIComponent(here)}`} className={buttonVariants({ variant: "secondary", className: "w-full" })}>
              Make an account
            </Link>
          </div>
        ) : wrongAccount ? (
          <Alert tone="warning" title="Signed in with another address">
            This link was sent to {s.toEmail}, and you are signed in as {session.user.email}.
          </Alert>
        ) : (
          <AcceptLink url="/api/hand-ons/accept" token={token} label={`Take on ${s.history.title}`} pendingLabel="Taking it on…" goTo="/vehicles" />
        )}
        <HandOnSummaryView summary={s} />
      </div>
    );
  }
  return (
    <main id="main" className="mx-auto flex min-h-dvh max-w-2xl flex-col gap-5 px-4 py-10">
      <Brand />
      <h1 className="text-2xl font-bold">{view.state === "open" ? `The tire history of ${view.summary.history.title}` : "Handing on a vehicle"}</h1>
      {body}
    </main>
  );
}
