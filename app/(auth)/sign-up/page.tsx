import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Start a team" };

export default function SignUpPage() {
  return (
    <Card className="flex flex-col gap-5">
      <div>
        <h1 className="font-display text-2xl font-bold">Start your coaching team</h1>
        <p className="text-sm text-muted">
          You'll be the owner. Add coaches and athletes afterwards; a starter set of skill ladders comes with every
          team.
        </p>
      </div>
      <SignUpForm />
      <p className="border-t border-line pt-4 text-center text-sm text-muted">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-semibold text-moss hover:underline">
          Sign in
        </Link>
      </p>
    </Card>
  );
}
