import type { Metadata } from "next";
import Link from "next/link";
import { LadderEditor } from "@/components/ladders/ladder-editor";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { orNotFound } from "@/lib/server/http/page-errors";
import { getLadder } from "@/lib/server/ladders/get-ladder";

export const metadata: Metadata = { title: "Ladder" };

export default async function LadderPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ imported?: string }>;
}) {
  const [{ id }, { imported }] = await Promise.all([params, searchParams]);
  const actor = await requirePageActor("staff");
  const ladder = await orNotFound(getLadder(actor, id));
  return (
    <>
      <Link href="/coach/ladders" className="text-sm font-semibold text-moss hover:underline">
        ← All ladders
      </Link>
      <LadderEditor initial={ladder} importNote={imported} />
    </>
  );
}
