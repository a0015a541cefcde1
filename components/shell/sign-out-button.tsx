import { signOutAction } from "@/app/(auth)/actions/sign-out";

export function SignOutButton({ className }: { className?: string }) {
  return (
    <form action={signOutAction}>
      <button type="submit" className={className ?? "text-sm font-semibold text-muted hover:text-ink"}>
        Sign out
      </button>
    </form>
  );
}
