// Sent for each paid Plus invoice (the invoice.paid webhook, lib/billing/webhook.ts).
import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type PlusReceiptEmailProps = {
  name: string;
  /** Already formatted, e.g. "€24.00". */
  amount: string;
  /** "1 Dec 2026 – 30 Nov 2027" */
  period: string;
  receiptNumber: string;
  accountUrl: string;
  unsubscribeUrl: string;
};

export default function PlusReceiptEmail({ name, amount, period, receiptNumber, accountUrl, unsubscribeUrl }: PlusReceiptEmailProps) {
  return (
    <EmailLayout preview={`Your Fourpatch Plus receipt ${receiptNumber}`} unsubscribeUrl={unsubscribeUrl}>
      <Text style={paragraph}>Hello {name},</Text>
      <Text style={paragraph}>Thank you for your payment. Fourpatch Plus is active for {period}.</Text>
      <Text style={paragraph}>
        Receipt {receiptNumber}: Fourpatch Plus, {period} — {amount}
      </Text>
      <Text style={paragraph}>
        Plus adds e-mail reminders, calendar alarms at the lead times you choose, and seasonal swap and rotation reminders.
      </Text>
      <Button href={accountUrl} style={button}>
        Manage your plan
      </Button>
    </EmailLayout>
  );
}

PlusReceiptEmail.PreviewProps = {
  name: "Ada",
  amount: "€24.00",
  period: "1 Dec 2026 – 30 Nov 2027",
  receiptNumber: "FP-0001",
  accountUrl: "http://localhost:3000/account",
  unsubscribeUrl: "http://localhost:3000/unsubscribe/preview",
} satisfies PlusReceiptEmailProps;
