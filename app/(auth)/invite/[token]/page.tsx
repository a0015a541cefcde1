import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInviteForm } from "@/components/auth/accept-invite-form";
import { Card } from "@/components/ui/card";
import { findInvite } from "@/lib/server/invites/find-invite";

export const metadata: Metadata = { title: "Join your team" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invite = await findInvite(token);
  if (!invite) {
    return (
      <Card className="flex flex-col gap-3">
        <h1 className="font-display text-2xl font-bold">This invite can't be used</h1>
        <p className="text-sm text-muted">
          It has been used already or it has expired (invites last 7 days). Ask your coach to send a new one, or{" "}
          <Link href="/sign-in" className="font-semibold text-moss hover:underline">
            sign in
          </Link>{" "}
          if you already joined.
        </p>
      </Card>
    );
  }
  return (
    <Card className="flex flex-col gap-5">
      <div>
        <h1 className="font-display text-2xl font-bold">Join {invite.teamName}</h1>
        <p className="text-sm text-muted">
          {invite.role === "coach"
            ? "You're invited as a coach. Choose a password to finish."
            : "Your coach set up your training here. Choose a password and you'll land on today's session."}
        </p>
      </div>
      <AcceptInviteForm token={token} email={invite.email} suggestedName={invite.athleteName ?? ""} />
    </Card>
  );
}
