import type { Metadata } from "next";
import Link from "next/link";
import { TodayView } from "@/components/today/today-view";
import { getAthlete } from "@/lib/server/athletes/get-athlete";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { orNotFound } from "@/lib/server/http/page-errors";

export const metadata: Metadata = { title: "Athlete's day" };

/** The athlete's Today as they see it; staff can log for them (stored with the coach as the one who entered it). */
export default async function AthleteTodayPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("staff");
  const athlete = await orNotFound(getAthlete(actor, id));
  return (
    <div className="mx-auto max-w-xl">
      <Link href={`/coach/athletes/${athlete.id}`} className="text-sm font-semibold text-moss hover:underline">
        ← {athlete.name}
      </Link>
      <div className="mt-4">
        <TodayView athleteId={athlete.id} />
      </div>
    </div>
  );
}
