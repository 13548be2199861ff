import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type WelcomeEmailProps = { name: string; vehiclesUrl: string };

export default function WelcomeEmail({ name, vehiclesUrl }: WelcomeEmailProps) {
  return (
    <EmailLayout preview="Your tire logbook is ready">
      <Text style={paragraph}>Welcome, {name}.</Text>
      <Text style={paragraph}>
        Your Fourpatch logbook is ready. Add a vehicle, type the date code molded into each tire&apos;s sidewall, and
        Fourpatch works out how old each tire is and when it reaches its limit.
      </Text>
      <Button href={vehiclesUrl} style={button}>
        Open your vehicles
      </Button>
    </EmailLayout>
  );
}

WelcomeEmail.PreviewProps = { name: "Robin", vehiclesUrl: "http://localhost:3000/vehicles" };
