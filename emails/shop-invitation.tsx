import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type ShopInvitationEmailProps = { shopName: string; inviterName: string; acceptUrl: string };

export default function ShopInvitationEmail({ shopName, inviterName, acceptUrl }: ShopInvitationEmailProps) {
  return (
    <EmailLayout preview={`${inviterName} invited you to ${shopName} on Fourpatch`}>
      <Text style={paragraph}>
        {inviterName} invited you to join {shopName} on Fourpatch as a technician. Technicians read the logbooks that
        drivers share with the shop, for as long as each driver&apos;s pass lasts.
      </Text>
      <Button href={acceptUrl} style={button}>
        Join {shopName}
      </Button>
      <Text style={paragraph}>The invitation works once and expires in three days.</Text>
    </EmailLayout>
  );
}

ShopInvitationEmail.PreviewProps = {
  shopName: "Quillby Tread Works",
  inviterName: "Wren",
  acceptUrl: "http://localhost:3000/join/preview",
};
