import type { Metadata } from "next";
import Link from "next/link";
import { FormCheckReview } from "@/components/form-checks/form-check-review";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Form check" };

export default async function AthleteFormCheckPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requirePageActor("athlete");
  return (
    <div className="flex flex-col gap-4">
      <Link href="/form-checks" className="text-sm font-semibold text-moss hover:underline">
        ← All form checks
      </Link>
      <h1 className="font-display text-2xl font-bold">Form check</h1>
      <FormCheckReview id={id} canComment={false} backHref="/form-checks" />
    </div>
  );
}
