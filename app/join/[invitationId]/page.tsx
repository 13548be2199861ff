import type { Metadata } from "next";
import Link from "next/link";
import { Brand } from "@/components/shell/brand";
import { AcceptLink } from "@/components/ui/accept-link";
import { Alert } from "@/components/ui/alert";
import { buttonVariants } from "@/components/ui/button-variants";
import { getInvitation } from "@/db/queries/shops";
import { getSession } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Join a shop" };

export const dynamic = "force-dynamic";

// The link in a shop's invitation e-mail. It works once, until it expires,
// and only for the account with the invited address.
export default async function JoinPage({ params }: { params: Promise<{ invitationId: string }> }) {
  const { invitationId } = await params;
  const [session, inv] = await Promise.all([getSession(), getInvitation({ invitationId, now: new Date() })]);
  const here = `/join/${invitationId}`;

  let body;
  if (!inv) {
    body = <Alert tone="error" title="This invitation link does not work">Check that the whole link was copied, or ask the shop&apos;s owner for a new invitation.</Alert>;
  } else if (inv.state === "used") {
    body = (
      <Alert tone="info" title="This invitation was already used">
        It works once. If you accepted it, sign in and open the shop workspace.
      </Alert>
    );
  } else if (inv.state === "expired") {
    body = <Alert tone="warning" title="This invitation has expired">Ask {inv.shopName}&apos;s owner to send a new one.</Alert>;
  } else if (inv.state === "canceled") {
    body = <Alert tone="warning" title="This invitation was withdrawn">Ask {inv.shopName}&apos;s owner if you should still join.</Alert>;
  } else if (!session) {
    body = (
      <div className="space-y-3">
        <p>
          The invitation is for <strong>{inv.email}</strong>. Sign in with that address, or create an account with it, then come back to this link.
        </p>
        <Link href={`/sign-in?next=${encodeURIComponent(here)}`} className={buttonVariants({ size: "lg", className: "w-full" })}>
          Sign in to accept
        </Link>
        <Link href={`/sign-up?next=${encodeURIComponent(here)}`} className={buttonVariants({ variant: "secondary", className: "w-full" })}>
          Create an account
        </Link>
      </div>
    );
  } else if (session.user.email.toLowerCase() !== inv.email.toLowerCase()) {
    body = (
      <Alert tone="warning" title="Signed in with another address">
        This invitation is for {inv.email}, and you are signed in as {session.user.email}. Sign out and sign in with the invited address.
      </Alert>
    );
  } else {
    body = (
      <div className="space-y-3">
        <p>
          Join <strong>{inv.shopName}</strong> as a technician. You will see the logbooks drivers share with the shop, for as long as each pass lasts.
        </p>
        <AcceptLink url={`/api/shops/join/${inv.id}`} label={`Join ${inv.shopName}`} pendingLabel="Joining…" goTo="/shop" />
      </div>
    );
  }

  return (
    <main id="main" className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-5 px-6 py-10">
      <Brand />
      <h1 className="text-2xl font-bold">{inv ? `An invitation from ${inv.shopName}` : "Shop invitation"}</h1>
      {body}
    </main>
  );
}
