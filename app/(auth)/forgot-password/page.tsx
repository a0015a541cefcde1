import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/auth/password-reset-forms";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Reset your password" };

export default function ForgotPasswordPage() {
  return (
    <Card className="flex flex-col gap-5">
      <div>
        <h1 className="font-display text-2xl font-bold">Reset your password</h1>
        <p className="text-sm text-muted">We'll e-mail you a single-use link.</p>
      </div>
      <ForgotPasswordForm />
    </Card>
  );
}
