import { Button, Text } from "@react-email/components";
import { EmailLayout, button, paragraph } from "./components/layout";

export type HandOnEmailProps =
  | { kind: "offer"; fromName: string; vehicle: string; url: string; expiresText: string }
  | { kind: "done-seller"; vehicle: string; toName: string; keptCopy: boolean; url: string }
  | { kind: "done-buyer"; vehicle: string; fromName: string; url: string };

export default function HandOnEmail(props: HandOnEmailProps) {
  if (props.kind === "offer") {
    return (
      <EmailLayout preview={`${props.fromName} hands you the tire history of ${props.vehicle}`}>
        <Text style={paragraph}>
          {props.fromName} is handing on {props.vehicle} and offers you its tire logbook: the sets with their date codes, the tread checks and the
          service history.
        </Text>
        <Button href={props.url} style={button}>
          See what is handed on
        </Button>
        <Text style={paragraph}>The link works once, until {props.expiresText}.</Text>
      </EmailLayout>
    );
  }
  if (props.kind === "done-seller") {
    return (
      <EmailLayout preview={`${props.vehicle} has a new owner`}>
        <Text style={paragraph}>
          {props.toName} accepted the tire logbook of {props.vehicle}. It is in their Fourpatch now; its shop passes and co-keepers have ended.
          {props.keptCopy ? " You kept a read-only copy as it was on the day." : ""}
        </Text>
        <Button href={props.url} style={button}>
          Open Fourpatch
        </Button>
      </EmailLayout>
    );
  }
  return (
    <EmailLayout preview={`The tire logbook of ${props.vehicle} is yours`}>
      <Text style={paragraph}>
        The tire logbook of {props.vehicle} from {props.fromName} is in your vehicles now, with its whole history.
      </Text>
      <Button href={props.url} style={button}>
        Open the logbook
      </Button>
    </EmailLayout>
  );
}

HandOnEmail.PreviewProps = { kind: "offer", fromName: "Ada Renwick", vehicle: "The van", url: "http://localhost:3000/take-on/preview", expiresText: "16 December" };
