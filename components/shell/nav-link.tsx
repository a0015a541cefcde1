"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/components/ui/cn";

export function NavLink({ href, children, variant = "top" }: { href: string; children: React.ReactNode; variant?: "top" | "tab" }) {
  const pathname = usePathname();
  const active = pathname === href || pathname.startsWith(`${href}/`);
  return (
    <Link
      href={href}
      aria-current={active ? "page" : undefined}
      className={cn(
        variant === "top"
          ? "whitespace-nowrap rounded-md px-3 py-2 text-sm font-semibold"
          : "flex min-h-14 flex-1 flex-col items-center justify-center text-sm font-semibold",
        active ? "bg-moss-soft text-moss-strong" : "text-muted hover:text-ink",
      )}
    >
      {children}
    </Link>
  );
}
