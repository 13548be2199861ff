import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type KeeperInvitationEmailProps = { ownerName: string; vehicle: string; acceptUrl: string; expiresText: string };

export default function KeeperInvitationEmail({ ownerName, vehicle, acceptUrl, expiresText }: KeeperInvitationEmailProps) {
  return (
    <EmailLayout preview={`${ownerName} asks you to keep the tire logbook of ${vehicle} together`}>
      <Text style={paragraph}>
        {ownerName} would like you to keep the tire logbook of {vehicle} together: you would see its sets and date codes, record tread checks and
        purchases, and get its reminders in your own calendar and inbox.
      </Text>
      <Button href={acceptUrl} style={button}>
        Look at the invitation
      </Button>
      <Text style={paragraph}>
        The link works once, until {expiresText}. If you have no Fourpatch account yet, you can make one with this address on the way. Either of
        you can end the arrangement at any time.
      </Text>
    </EmailLayout>
  );
}

KeeperInvitationEmail.PreviewProps = {
  ownerName: "Ada Renwick",
  vehicle: "The estate",
  acceptUrl: "http://localhost:3000/keep/preview",
  expiresText: "16 December",
};
