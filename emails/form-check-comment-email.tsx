import { Button, Text } from "@react-email/components";
import { EmailLayout, emailStyles } from "./layout";

export interface FormCheckCommentEmailProps {
  athleteName: string;
  coachName: string;
  at: string;
  body: string;
  link: string;
  unsubscribeUrl: string;
}

/** Tells an athlete their coach left a time-pinned comment on a form check. */
export function FormCheckCommentEmail(props: FormCheckCommentEmailProps) {
  return (
    <EmailLayout preview={`${props.coachName} commented on your form check at ${props.at}`} unsubscribeUrl={props.unsubscribeUrl}>
      <Text style={emailStyles.heading}>New feedback at {props.at}</Text>
      <Text style={emailStyles.text}>
        Hi {props.athleteName}, {props.coachName} left a comment on your form check:
      </Text>
      <Text style={{ ...emailStyles.text, fontStyle: "italic" }}>“{props.body}”</Text>
      <Button href={props.link} style={emailStyles.button}>
        Watch it at {props.at}
      </Button>
    </EmailLayout>
  );
}
