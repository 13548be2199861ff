import { Check } from "lucide-react";
import type { Metadata } from "next";
import Link from "next/link";
import { BuyPlus } from "@/components/billing/buy-plus";
import { buttonVariants } from "@/components/ui/button-variants";
import { getSession } from "@/lib/auth/session";
import { PLUS_ADDS } from "@/lib/plan";

export const metadata: Metadata = { title: "Pricing" };

const plans = [
  {
    name: "Free",
    price: "€0",
    blurb: "The whole logbook, for as long as you drive.",
    items: ["Every vehicle you drive, with its sets, date codes and tread checks", "Wear charts and limit projections", "Shop passes with an access log", "A calendar feed of age and depth dates", "Export and delete everything"],
  },
  {
    name: "Plus",
    price: "€2.50 / month",
    blurb: "For a household that wants reminders to come to it.",
    // Only what the product gates on the plan (lib/plan.ts): no promise the product does not keep.
    items: ["Everything in Free", ...PLUS_ADDS],
  },
];

export const dynamic = "force-dynamic";

export default async function PricingPage() {
  // Signed in: Plus is bought right here. Signed out: an account first, then the billing page.
  const signedIn = !!(await getSession());
  return (
    <section className="mx-auto max-w-4xl px-4 py-12">
      <h1 className="text-3xl font-extrabold tracking-tight">Plans</h1>
      <p className="mt-2 text-asphalt-700">Start free. Add Plus when you want the reminders to find you.</p>
      <div className="mt-8 grid gap-5 md:grid-cols-2">
        {plans.map((p) => (
          <div key={p.name} className="flex flex-col rounded-xl border border-asphalt-200 bg-white p-6 shadow-card">
            <h2 className="text-xl font-bold">{p.name}</h2>
            <p className="mt-1 text-2xl font-extrabold text-groove-800">{p.price}</p>
            <p className="mt-2 text-asphalt-700">{p.blurb}</p>
            <ul className="mt-4 flex-1 space-y-2">
              {p.items.map((i) => (
                <li key={i} className="flex gap-2">
                  <Check aria-hidden className="mt-1 size-4 shrink-0 text-condition-good" />
                  {i}
                </li>
              ))}
            </ul>
            {p.name === "Plus" && signedIn ? (
              <div className="mt-6">
                <BuyPlus
                  options={[
                    { interval: "month", label: "Buy Plus monthly, €2.50" },
                    { interval: "year", label: "Buy Plus yearly, €24.00" },
                  ]}
                />
              </div>
            ) : p.name === "Plus" ? (
              <Link href="/sign-up" className={buttonVariants({ className: "mt-6", variant: "primary" })}>
                Start free, then buy Plus
              </Link>
            ) : (
              <Link href={signedIn ? "/vehicles" : "/sign-up"} className={buttonVariants({ className: "mt-6", variant: "secondary" })}>
                {signedIn ? "Go to your vehicles" : "Start free"}
              </Link>
            )}
          </div>
        ))}
      </div>
    </section>
  );
}
