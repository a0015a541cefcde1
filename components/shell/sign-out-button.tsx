"use client";

import { signOutAction } from "@/app/(auth)/actions/sign-out";
import { forgetOfflinePages } from "@/lib/client/offline-pages";

export function SignOutButton({ className }: { className?: string }) {
  return (
    <form
      action={async () => {
        // Best effort: a browser without Cache Storage (or a failure) must not block signing out.
        await forgetOfflinePages().catch(() => undefined);
        await signOutAction();
      }}
    >
      <button type="submit" className={className ?? "text-sm font-semibold text-muted hover:text-ink"}>
        Sign out
      </button>
    </form>
  );
}
