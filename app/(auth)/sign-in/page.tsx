import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Card, Notice } from "@/components/ui/card";
import { homeFor } from "@/lib/navigation";
import { sessionActor } from "@/lib/server/auth/request-actor";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ signedOut?: string }> }) {
  const actor = await sessionActor();
  if (actor) redirect(homeFor(actor.role));
  const { signedOut } = await searchParams;
  return (
    <Card className="flex flex-col gap-5">
      <div>
        <h1 className="font-display text-2xl font-bold">Welcome back</h1>
        <p className="text-sm text-muted">Sign in to see today's rungs and your squad.</p>
      </div>
      {signedOut ? <Notice tone="moss">You're signed out. See you at the next session.</Notice> : null}
      <SignInForm />
      <p className="border-t border-line pt-4 text-center text-sm text-muted">
        Coaching a group?{" "}
        <Link href="/sign-up" className="font-semibold text-moss hover:underline">
          Start a team
        </Link>
      </p>
    </Card>
  );
}
