import type { ReactNode } from "react";
import { LogoMark } from "@/components/brand/logo-mark";
import type { NavItem } from "@/lib/navigation";
import { NavLink } from "./nav-link";
import { SafetyFooter } from "./safety-footer";
import { SignOutButton } from "./sign-out-button";

/** Phone-first frame for athletes: slim top bar, large tab bar at the bottom. */
export function AthleteShell({ nav, who, children }: { nav: readonly NavItem[]; who: string; children: ReactNode }) {
  return (
    <div className="min-h-dvh">
      <header className="flex items-center justify-between border-b border-line px-4 py-3">
        <span className="flex items-center gap-2 font-display text-lg font-bold">
          <LogoMark size={24} /> {who}
        </span>
        <SignOutButton />
      </header>
      <main className="mx-auto max-w-xl px-4 py-5">{children}</main>
      <SafetyFooter />
      <nav
        aria-label="Main"
        className="fixed inset-x-0 bottom-0 z-20 flex border-t border-line bg-surface pb-[env(safe-area-inset-bottom)]"
      >
        {nav.map((item) => (
          <NavLink key={item.href} href={item.href} variant="tab">
            {item.short ?? item.label}
          </NavLink>
        ))}
      </nav>
    </div>
  );
}
