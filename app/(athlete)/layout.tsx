import type { ReactNode } from "react";
import { AthleteShell } from "@/components/shell/athlete-shell";
import { navFor } from "@/lib/navigation";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export default async function AthleteLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor("athlete");
  return (
    <AthleteShell nav={navFor(actor.role)} who={actor.name}>
      {children}
    </AthleteShell>
  );
}
