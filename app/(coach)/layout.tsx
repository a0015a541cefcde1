import type { ReactNode } from "react";
import { CoachShell } from "@/components/shell/coach-shell";
import { navFor } from "@/lib/navigation";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export default async function CoachLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor("staff");
  return (
    <CoachShell nav={navFor(actor.role)} who={actor.name}>
      {children}
    </CoachShell>
  );
}
