import type { Metadata } from "next";
import { FormCheckList } from "@/components/form-checks/form-check-list";
import { FormCheckUploader } from "@/components/form-checks/form-check-uploader";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Form checks" };

export default async function AthleteFormChecksPage() {
  await requirePageActor("athlete");
  return (
    <div className="flex flex-col gap-5">
      <h1 className="font-display text-3xl font-bold">Form checks</h1>
      <FormCheckUploader basePath="/form-checks" />
      <FormCheckList basePath="/form-checks" emptyText="Film a set and send it: your coach comments on the exact moments that matter." />
    </div>
  );
}
