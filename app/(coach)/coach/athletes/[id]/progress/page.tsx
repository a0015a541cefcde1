import type { Metadata } from "next";
import Link from "next/link";
import { ProgressView } from "@/components/progress/progress-view";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { orNotFound } from "@/lib/server/http/page-errors";
import { getAthleteLoad } from "@/lib/server/load/get-athlete-load";
import { getAthleteProgress } from "@/lib/server/progress/get-athlete-progress";

export const metadata: Metadata = { title: "Progress" };

export default async function AthleteProgressPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor("staff");
  const [progress, load] = await Promise.all([orNotFound(getAthleteProgress(actor, id)), orNotFound(getAthleteLoad(actor, id, {}))]);
  return (
    <>
      <div className="flex gap-4 text-sm font-semibold">
        <Link href="/coach/readiness" className="text-moss hover:underline">
          ← This week
        </Link>
        <Link href={`/coach/athletes/${id}`} className="text-moss hover:underline">
          Profile
        </Link>
      </div>
      <PageHeader title={`${progress.athleteName}: progress`} lead="Position on each ladder, the path so far, sessions against the standard, and training load." />
      <ProgressView progress={progress} load={load} emptyText="Place this athlete on a ladder to follow their progress here." />
    </>
  );
}
