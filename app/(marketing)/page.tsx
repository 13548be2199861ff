import { CalendarDays, Gauge, KeyRound, ScanLine } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import Link from "next/link";
import { buttonVariants } from "@/components/ui/button-variants";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { SafetyNote } from "@/components/ui/safety-note";

const features = [
  {
    Icon: ScanLine,
    title: "Every date code, decoded",
    body: "Type the four digits after the DOT letters on each sidewall. Fourpatch turns them into the week the tire was made and how old it is today.",
  },
  {
    Icon: Gauge,
    title: "Tread checks that add up",
    body: "Log inner, centre and outer grooves with a gauge or a coin. Fourpatch fits a line through your readings and shows when each tire reaches its limit.",
  },
  {
    Icon: CalendarDays,
    title: "Dates in your own calendar",
    body: "Subscribe your phone's calendar to a private feed: age checks, the projected limit date, seasonal swaps and rotations appear by themselves.",
  },
  {
    Icon: KeyRound,
    title: "A pass for your shop",
    body: "Give the shop a pass for just the service visit. The technician reads the history and adds the work; the pass ends on its own, and you see every look.",
  },
];

export default async function LandingPage({ searchParams }: { searchParams: Promise<{ account?: string }> }) {
  const { account } = await searchParams;
  return (
    <>
      {account === "deleted" ? (
        <div className="mx-auto max-w-6xl px-4 pt-6">
          <Alert tone="success" title="Your account is deleted">
            Your vehicles, tires, checks, files and passes are gone, and you are signed out. Thank you for keeping your tires in Fourpatch.
          </Alert>
        </div>
      ) : null}
      <section className="bg-gradient-to-b from-groove-50 to-asphalt-50">
        <div className="mx-auto grid max-w-6xl gap-10 px-4 py-12 sm:py-20 lg:grid-cols-2 lg:items-center">
          <div>
            <h1 className="text-3xl font-extrabold tracking-tight text-asphalt-950 sm:text-[2.75rem] sm:leading-tight">
              Four patches of rubber hold your car on the road. Know how long they still can.
            </h1>
            <p className="mt-4 text-lg text-asphalt-700">
              Fourpatch is the tire logbook you own: each tire&apos;s date code, every tread check, the summer set and
              the winter set, and the dates that matter, in your calendar.
            </p>
            <div className="mt-6 flex flex-wrap gap-3">
              <Link href="/sign-up" className={buttonVariants({ size: "lg" })}>Start your logbook</Link>
              <Link href="/pricing" className={buttonVariants({ variant: "secondary", size: "lg" })}>See the plans</Link>
            </div>
          </div>
          <div aria-label="An example of a set in Fourpatch" className="rounded-xl border border-asphalt-200 bg-white p-5 shadow-card">
            <p className="text-sm font-semibold text-asphalt-600">Example · winter set, 205/55R16 91H</p>
            <ul className="mt-3 divide-y divide-asphalt-100">
              {[
                { pos: "Front left", code: "2319", age: "7 years", c: "replace" as const, why: "past the winter age limit" },
                { pos: "Front right", code: "2319", age: "7 years", c: "replace" as const, why: "past the winter age limit" },
                { pos: "Rear left", code: "4122", age: "4 years", c: "watch" as const, why: "4.1 mm left" },
                { pos: "Rear right", code: "4122", age: "4 years", c: "good" as const, why: "5.2 mm left" },
              ].map((t) => (
                <li key={t.pos} className="flex flex-wrap items-center justify-between gap-2 py-2.5">
                  <span>
                    <span className="font-semibold">{t.pos}</span>{" "}
                    <span className="font-mono text-sm text-asphalt-600">DOT … {t.code}</span>
                    <span className="block text-sm text-asphalt-600">{t.age} old · {t.why}</span>
                  </span>
                  <ConditionBadge condition={t.c} />
                </li>
              ))}
            </ul>
          </div>
        </div>
      </section>
      <section className="mx-auto max-w-6xl px-4 py-12">
        <h2 className="text-2xl font-bold">What it does for drivers and shops</h2>
        <div className="mt-6 grid gap-5 sm:grid-cols-2">
          {features.map(({ Icon, title, body }) => (
            <div key={title} className="rounded-lg border border-asphalt-200 bg-white p-5">
              <Icon aria-hidden className="size-7 text-groove-700" />
              <h3 className="mt-3 text-lg font-bold">{title}</h3>
              <p className="mt-1 text-asphalt-700">{body}</p>
            </div>
          ))}
        </div>
        <div className="mt-10 max-w-3xl space-y-3 text-asphalt-700">
          <h2 className="text-xl font-bold text-asphalt-900">Why age and depth both matter</h2>
          <p>
            Rubber ages even in a garage: many makers advise replacing tires about six to ten years after they were made,
            whatever the tread, and winter compounds sooner. Depth matters too: in much of Europe the legal minimum is
            1.6 mm, in most US states 2/32 inch, and grip in the wet falls well before that.
          </p>
          <SafetyNote />
        </div>
      </section>
    </>
  );
}
