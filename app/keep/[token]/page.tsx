import Link from "next/link";
import { Brand } from "@/components/shell/brand";
import { AcceptLink } from "@/components/ui/accept-link";
import { Alert } from "@/components/ui/alert";
import { buttonVariants } from "@/components/ui/button-variants";
import { keeperInvitation } from "@/db/queries/keepers";
import { getSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

// The link of a co-keeper invitation. It works once, until it expires, and
// only for the account with the invited address (made on the way if needed).
export default async function KeepPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const [session, inv] = await Promise.all([getSession(), keeperInvitation({ token })]);
  const here = `/keep/${token}`;

  let body;
  if (inv.state === "unknown") {
    body = <Alert tone="error" title="This invitation link does not work">Check that the whole link was copied, or ask for a new invitation.</Alert>;
  } else if (inv.state === "used") {
    body = <Alert tone="info" title="This invitation was already used">It works once. If you accepted it, the vehicle is in your list of vehicles.</Alert>;
  } else if (inv.state === "expired") {
    body = <Alert tone="warning" title="This invitation has expired">Ask {inv.ownerName} to send a new one.</Alert>;
  } else if (inv.state === "withdrawn") {
    body = <Alert tone="warning" title="This invitation was withdrawn">Ask {inv.ownerName} whether you should still keep the logbook together.</Alert>;
  } else if (!session) {
    body = (
      <div className="space-y-3">
        <p>
          The invitation is for <strong>{inv.email}</strong>. Sign in with that address, or make an account with it; you come back here afterwards.
        </p>
        <Link href={`/sign-in?next=${encodeURIComponent(here)}`} className={buttonVariants({ size: "lg", className: "w-full" })}>
          Sign in to accept
        </Link>
        <Link href={`/sign-up?next=${encodeURIComponent(here)}`} className={buttonVariants({ variant: "secondary", className: "w-full" })}>
          Make an account
        </Link>
      </div>
    );
  } else if (session.user.email.toLowerCase() !== inv.email) {
    body = (
      <Alert tone="warning" title="Signed in with another address">
        This invitation is for {inv.email}, and you are signed in as {session.user.email}. Sign out and sign in with the invited address.
      </Alert>
    );
  } else {
    body = (
      <div className="space-y-3">
        <p>
          Keep the tire logbook of <strong>{inv.vehicle}</strong> with {inv.ownerName}: you will see it among your vehicles, can record checks and
          purchases, and get its reminders. {inv.ownerName} stays its owner; either of you can end this later.
        </p>
        <AcceptLink url="/api/keepers/accept" token={token} label={`Keep ${inv.vehicle} with ${inv.ownerName}`} pendingLabel="Accepting…" goTo="/vehicles" />
      </div>
    );
  }

  return (
    <main id="main" className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-5 px-6 py-10">
      <Brand />
      <h1 className="text-2xl font-bold">{inv.state === "unknown" ? "Co-keeper invitation" : `A logbook to keep with ${inv.ownerName}`}</h1>
      {body}
    </main>
  );
}
