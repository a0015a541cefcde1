import type { Metadata } from "next";
import Link from "next/link";
import { unsubscribeFromLinkAction } from "@/app/(auth)/actions/mail-links";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { readUnsubscribeToken } from "@/lib/server/notifications/unsubscribe-link";

export const metadata: Metadata = { title: "Unsubscribe" };

const WHAT = {
  promotion: "promotion notices",
  approval_needed: "approval requests",
  digest: "the weekly digest",
  athlete_summary: "your weekly summary",
} as const;

export default async function UnsubscribePage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ result?: string }>;
}) {
  const { token } = await params;
  const { result } = await searchParams;
  const target = readUnsubscribeToken(token);
  if (!target) {
    return (
      <Card className="flex flex-col gap-3">
        <h1 className="font-display text-2xl font-bold">This link can&apos;t be used</h1>
        <p className="text-sm text-muted">Choose what mail you get under Settings after signing in.</p>
      </Card>
    );
  }
  if (result === "done") {
    return (
      <Card className="flex flex-col gap-3">
        <h1 className="font-display text-2xl font-bold">You&apos;re unsubscribed</h1>
        <p className="text-sm text-muted">
          {target.email} no longer gets {WHAT[target.kind]}. Sign-in and invite mail still arrives. You can turn it back on under{" "}
          <Link href="/settings" className="font-semibold text-moss hover:underline">
            Settings
          </Link>
          .
        </p>
      </Card>
    );
  }
  return (
    <Card className="flex flex-col gap-4">
      <h1 className="font-display text-2xl font-bold">Stop {WHAT[target.kind]}?</h1>
      <p className="text-sm text-muted">For {target.email}. Other mail is not affected.</p>
      <form action={unsubscribeFromLinkAction}>
        <input type="hidden" name="token" value={token} />
        <Button type="submit" size="lg" className="w-full">
          Unsubscribe
        </Button>
      </form>
    </Card>
  );
}
