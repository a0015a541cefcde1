import { Button, Text } from "@react-email/components";
import { EmailLayout, emailStyles } from "./layout";

export interface ApprovalRequestEmailProps {
  coachName: string;
  athleteName: string;
  ladderName: string;
  fromRungName: string;
  toRungName: string | null;
  direction: "up" | "down";
  explanation: string | null;
  link: string;
  expiresOn: string;
  unsubscribeUrl: string;
}

export function ApprovalRequestEmail(props: ApprovalRequestEmailProps) {
  const move = props.direction === "down" ? "step down" : "move up";
  const target = props.toRungName ? ` to ${props.toRungName}` : "";
  return (
    <EmailLayout preview={`${props.athleteName} is ready to ${move} on ${props.ladderName}`} unsubscribeUrl={props.unsubscribeUrl}>
      <Text style={emailStyles.heading}>
        {props.athleteName} is ready to {move}
      </Text>
      <Text style={emailStyles.text}>
        Hi {props.coachName}, on the {props.ladderName} ladder {props.athleteName} can {move} from {props.fromRungName}
        {target}.{props.explanation ? ` ${props.explanation}.` : ""}
      </Text>
      <Button href={props.link} style={emailStyles.button}>
        Review and confirm
      </Button>
      <Text style={emailStyles.small}>
        The link opens a page where you confirm; it works once and until {props.expiresOn}.
      </Text>
      <Text style={emailStyles.small}>{props.link}</Text>
    </EmailLayout>
  );
}
