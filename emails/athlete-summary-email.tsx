import { Button, Text } from "@react-email/components";
import { EmailLayout, emailStyles } from "./layout";

export interface AthleteSummary {
  athleteName: string;
  week: string;
  from: string;
  to: string;
  sessions: number;
  painFlags: number;
  promotions: { ladderName: string; rungName: string | null; on: string }[];
  positions: { ladderName: string; rungName: string; readiness: number }[];
}

export function AthleteSummaryEmail({ summary, link, unsubscribeUrl }: { summary: AthleteSummary; link: string; unsubscribeUrl: string }) {
  const s = summary;
  return (
    <EmailLayout preview={`Your week ${s.week}: ${s.sessions} sessions, ${s.promotions.length} promotions`} unsubscribeUrl={unsubscribeUrl}>
      <Text style={emailStyles.heading}>
        Your week {s.week} ({s.from} – {s.to})
      </Text>
      <Text style={emailStyles.text}>
        Hi {s.athleteName}, you trained on {s.sessions} {s.sessions === 1 ? "day" : "days"} this week
        {s.promotions.length ? ` and moved up ${s.promotions.length} ${s.promotions.length === 1 ? "time" : "times"}` : ""}.
      </Text>
      {s.promotions.map((p, i) => (
        <Text key={i} style={emailStyles.item}>
          • {p.ladderName}: {p.rungName ?? "ladder finished"} ({p.on})
        </Text>
      ))}
      {s.positions.length ? <Text style={emailStyles.subheading}>Where you stand</Text> : null}
      {s.positions.map((p, i) => (
        <Text key={i} style={emailStyles.item}>
          • {p.ladderName}: {p.rungName}, {p.readiness}% ready
        </Text>
      ))}
      {s.painFlags ? (
        <Text style={emailStyles.caution}>
          You flagged pain {s.painFlags} {s.painFlags === 1 ? "time" : "times"}. Your coach can see it; rest that area and
          stop on sharp pain.
        </Text>
      ) : null}
      <Button href={link} style={{ ...emailStyles.button, marginTop: 16 }}>
        Open today's session
      </Button>
    </EmailLayout>
  );
}
