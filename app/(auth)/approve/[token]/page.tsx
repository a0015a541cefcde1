import type { Metadata } from "next";
import Link from "next/link";
import { approveFromLinkAction } from "@/app/(auth)/actions/mail-links";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { approvalLinkState } from "@/lib/server/notifications/approval-link";

export const metadata: Metadata = { title: "Confirm a promotion" };

function Message({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <Card className="flex flex-col gap-3">
      <h1 className="font-display text-2xl font-bold">{title}</h1>
      <div className="text-sm text-muted">{children}</div>
      <Link href="/coach" className="text-sm font-semibold text-moss hover:underline">
        Open Rungwise
      </Link>
    </Card>
  );
}

export default async function ApprovePage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ result?: string }>;
}) {
  const { token } = await params;
  const { result } = await searchParams;
  const link = await approvalLinkState(token);
  if (result === "approved") {
    return <Message title="Approved">The athlete moves up now and gets a notice with the new rung&apos;s cues.</Message>;
  }
  if (link.state === "invalid") {
    return <Message title="This link can't be used">It is not valid or it has expired (links last 7 days). Decide from the athlete&apos;s page instead.</Message>;
  }
  if (link.state === "used") {
    return <Message title="This link was already used">The promotion has been decided. Nothing more to do here.</Message>;
  }
  const move = link.direction === "down" ? "step down" : "move up";
  return (
    <Card className="flex flex-col gap-4">
      <h1 className="font-display text-2xl font-bold">
        {link.athleteName} is ready to {move}
      </h1>
      <p className="text-sm">
        {link.ladderName}: from <strong>{link.fromRungName}</strong>
        {link.toRungName ? (
          <>
            {" "}
            to <strong>{link.toRungName}</strong>
          </>
        ) : (
          " to the end of the ladder"
        )}
        .
      </p>
      <Notice tone="ember">Check the athlete is moving without pain before a harder rung; the new rung starts from today.</Notice>
      <form action={approveFromLinkAction}>
        <input type="hidden" name="token" value={token} />
        <Button type="submit" size="lg" className="w-full">
          Confirm: {move}
        </Button>
      </form>
    </Card>
  );
}
