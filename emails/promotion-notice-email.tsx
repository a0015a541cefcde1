import { Button, Text } from "@react-email/components";
import { cueLines } from "@/lib/cue-lines";
import { EmailLayout, emailStyles } from "./layout";

export interface PromotionNoticeEmailProps {
  recipientName: string;
  athleteName: string;
  /** True for the primary coach's copy. */
  forCoach: boolean;
  ladderName: string;
  fromRungName: string;
  /** Null when the athlete finished the ladder. */
  toRungName: string | null;
  cues: string | null;
  caution: string | null;
  explanation: string | null;
  link: string;
  unsubscribeUrl: string;
}

export function PromotionNoticeEmail(props: PromotionNoticeEmailProps) {
  const { recipientName, athleteName, forCoach, ladderName, fromRungName, toRungName, cues, caution, explanation } = props;
  const who = forCoach ? athleteName : "You";
  const headline = toRungName
    ? `${who} moved up to ${toRungName}`
    : `${who} finished the ${ladderName} ladder`;
  return (
    <EmailLayout preview={headline} unsubscribeUrl={props.unsubscribeUrl}>
      <Text style={emailStyles.heading}>{headline}</Text>
      <Text style={emailStyles.text}>
        Hi {recipientName}, {forCoach ? `${athleteName}'s` : "your"} {ladderName} ladder moved on from {fromRungName}
        {toRungName ? ` to ${toRungName}` : ""}.{explanation ? ` ${explanation}.` : ""}
      </Text>
      {toRungName && cueLines(cues).length > 0 ? (
        <>
          <Text style={emailStyles.subheading}>Cues for {toRungName}</Text>
          {cueLines(cues).map((cue, i) => (
            <Text key={i} style={emailStyles.text}>
              • {cue}
            </Text>
          ))}
        </>
      ) : null}
      {toRungName ? (
        <Text style={emailStyles.caution}>
          {caution ? `${caution} ` : ""}Warm up first, build the new rung in gradually, and stop on sharp pain.
        </Text>
      ) : null}
      <Button href={props.link} style={emailStyles.button}>
        {forCoach ? "Open the athlete" : "Open today's session"}
      </Button>
    </EmailLayout>
  );
}
