// The reminder feed as iCalendar (RFC 5545), built with ical-generator: one
// all-day event per reminder, keyed by the reminder's stable id so that a
// calendar app updates an event when its date moves and drops it when the
// reminder no longer applies.
import ical, { ICalAlarmType } from "ical-generator";
import { CAUTION, type ReminderItem } from "@/lib/tires";
import { planAllows, type Plan } from "@/lib/plan";
import { logbookPath, vehiclePath, whatToDo } from "./describe";
import { conditionTextFor } from "./severity";

export const FEED_NAME = "Fourpatch tire reminders";

export function feedUid(reminderId: string): string {
  return `${reminderId}@fourpatch`;
}

const nextDay = (iso: string) => new Date(Date.parse(`${iso}T00:00:00Z`) + 86_400_000);

export function buildFeed({
  items,
  plan,
  timezone,
  alarmLeadDays,
  baseUrl,
  now,
}: {
  items: readonly ReminderItem[];
  plan: Plan;
  timezone: string;
  alarmLeadDays: readonly number[];
  baseUrl: string;
  now: Date;
}): string {
  const cal = ical({
    name: FEED_NAME,
    description: "Dates computed from your Fourpatch tire logbook. Guidance only: local law and a qualified tire technician decide.",
    prodId: { company: "Fourpatch", product: "Reminder feed", language: "EN" },
    // Serialised as REFRESH-INTERVAL;VALUE=DURATION:P1D (RFC 7986 §5.7) and X-PUBLISHED-TTL:P1D.
    ttl: 24 * 60 * 60,
    url: `${baseUrl}/reminders`,
  });
  // Written by hand rather than through `timezone`: ical-generator would then
  // format all-day dates with the server's local clock. All-day DATE values
  // carry no zone anyway; the name tells clients which zone the days belong to.
  cal.x([{ key: "X-WR-TIMEZONE", value: timezone }]);
  const alarms = planAllows({ plan, feature: "alarms" }) ? alarmLeadDays : [];

  for (const item of items) {
    const link = `${baseUrl}${logbookPath(item)}`;
    const description = [
      // The condition code in characters ("▰▱▱ Plan to replace"): calendars show no colour.
      `Condition: ${conditionTextFor(item.severity)}`,
      item.explanation.replace(CAUTION, "").trim(),
      `What to do: ${whatToDo(item.kind)}`,
      `Set: ${link}`,
      `Vehicle: ${baseUrl}${vehiclePath(item)}`,
      CAUTION,
    ].join("\n\n");
    const event = cal.createEvent({
      id: feedUid(item.id),
      allDay: true,
      // DATE values at UTC midnight; DTEND is the next day, exclusive (RFC 5545 §3.6.1).
      start: new Date(`${item.date}T00:00:00Z`),
      end: nextDay(item.date),
      stamp: now,
      summary: item.subject,
      description,
      url: link,
      categories: [{ name: "Tires" }],
    });
    for (const days of alarms) {
      event.createAlarm({
        type: ICalAlarmType.display,
        // Seconds before the start: serialised as TRIGGER:-P<n>D (RFC 5545 §3.8.6.3).
        trigger: days * 86_400 || 0,
        description: days === 0 ? `Today: ${item.subject}` : `In ${days} day${days === 1 ? "" : "s"}: ${item.subject}`,
      });
    }
  }
  return cal.toString();
}
