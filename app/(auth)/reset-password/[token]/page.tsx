import type { Metadata } from "next";
import { ResetPasswordForm } from "@/components/auth/password-reset-forms";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <Card className="flex flex-col gap-5">
      <h1 className="font-display text-2xl font-bold">Choose a new password</h1>
      <ResetPasswordForm token={token} />
    </Card>
  );
}
