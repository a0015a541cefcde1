import type { Metadata } from "next";
import Link from "next/link";
import { AthleteProfile } from "@/components/athletes/athlete-profile";
import { AthletePositions } from "@/components/ladders/athlete-positions";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { getAthlete } from "@/lib/server/athletes/get-athlete";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { orNotFound } from "@/lib/server/http/page-errors";
import { listStaff } from "@/lib/server/teams/list-staff";

export const metadata: Metadata = { title: "Athlete" };

export default async function AthletePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("staff");
  const [athlete, staff] = await Promise.all([orNotFound(getAthlete(actor, id)), listStaff(actor)]);
  return (
    <>
      <Link href="/coach/athletes" className="text-sm font-semibold text-moss hover:underline">
        ← All athletes
      </Link>
      <PageHeader
        title={athlete.name}
        lead={athlete.email ?? "No e-mail: you log for this athlete."}
        actions={
          <>
            <Link href={`/coach/athletes/${athlete.id}/today`} className={buttonClass("primary")}>
              Today &amp; log sets
            </Link>
            <Link href={`/coach/athletes/${athlete.id}/progress`} className={buttonClass("secondary")}>
              Progress and load
            </Link>
          </>
        }
      />
      <AthleteProfile athlete={athlete} staff={staff} />
      <AthletePositions athleteId={athlete.id} />
    </>
  );
}
