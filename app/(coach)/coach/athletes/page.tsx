import type { Metadata } from "next";
import { AthleteDirectory } from "@/components/athletes/athlete-directory";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { listStaff } from "@/lib/server/teams/list-staff";

export const metadata: Metadata = { title: "Athletes" };

export default async function AthletesPage() {
  const actor = await requirePageActor("staff");
  const staff = await listStaff(actor);
  return (
    <>
      <PageHeader
        title="Athletes"
        lead="Everyone your team trains. Athletes without a sign-in are fine: you log for them in person."
      />
      <AthleteDirectory staff={staff} me={actor.userId} />
    </>
  );
}
