import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type VerifyEmailProps = { name: string; verifyUrl: string };

export default function VerifyEmail({ name, verifyUrl }: VerifyEmailProps) {
  return (
    <EmailLayout preview="Confirm your address to open your Fourpatch logbook">
      <Text style={paragraph}>Hello {name},</Text>
      <Text style={paragraph}>
        Confirm that this address is yours to finish creating your Fourpatch logbook. The button signs you in; it
        works once, within 24 hours.
      </Text>
      <Button href={verifyUrl} style={button}>
        Confirm my address
      </Button>
      <Text style={paragraph}>If you did not sign up for Fourpatch, ignore this message: no account is opened without the link.</Text>
    </EmailLayout>
  );
}

VerifyEmail.PreviewProps = { name: "Robin", verifyUrl: "http://localhost:3000/api/auth/verify-email?token=preview" };
