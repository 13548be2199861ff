import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type PassEndedEmailProps = {
  driverName: string;
  shopName: string;
  vehicles: string[];
  how: "revoked" | "expired";
  entriesAdded: number;
  passesUrl: string;
};

export default function PassEndedEmail({ driverName, shopName, vehicles, how, entriesAdded, passesUrl }: PassEndedEmailProps) {
  return (
    <EmailLayout preview={`${shopName} can no longer open your logbook`}>
      <Text style={paragraph}>Hello {driverName},</Text>
      <Text style={paragraph}>
        {how === "revoked" ? "You withdrew the pass" : "The pass"} you gave {shopName} for {vehicles.join(", ")}{" "}
        {how === "revoked" ? "— it has ended." : "has ended by itself."} The shop can no longer open the logbook.
      </Text>
      <Text style={paragraph}>
        {entriesAdded === 0
          ? "The shop added no entries under this pass."
          : `The shop added ${entriesAdded} ${entriesAdded === 1 ? "entry" : "entries"} under this pass; they stay in your logbook.`}
      </Text>
      <Button href={passesUrl} style={button}>
        See the access log
      </Button>
    </EmailLayout>
  );
}

PassEndedEmail.PreviewProps = {
  driverName: "Ada",
  shopName: "Quillby Tread Works",
  vehicles: ["The green Velora"],
  how: "expired",
  entriesAdded: 2,
  passesUrl: "http://localhost:3000/passes",
};
