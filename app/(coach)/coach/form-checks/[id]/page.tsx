import type { Metadata } from "next";
import Link from "next/link";
import { FormCheckReview } from "@/components/form-checks/form-check-review";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Review form check" };

export default async function CoachFormCheckPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requirePageActor("staff");
  return (
    <>
      <Link href="/coach/form-checks" className="text-sm font-semibold text-moss hover:underline">
        ← All form checks
      </Link>
      <PageHeader title="Review form check" lead="Slow it down, step frame by frame, and pin each comment to the moment it is about." />
      <FormCheckReview id={id} canComment backHref="/coach/form-checks" />
    </>
  );
}
