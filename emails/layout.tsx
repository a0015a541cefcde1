import { Body, Container, Head, Hr, Html, Link, Preview, Section, Text } from "@react-email/components";
import type { ReactNode } from "react";

const palette = { ink: "#1c2321", chalk: "#f6f3ec", rung: "#d9622b", moss: "#2f5d50", muted: "#6b6f68" };

/** The frame every Rungwise e-mail shares: wordmark, content, a plain footer. */
export function EmailLayout({
  preview,
  children,
  unsubscribeUrl,
}: {
  preview: string;
  children: ReactNode;
  /** Signed link that stops this kind of mail; security mail (invites, resets) has none. */
  unsubscribeUrl?: string;
}) {
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={{ backgroundColor: palette.chalk, fontFamily: "Helvetica, Arial, sans-serif", color: palette.ink }}>
        <Container style={{ maxWidth: 560, margin: "0 auto", padding: "24px 20px" }}>
          <Text style={{ fontSize: 20, fontWeight: 700, color: palette.moss, letterSpacing: 0.5 }}>
            <span style={{ color: palette.rung }}>▤</span> Rungwise
          </Text>
          <Section style={{ backgroundColor: "#ffffff", borderRadius: 12, padding: "20px 24px" }}>{children}</Section>
          <Hr style={{ borderColor: "#dcd6c8", margin: "24px 0 12px" }} />
          <Text style={{ fontSize: 12, color: palette.muted }}>
            Rungwise helps coaches and athletes track progressions. It does not replace a qualified coach,
            physiotherapist or physician.
          </Text>
          {unsubscribeUrl ? (
            <Text style={{ fontSize: 12, color: palette.muted }}>
              Don't want these?{" "}
              <Link href={unsubscribeUrl} style={{ color: palette.moss }}>
                Unsubscribe
              </Link>{" "}
              or choose what you get under Settings.
            </Text>
          ) : null}
        </Container>
      </Body>
    </Html>
  );
}

export const emailStyles = {
  heading: { fontSize: 18, fontWeight: 700, margin: "0 0 12px" },
  text: { fontSize: 15, lineHeight: "22px", margin: "0 0 12px" },
  button: {
    backgroundColor: palette.moss,
    color: "#ffffff",
    borderRadius: 8,
    padding: "12px 18px",
    fontWeight: 700,
    textDecoration: "none",
    display: "inline-block",
  },
  small: { fontSize: 12, color: palette.muted, lineHeight: "18px" },
  subheading: { fontSize: 15, fontWeight: 700, margin: "16px 0 6px" },
  caution: { fontSize: 14, lineHeight: "20px", margin: "0 0 12px", padding: "8px 12px", borderLeft: `3px solid ${palette.rung}` },
  item: { fontSize: 14, lineHeight: "20px", margin: "0 0 4px" },
} as const;
