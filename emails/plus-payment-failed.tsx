// Sent once per failed Plus payment (invoice.payment_failed).
import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type PlusPaymentFailedEmailProps = {
  name: string;
  /** Already formatted, e.g. "€2.50". */
  amount: string;
  /** The card company's or payment service's reason, if it gave one. */
  billingUrl: string;
};

export default function PlusPaymentFailedEmail({ name, amount, billingUrl }: PlusPaymentFailedEmailProps) {
  return (
    <EmailLayout preview="Your Fourpatch Plus payment did not go through">
      <Text style={paragraph}>Hello {name},</Text>
      <Text style={paragraph}>
        We could not take {amount} for your next Fourpatch Plus period. Plus stays on for now while the payment is tried again.
      </Text>
      <Text style={paragraph}>To keep e-mail reminders and calendar alarms, pay the open invoice with another card from your billing page.</Text>
      <Button href={billingUrl} style={button}>
        Fix the payment
      </Button>
    </EmailLayout>
  );
}

PlusPaymentFailedEmail.PreviewProps = {
  name: "Ada",
  amount: "€2.50",
  billingUrl: "http://localhost:3000/account/billing",
} satisfies PlusPaymentFailedEmailProps;
