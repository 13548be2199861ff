import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type ShopEntryEmailProps = {
  driverName: string;
  shopName: string;
  technicianName: string;
  vehicle: string;
  summary: string;
  logbookUrl: string;
};

export default function ShopEntryEmail({ driverName, shopName, technicianName, vehicle, summary, logbookUrl }: ShopEntryEmailProps) {
  return (
    <EmailLayout preview={`${shopName} added to the logbook of ${vehicle}`}>
      <Text style={paragraph}>Hello {driverName},</Text>
      <Text style={paragraph}>
        {technicianName} at {shopName} added to the logbook of {vehicle}: {summary}
      </Text>
      <Text style={paragraph}>
        The entry is marked as the shop&apos;s in your logbook. Readings taken by a shop are guidance like your own: local law
        and a qualified tire technician decide whether a tire stays on the road.
      </Text>
      <Button href={logbookUrl} style={button}>
        Open your logbook
      </Button>
    </EmailLayout>
  );
}

ShopEntryEmail.PreviewProps = {
  driverName: "Ada",
  shopName: "Quillby Tread Works",
  technicianName: "Jo Marsh",
  vehicle: "The green Velora",
  summary: "a rotation with a tread check of 4 tires.",
  logbookUrl: "http://localhost:3000/vehicles",
};
