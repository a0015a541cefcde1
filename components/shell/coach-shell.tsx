import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/logo-mark";
import { NAV_GROUP_LABELS, type NavGroup, type NavItem } from "@/lib/navigation";
import { NavLink } from "./nav-link";
import { SafetyFooter } from "./safety-footer";
import { SignOutButton } from "./sign-out-button";

function groupsOf(nav: readonly NavItem[]): [NavGroup, NavItem[]][] {
  const groups = new Map<NavGroup, NavItem[]>();
  for (const item of nav) {
    const group = item.group ?? "club";
    groups.set(group, [...(groups.get(group) ?? []), item]);
  }
  return [...groups.entries()];
}

/**
 * Laptop-first frame for owners and coaches: the brand and the account on one line, the work below
 * it in three groups (this week, building training, running the club) on one line that scrolls
 * sideways on a narrow screen instead of wrapping.
 */
export function CoachShell({ nav, who, children }: { nav: readonly NavItem[]; who: string; children: ReactNode }) {
  return (
    <div className="min-h-dvh">
      <header className="sticky top-0 z-20 border-b border-line bg-paper/90 backdrop-blur">
        <div className="mx-auto flex max-w-7xl items-center gap-6 px-4 pt-3">
          <Link href="/coach" aria-label="Rungwise home" className="mr-auto">
            <Wordmark />
          </Link>
          <span className="hidden text-sm text-muted md:inline">{who}</span>
          <SignOutButton />
        </div>
        <nav aria-label="Main" className="mx-auto flex max-w-7xl items-center gap-1 overflow-x-auto px-4 py-2">
          {groupsOf(nav).map(([group, items], i) => (
            <div key={group} role="group" aria-label={NAV_GROUP_LABELS[group]} className="flex shrink-0 items-center gap-1">
              {i > 0 ? <span aria-hidden className="mx-2 h-5 w-px bg-line" /> : null}
              {items.map((item) => (
                <NavLink key={item.href} href={item.href}>
                  {item.label}
                </NavLink>
              ))}
            </div>
          ))}
        </nav>
      </header>
      <main className="mx-auto max-w-7xl px-4 py-8">{children}</main>
      <SafetyFooter />
    </div>
  );
}
