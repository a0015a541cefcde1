import { Button, Text } from "@react-email/components";
import { EmailLayout, emailStyles } from "./layout";

export interface InviteEmailProps {
  teamName: string;
  inviterName: string;
  role: "coach" | "athlete";
  link: string;
  expiresOn: string;
}

export function InviteEmail({ teamName, inviterName, role, link, expiresOn }: InviteEmailProps) {
  const what = role === "coach" ? "coach with" : "train with";
  return (
    <EmailLayout preview={`${inviterName} invited you to ${what} ${teamName} on Rungwise`}>
      <Text style={emailStyles.heading}>You're invited to {teamName}</Text>
      <Text style={emailStyles.text}>
        {inviterName} would like you to {what} {teamName} on Rungwise, where your progressions, logs and next
        steps live in one place.
      </Text>
      <Button href={link} style={emailStyles.button}>
        Set up my sign-in
      </Button>
      <Text style={emailStyles.small}>
        This link works once and until {expiresOn}. If you weren't expecting it, you can ignore this e-mail.
      </Text>
      <Text style={emailStyles.small}>{link}</Text>
    </EmailLayout>
  );
}
