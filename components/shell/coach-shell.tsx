import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/logo-mark";
import type { NavItem } from "@/lib/navigation";
import { NavLink } from "./nav-link";
import { SafetyFooter } from "./safety-footer";
import { SignOutButton } from "./sign-out-button";

/** Laptop-first frame for owners and coaches. */
export function CoachShell({ nav, who, children }: { nav: readonly NavItem[]; who: string; children: ReactNode }) {
  return (
    <div className="min-h-dvh">
      <header className="sticky top-0 z-20 border-b border-line bg-paper/90 backdrop-blur">
        <div className="mx-auto flex max-w-7xl items-center gap-6 px-4 py-3">
          <Link href="/coach" aria-label="Rungwise home">
            <Wordmark />
          </Link>
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {nav.map((item) => (
              <NavLink key={item.href} href={item.href}>
                {item.label}
              </NavLink>
            ))}
          </nav>
          <span className="hidden text-sm text-muted md:inline">{who}</span>
          <SignOutButton />
        </div>
      </header>
      <main className="mx-auto max-w-7xl px-4 py-8">{children}</main>
      <SafetyFooter />
    </div>
  );
}
