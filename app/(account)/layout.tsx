import type { ReactNode } from "react";
import { AthleteShell } from "@/components/shell/athlete-shell";
import { CoachShell } from "@/components/shell/coach-shell";
import { navFor } from "@/lib/navigation";
import { requirePageActor } from "@/lib/server/auth/page-actor";

/** Pages every role has (settings): the frame follows the role. */
export default async function AccountLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor();
  const Shell = actor.role === "athlete" ? AthleteShell : CoachShell;
  return (
    <Shell nav={navFor(actor.role)} who={actor.name}>
      {children}
    </Shell>
  );
}
