import { Button, Text } from "@react-email/components";
import { EmailLayout, emailStyles } from "./layout";

export interface CoachDigest {
  coachName: string;
  teamName: string;
  week: string;
  from: string;
  to: string;
  stallWeeks: number;
  promotions: { athleteName: string; ladderName: string; rungName: string | null; on: string }[];
  pendingApprovals: { athleteName: string; ladderName: string; rungName: string | null; direction: "up" | "down" }[];
  stalled: { athleteName: string; since: string }[];
  painFlags: { athleteName: string; rungName: string; on: string }[];
  noSessions: { athleteName: string }[];
}

function Section({ title, empty, lines }: { title: string; empty: string; lines: string[] }) {
  return (
    <>
      <Text style={emailStyles.subheading}>{`${title} (${lines.length})`}</Text>
      {lines.length === 0 ? <Text style={emailStyles.small}>{empty}</Text> : null}
      {lines.map((line, i) => (
        <Text key={i} style={emailStyles.item}>
          • {line}
        </Text>
      ))}
    </>
  );
}

export function CoachDigestEmail({ digest, link, unsubscribeUrl }: { digest: CoachDigest; link: string; unsubscribeUrl: string }) {
  const d = digest;
  return (
    <EmailLayout preview={`${d.teamName}, week ${d.week}: ${d.promotions.length} promotions, ${d.pendingApprovals.length} to approve`} unsubscribeUrl={unsubscribeUrl}>
      <Text style={emailStyles.heading}>
        Your week {d.week} ({d.from} – {d.to})
      </Text>
      <Text style={emailStyles.text}>Hi {d.coachName}, here is how your athletes at {d.teamName} did.</Text>
      <Section
        title="Promotions"
        empty="No one moved up this week."
        lines={d.promotions.map((p) => `${p.athleteName}: ${p.rungName ?? "finished the ladder"} on ${p.ladderName} (${p.on})`)}
      />
      <Section
        title="Waiting for your approval"
        empty="Nothing to approve."
        lines={d.pendingApprovals.map(
          (p) => `${p.athleteName}: ${p.direction === "down" ? "step down" : "move up"}${p.rungName ? ` to ${p.rungName}` : ""} on ${p.ladderName}`,
        )}
      />
      <Section
        title="Pain flags"
        empty="No pain flagged."
        lines={d.painFlags.map((p) => `${p.athleteName}: ${p.rungName} (${p.on})`)}
      />
      <Section
        title={`Stalled (no move up in ${d.stallWeeks} weeks)`}
        empty="No one is stuck."
        lines={d.stalled.map((s) => `${s.athleteName}: on the same rungs since ${s.since}`)}
      />
      <Section title="No sessions this week" empty="Everyone trained." lines={d.noSessions.map((n) => n.athleteName)} />
      <Button href={link} style={{ ...emailStyles.button, marginTop: 16 }}>
        Open the squad
      </Button>
    </EmailLayout>
  );
}
