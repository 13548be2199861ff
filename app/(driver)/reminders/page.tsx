import { Check } from "lucide-react";
import Link from "next/link";
import { redirect } from "next/navigation";
import { FeedPanel } from "@/components/reminders/feed-panel";
import { ReminderList } from "@/components/reminders/reminder-list";
import { SettingsForm } from "@/components/reminders/settings-form";
import { Alert } from "@/components/ui/alert";
import { Card, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyNote } from "@/components/ui/safety-note";
import { activeFeedOf, computeFor, reminderProfile } from "@/db/queries/reminders";
import { getSession } from "@/lib/auth/session";
import { PLUS_ADDS } from "@/lib/plan";
import { todayIn } from "@/lib/reminders/describe";

export const dynamic = "force-dynamic";
export const metadata = { title: "Reminders" };

function timeZones(current: string): string[] {
  const all = typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("timeZone") : [];
  return [...new Set(["UTC", current, ...all])];
}

export default async function RemindersPage() {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/reminders");
  const userId = session.user.id;
  const profile = await reminderProfile({ userId });
  if (!profile) redirect("/vehicles");
  // The driver's own date decides what is overdue.
  const today = todayIn(profile.timezone, new Date());
  const [{ items, skipped, error }, feed] = await Promise.all([computeFor({ profile, today }), activeFeedOf({ userId })]);
  const plus = profile.plan === "plus";
  const digestOff = profile.optedOut.includes("reminder-digest");

  return (
    <>
      <PageHeader title="Reminders" description="Every tire date your logbook implies, in your calendar and, with Plus, your inbox." />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="space-y-6">
          <Card>
            <CardTitle>Calendar feed</CardTitle>
            <div className="mt-3">
              <FeedPanel
                feed={feed ? { createdAt: feed.createdAt.toISOString(), lastFetchedAt: feed.lastFetchedAt?.toISOString() ?? null } : null}
                timezone={profile.timezone}
              />
            </div>
          </Card>
          <Card>
            <CardTitle>Coming up</CardTitle>
            <SafetyNote className="my-3" />
            {error ? <Alert tone="error">{error}</Alert> : <ReminderList items={items} />}
            {skipped.length > 0 ? (
              <details className="mt-3 text-sm text-asphalt-700">
                <summary className="cursor-pointer font-semibold">Some dates could not be computed ({skipped.length})</summary>
                <ul className="mt-2 list-disc space-y-1 pl-5">
                  {skipped.map((s, i) => (
                    <li key={`${s.setId ?? s.vehicleId}-${i}`}>{s.reason}</li>
                  ))}
                </ul>
              </details>
            ) : null}
          </Card>
        </div>
        <div className="space-y-6">
          <Card>
            <CardTitle>Your plan: {plus ? "Plus" : "Free"}</CardTitle>
            {plus ? (
              <p className="mt-2 text-asphalt-700">Plus is active on this account. It includes:</p>
            ) : (
              <p className="mt-2 text-asphalt-700">Free gives you the logbook, shop passes and the calendar feed with age and depth dates. Plus adds:</p>
            )}
            <ul className="mt-2 space-y-1">
              {PLUS_ADDS.map((f) => (
                <li key={f} className="flex gap-2 text-asphalt-800">
                  <Check aria-hidden className="mt-1 size-4 shrink-0 text-groove-700" />
                  {f}
                </li>
              ))}
            </ul>
            {plus ? null : (
              <p className="mt-3 text-sm text-asphalt-600">
                <Link href="/account/billing" className="font-semibold">
                  Upgrade to Plus
                </Link>{" "}
                · <Link href="/pricing">what it costs</Link>
              </p>
            )}
            {plus && digestOff ? (
              <Alert tone="warning" className="mt-3">
                You stopped reminder e-mails from a link in one of them. Tick “Send me an e-mail before each date” below and save to get them back.
              </Alert>
            ) : null}
          </Card>
          <Card>
            <CardTitle>Settings</CardTitle>
            <div className="mt-3">
              <SettingsForm
                plan={profile.plan}
                timeZones={timeZones(profile.timezone)}
                defaults={{
                  jurisdiction: profile.jurisdiction,
                  customDepthMm: profile.settings.customDepthMm,
                  kinds: profile.settings.kinds,
                  alarmLeadDays: profile.settings.alarmLeadDays,
                  emailLeadDays: profile.settings.emailLeadDays,
                  autumnSwap: profile.settings.autumnSwap,
                  springSwap: profile.settings.springSwap,
                  rotationIntervalKm: profile.settings.rotationIntervalKm,
                  emailReminders: profile.emailReminders && !digestOff,
                  timezone: profile.timezone,
                }}
              />
            </div>
          </Card>
        </div>
      </div>
    </>
  );
}
