import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type PassReceivedEmailProps = {
  shopName: string;
  driverName: string;
  vehicles: string[];
  scopeLabel: string;
  endsAtText: string;
  note?: string | null;
  passUrl: string;
};

export default function PassReceivedEmail({ shopName, driverName, vehicles, scopeLabel, endsAtText, note, passUrl }: PassReceivedEmailProps) {
  return (
    <EmailLayout preview={`${driverName} shared a logbook with ${shopName}`}>
      <Text style={paragraph}>
        {driverName} gave {shopName} a pass to the tire logbook of {vehicles.join(", ")}.
      </Text>
      <Text style={paragraph}>
        What the shop may do: {scopeLabel}. The pass ends by itself on {endsAtText}.
      </Text>
      {note ? <Text style={paragraph}>Note from {driverName}: “{note}”</Text> : null}
      <Button href={passUrl} style={button}>
        Open the logbook
      </Button>
      <Text style={paragraph}>
        Every page opened and every entry made under the pass is shown to the driver in the vehicle&apos;s access log.
      </Text>
    </EmailLayout>
  );
}

PassReceivedEmail.PreviewProps = {
  shopName: "Quillby Tread Works",
  driverName: "Ada Renwick",
  vehicles: ["The green Velora"],
  scopeLabel: "Read and add entries",
  endsAtText: "Friday 4 December, 17:00 UTC",
  note: "Rattle from the rear left at speed.",
  passUrl: "http://localhost:3000/shop/passes/preview",
};
