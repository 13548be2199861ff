import Link from "next/link";
import { buttonVariants } from "@/components/ui/button-variants";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyNote } from "@/components/ui/safety-note";
import { getSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export default async function GaragePage() {
  const session = await getSession();
  return (
    <>
      <PageHeader
        title={`${session?.user.name.split(" ")[0] ?? "Your"}'s garage`}
        description="Your vehicles, the tires on them and the ones in storage."
        actions={
          <Link href="/garage/log-purchase" className={buttonVariants()}>
            Log a tire purchase
          </Link>
        }
      />
      <p className="mb-6 text-asphalt-600">No vehicles yet. Add one when you log your first set of tires.</p>
      <SafetyNote />
    </>
  );
}
