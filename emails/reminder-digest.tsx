import { Button, Link, Section, Text } from "@react-email/components";
import type { ConditionLevel } from "@/lib/visual/condition-code";
import { ConditionChip } from "./components/condition-chip";
import { EmailLayout, button, paragraph } from "./components/layout";

export type DigestItem = {
  subject: string;
  /** "Sun 15 Nov 2026" */
  dateLabel: string;
  /** A word, never a colour alone: "Replace now", "Plan to replace", "Watch", "Coming up". */
  severityLabel: string;
  /** The condition code's level, drawn as its chip; null for an item that judges no tire. */
  condition?: ConditionLevel | null;
  overdue: boolean;
  reason: string;
  whatToDo: string;
  url: string;
};

export type ReminderDigestEmailProps = {
  name: string;
  items: DigestItem[];
  remindersUrl: string;
  unsubscribeUrl: string;
  caution: string;
};

const card = { border: "1px solid #d5d9df", borderRadius: 8, padding: "12px 16px", margin: "0 0 12px" } as const;
const small = { fontSize: 14, lineHeight: "20px", color: "#3b4450", margin: "4px 0" } as const;

export default function ReminderDigestEmail({ name, items, remindersUrl, unsubscribeUrl, caution }: ReminderDigestEmailProps) {
  const count = items.length === 1 ? "One tire date needs" : `${items.length} tire dates need`;
  return (
    <EmailLayout preview={`${count} your attention in your Fourpatch logbook`} unsubscribeUrl={unsubscribeUrl}>
      <Text style={paragraph}>Hello {name},</Text>
      <Text style={paragraph}>{count} your attention in your tire logbook:</Text>
      {items.map((item) => (
        <Section key={item.url + item.subject} style={card}>
          <Text style={{ ...small, fontWeight: 700, fontSize: 16, color: "#1b1f24" }}>{item.subject}</Text>
          <Text style={small}>
            {item.condition ? <ConditionChip level={item.condition} /> : null} {item.overdue ? "Was due" : "Due"} {item.dateLabel}
            {item.condition ? "" : ` · ${item.severityLabel}`}
          </Text>
          <Text style={small}>{item.reason}</Text>
          <Text style={small}>What to do: {item.whatToDo}</Text>
          <Text style={small}>
            <Link href={item.url} style={{ color: "#217a71" }}>
              Open this set in your logbook
            </Link>
          </Text>
        </Section>
      ))}
      <Text style={{ ...small, fontStyle: "italic" }}>{caution}</Text>
      <Button href={remindersUrl} style={button}>
        See all your reminders
      </Button>
      <Text style={small}>You get these because e-mail reminders are on in your Fourpatch Plus plan.</Text>
    </EmailLayout>
  );
}

ReminderDigestEmail.PreviewProps = {
  name: "Ada",
  items: [
    {
      subject: "Meadowline summer on Blue estate: tread reaches 1.6 mm",
      dateLabel: "Sun 15 Nov 2026",
      severityLabel: "Plan to replace",
      condition: "plan",
      overdue: false,
      reason: "The first tire of this set should reach the 1.6 mm limit around 61,000 km.",
      whatToDo: "Measure the tread again and plan new tires if the reading confirms it.",
      url: "http://localhost:3000/sets/preview",
    },
  ],
  remindersUrl: "http://localhost:3000/reminders",
  unsubscribeUrl: "http://localhost:3000/unsubscribe/preview",
  caution: "These figures are guidance only.",
} satisfies ReminderDigestEmailProps;
