import { Body, Container, Head, Hr, Html, Link, Preview, Section, Text } from "@react-email/components";
import type { ReactNode } from "react";

export type EmailLayoutProps = {
  preview: string;
  children: ReactNode;
  /** Shown in the footer when the message is one a driver can opt out of. */
  unsubscribeUrl?: string;
};

const font = "'Atkinson Hyperlegible Next', 'Segoe UI', Helvetica, Arial, sans-serif";

export function EmailLayout({ preview, children, unsubscribeUrl }: EmailLayoutProps) {
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={{ backgroundColor: "#f6f7f8", fontFamily: font, margin: 0, padding: "24px 0" }}>
        <Container style={{ backgroundColor: "#ffffff", borderRadius: 12, padding: "28px 32px", maxWidth: 560 }}>
          <Text style={{ fontSize: 20, fontWeight: 700, color: "#1e625c", margin: "0 0 16px" }}>Fourpatch</Text>
          <Section>{children}</Section>
          <Hr style={{ borderColor: "#d5d9df", margin: "28px 0 16px" }} />
          <Text style={{ fontSize: 13, color: "#677282", margin: 0 }}>
            Fourpatch keeps your tire logbook. Its dates and conditions are guidance: local law and a qualified tire
            technician decide whether a tire stays on the road.
          </Text>
          {unsubscribeUrl ? (
            <Text style={{ fontSize: 13, color: "#677282", margin: "8px 0 0" }}>
              <Link href={unsubscribeUrl} style={{ color: "#217a71" }}>
                Stop e-mails of this kind
              </Link>
            </Text>
          ) : null}
        </Container>
      </Body>
    </Html>
  );
}

export const paragraph = { fontSize: 16, lineHeight: "24px", color: "#1b1f24" } as const;
export const button = {
  backgroundColor: "#1e625c",
  color: "#ffffff",
  borderRadius: 8,
  padding: "12px 20px",
  fontSize: 16,
  fontWeight: 700,
  textDecoration: "none",
  display: "inline-block",
} as const;
