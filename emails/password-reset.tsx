import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type PasswordResetEmailProps = { name: string; resetUrl: string };

export default function PasswordResetEmail({ name, resetUrl }: PasswordResetEmailProps) {
  return (
    <EmailLayout preview="Choose a new Fourpatch password">
      <Text style={paragraph}>Hello {name},</Text>
      <Text style={paragraph}>
        Someone asked to reset the password of your Fourpatch account. If it was you, choose a new one with the button
        below. The link works once and expires within an hour.
      </Text>
      <Button href={resetUrl} style={button}>
        Choose a new password
      </Button>
      <Text style={paragraph}>If you did not ask for this, ignore this message: your password stays as it is.</Text>
    </EmailLayout>
  );
}

PasswordResetEmail.PreviewProps = { name: "Robin", resetUrl: "http://localhost:3000/reset-password?token=preview" };
