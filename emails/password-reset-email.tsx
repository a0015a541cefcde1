import { Button, Text } from "@react-email/components";
import { EmailLayout, emailStyles } from "./layout";

export function PasswordResetEmail({ name, link }: { name: string; link: string }) {
  return (
    <EmailLayout preview="Choose a new Rungwise password">
      <Text style={emailStyles.heading}>Choose a new password</Text>
      <Text style={emailStyles.text}>
        Hi {name}, someone (hopefully you) asked to reset the password for this address. The link below works
        once, for one hour.
      </Text>
      <Button href={link} style={emailStyles.button}>
        Choose a new password
      </Button>
      <Text style={emailStyles.small}>If you didn't ask for this, nothing changes; you can ignore this e-mail.</Text>
      <Text style={emailStyles.small}>{link}</Text>
    </EmailLayout>
  );
}
