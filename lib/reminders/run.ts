import "server-only";
// The daily e-mail run: each due reminder is mailed once per driver and date.
//
// Exactly-once, by construction:
// 1. A run first INSERTs one reminder_delivery row per due item, ON CONFLICT
//    DO NOTHING on (user, reminder, due date, channel): of two overlapping
//    runs only one gets each row back, and only that one sends it.
// 2. It sends one digest of the rows it won, then marks them sent.
// 3. A run that dies between 1 and 3 leaves its rows `pending` with its
//    claim stamp. A later run takes over pending rows whose stamp is older
//    than the retry window (an atomic UPDATE … WHERE status = 'pending' AND
//    claimed_at < cutoff), so nothing is lost; the window is longer than a
//    send can take, so a slow run is never doubled. A refusal the provider
//    reports (not an exception) clears the stamp, to be retried next run.
// 4. A taken-over claim is sent as the same message it was (its own rows,
//    apart from reminders that came due since), with an idempotency key made
//    of its row ids: if the dead run's message had reached the provider, the
//    provider answers with that message and delivers nothing again
//    (tests/integration/security/reminder-crash.test.ts kills a run there).
import { createHash, randomUUID } from "node:crypto";
import { claimDeliveries, computeFor, driversForDelivery, markDeliveries, reminderProfile } from "@/db/queries/reminders";
import { badgeFor, conditionLabelFor } from "@/lib/reminders/severity";
import ReminderDigestEmail from "@/emails/reminder-digest";
import { sendEmail, type SendEmailInput, type SendEmailResult } from "@/lib/email/send";
import { oneClickUnsubscribeUrl, unsubscribeUrl } from "@/lib/email/unsubscribe";
import { appUrl } from "@/lib/env";
import { planAllows } from "@/lib/plan";
import { addDays, CAUTION, type ReminderItem } from "@/lib/tires";
import { formatter, prefsFrom } from "@/lib/format";
import { logbookPath, todayIn, whatToDo } from "./describe";

export type RunOptions = {
  now?: Date;
  /** The sender; tests inject a failing one. */
  send?: (input: SendEmailInput) => Promise<SendEmailResult>;
  /**
   * Items overdue by more than this many days are not mailed (the page and
   * the feed still show them). Half a year: a driver who turns e-mail on
   * hears once about what passed recently, not about every old date.
   */
  windowDays?: number;
  /** A pending claim older than this is taken over by the next run. */
  retryAfterMinutes?: number;
};

export type RunSummary = { runId: string; drivers: number; emails: number; items: number; cancelled: number; failed: number };

export async function runReminderDeliveries({ now = new Date(), send = sendEmail, windowDays = 180, retryAfterMinutes = 15 }: RunOptions = {}): Promise<RunSummary> {
  const runId = randomUUID();
  const summary: RunSummary = { runId, drivers: 0, emails: 0, items: 0, cancelled: 0, failed: 0 };
  const staleBefore = new Date(now.getTime() - retryAfterMinutes * 60_000);

  for (const userId of await driversForDelivery()) {
    try {
      const profile = await reminderProfile({ userId });
      if (!profile || !planAllows({ plan: profile.plan, feature: "email-reminders" })) continue;
      summary.drivers += 1;
      const today = todayIn(profile.timezone, now);
      const { items } = await computeFor({ profile, today });
      const lead = profile.settings.emailLeadDays;
      const due = items.filter((i) => addDays(i.date, -lead) <= today && i.date >= addDays(today, -windowDays));

      const claimed = await claimDeliveries({ userId, due: due.map((i) => ({ reminderId: i.id, dueOn: i.date })), claimId: runId, now, staleBefore });
      if (claimed.length === 0) continue;

      // One message per claim: the new rows of this run, and each earlier
      // claim's rows on their own, so a retry repeats the very message (and
      // key) that may already have gone out.
      const groups = new Map<string, typeof claimed>();
      for (const c of claimed) groups.set(c.claimId, [...(groups.get(c.claimId) ?? []), c]);
      const current = new Map(items.map((i) => [`${i.id}|${i.date}`, i]));
      for (const [claimId, rows] of groups) {
        // The key covers every row of the claim, including any whose reminder has moved since.
        const idempotencyKey = `reminder-digest/${createHash("sha256").update(rows.map((r) => r.id).sort().join(",")).digest("hex")}`;
        // A retaken row whose reminder moved or vanished since is not sent: the moved date has a row of its own.
        const toSend = rows.flatMap((c) => {
          const item = current.get(`${c.reminderId}|${c.dueOn}`);
          return item ? [{ row: c, item }] : [];
        });
        const gone = rows.filter((c) => !current.has(`${c.reminderId}|${c.dueOn}`)).map((c) => c.id);
        await markDeliveries({ userId, ids: gone, claimId, outcome: { status: "cancelled" } });
        summary.cancelled += gone.length;
        if (toSend.length === 0) continue;

        const ids = toSend.map((t) => t.row.id);
        let result: SendEmailResult;
        try {
          result = await send({ ...digestEmail({ to: profile.email, name: profile.name, userId, items: toSend.map((t) => t.item), timeZone: profile.timezone }), idempotencyKey });
        } catch (err) {
          // Unknown whether it went out: keep the claim; the retry window decides.
          await markDeliveries({ userId, ids, claimId, outcome: { status: "failed", error: String(err), retryNow: false } });
          summary.failed += 1;
          continue;
        }
        if (!result.ok) {
          await markDeliveries({ userId, ids, claimId, outcome: { status: "failed", error: result.error, retryNow: true } });
          summary.failed += 1;
          continue;
        }
        await markDeliveries({ userId, ids, claimId, outcome: { status: "sent", providerMessageId: result.id } });
        summary.emails += 1;
        summary.items += ids.length;
      }
    } catch (err) {
      console.error(`[reminders] delivery for ${userId} failed`, err);
      summary.failed += 1;
    }
  }
  return summary;
}

function digestEmail({ to, name, userId, items, timeZone }: { to: string; name: string; userId: string; items: ReminderItem[]; timeZone: string }): SendEmailInput {
  // Calendar dates, written as the driver reads them; the driver's stored zone decided which day is "today".
  const { day } = formatter(prefsFrom({ timeZone }));
  const base = appUrl();
  const sorted = [...items].sort((a, b) => a.date.localeCompare(b.date));
  const subject = sorted.length === 1 ? `Tire reminder: ${sorted[0].subject}` : `${sorted.length} tire reminders, first: ${sorted[0].subject}`;
  return {
    to,
    subject,
    kind: "reminder-digest",
    unsubscribeUrl: oneClickUnsubscribeUrl({ userId, kind: "reminder-digest" }),
    react: ReminderDigestEmail({
      name: name.split(" ")[0] || name,
      remindersUrl: `${base}/reminders`,
      unsubscribeUrl: unsubscribeUrl({ userId, kind: "reminder-digest" }),
      caution: CAUTION,
      items: sorted.map((i) => ({
        subject: i.subject,
        dateLabel: day(i.date),
        severityLabel: conditionLabelFor(i.severity),
        condition: badgeFor(i.severity),
        overdue: i.overdue,
        reason: i.explanation.replace(CAUTION, "").trim(),
        whatToDo: whatToDo(i.kind),
        url: `${base}${logbookPath(i)}`,
      })),
    }),
  };
}
