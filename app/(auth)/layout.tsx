import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/logo-mark";

/** Sign-in, sign-up, invites and resets: one calm column. */
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col items-center px-4 py-10">
      <Link href="/" className="mb-8" aria-label="Rungwise home">
        <Wordmark />
      </Link>
      <main className="w-full max-w-md">{children}</main>
      <p className="mt-10 max-w-md text-center text-xs text-muted">
        Rungwise tracks progressions; it does not replace a qualified coach, physiotherapist or physician.
      </p>
    </div>
  );
}
