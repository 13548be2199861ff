import { Button, Link, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type SignUpAttemptEmailProps = { name: string; signInUrl: string; resetUrl: string };

/** Sent to the owner of an address when someone tries to sign up with it again. */
export default function SignUpAttemptEmail({ name, signInUrl, resetUrl }: SignUpAttemptEmailProps) {
  return (
    <EmailLayout preview="Someone tried to sign up with your address">
      <Text style={paragraph}>Hello {name},</Text>
      <Text style={paragraph}>
        Someone just tried to create a new Fourpatch account with this e-mail address. You already have one, so nothing
        was created and nothing in your logbook changed.
      </Text>
      <Button href={signInUrl} style={button}>
        Sign in to my logbook
      </Button>
      <Text style={paragraph}>
        Forgot your password? <Link href={resetUrl}>Choose a new one</Link>. If it was not you, you can ignore this
        message.
      </Text>
    </EmailLayout>
  );
}

SignUpAttemptEmail.PreviewProps = { name: "Robin", signInUrl: "http://localhost:3000/sign-in", resetUrl: "http://localhost:3000/forgot-password" };
